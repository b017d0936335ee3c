import { createContext, useContext, type ReactNode } from 'react';
import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import type { Me, SessionProbe } from '../../shared/schemas/auth';
import { apiClient, isApiError, type DataEnvelope } from './api-client';
import { clearApiCache } from './offline-cache';
import { queryKeys } from './query-keys';

// The signed-in person and their memberships. This lives in lib (not in a feature) because the
// router guards, the app shell and every feature need to know who is signed in and where.

export type { Me };
export type Membership = Me['memberships'][number];
export type Organization = Membership['organization'];

/**
 * GET /session: the signed-in person, or null when nobody is. It answers 200 either way, so a
 * signed-out visit logs no 401 on the console; a 401 (a gateway, an older server) still means null.
 */
export async function fetchMe(signal?: AbortSignal): Promise<Me | null> {
  try {
    const body = await apiClient.get<DataEnvelope<SessionProbe>>('/session', { signal });
    if (body.data.signedIn) return body.data.me;
    await clearApiCache();
    return null;
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.session.me(),
    queryFn: ({ signal }) => fetchMe(signal),
    staleTime: 5 * 60_000,
    meta: { allowUnauthorized: true },
  });

export const useMe = () => useQuery(meQueryOptions());

/**
 * Store the session a sign-in, invitation acceptance or password reset returned. Everything cached
 * before belonged to whoever was signed in before, so it goes first.
 */
export function storeSession(queryClient: QueryClient, me: Me): void {
  void clearApiCache();
  queryClient.removeQueries({
    predicate: (query) => query.queryKey[0] !== queryKeys.session.all[0],
  });
  queryClient.setQueryData(queryKeys.session.me(), me);
}

export function clearSession(queryClient: QueryClient): void {
  void clearApiCache();
  queryClient.clear();
  queryClient.setQueryData(queryKeys.session.me(), null);
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiClient.post<void>('/auth/sign-out'),
    meta: { allowUnauthorized: true },
    // Whatever the server said, this browser is no longer showing anyone's data.
    onSettled: () => clearSession(queryClient),
  });
}

// --- Which organization to open -------------------------------------------------------------

const LAST_ORGANIZATION_KEY = 'hourstone.lastOrganizationId';
/** id → 'farm' | 'dealer' of the organizations opened here (no names, no data: ids and kinds). */
const ORGANIZATION_KINDS_KEY = 'hourstone.organizationKinds';
const KINDS_KEPT = 20;

type OrganizationKind = Organization['kind'];

function readKinds(): Record<string, OrganizationKind> {
  try {
    const parsed: unknown = JSON.parse(localStorage.getItem(ORGANIZATION_KINDS_KEY) ?? '{}');
    return parsed && typeof parsed === 'object' ? (parsed as Record<string, OrganizationKind>) : {};
  } catch {
    return {};
  }
}

export function rememberOrganization(orgId: string, kind?: OrganizationKind): void {
  try {
    localStorage.setItem(LAST_ORGANIZATION_KEY, orgId);
    if (kind) {
      const kinds = Object.entries(readKinds()).filter(([id]) => id !== orgId);
      const kept = [...kinds.slice(-(KINDS_KEPT - 1)), [orgId, kind]];
      localStorage.setItem(ORGANIZATION_KINDS_KEY, JSON.stringify(Object.fromEntries(kept)));
    }
  } catch {
    // private mode or storage full: we simply open the first organization next time
  }
}

/**
 * The kind this organization had when it was last opened here: lets a page start its own
 * request at once, beside the session's, instead of after it. Only a guess; the session decides.
 */
export function rememberedOrganizationKind(orgId: string): OrganizationKind | undefined {
  const kind = readKinds()[orgId];
  return kind === 'farm' || kind === 'dealer' ? kind : undefined;
}

function lastOrganizationId(): string | null {
  try {
    return localStorage.getItem(LAST_ORGANIZATION_KEY);
  } catch {
    return null;
  }
}

export const findMembership = (me: Me, orgId: string): Membership | undefined =>
  me.memberships.find((membership) => membership.organization.id === orgId);

/** The organization to open after sign-in: the last one used here, else the first membership. */
export function homeOrganizationId(me: Me): string | null {
  const last = lastOrganizationId();
  if (last && findMembership(me, last)) return last;
  return me.memberships[0]?.organization.id ?? null;
}

/** Where to open after sign-in: the organization (homeOrganizationId) and the role held there. */
export function homeStart(me: Me): [orgId: string | null, role: string | undefined] {
  const orgId = homeOrganizationId(me);
  return [orgId, orgId ? findMembership(me, orgId)?.role : undefined];
}

// --- The organization the current page belongs to ------------------------------------------

interface CurrentMembership {
  me: Me;
  membership: Membership;
}

const CurrentMembershipContext = createContext<CurrentMembership | null>(null);

export function CurrentMembershipProvider({
  value,
  children,
}: {
  value: CurrentMembership;
  children: ReactNode;
}) {
  return <CurrentMembershipContext value={value}>{children}</CurrentMembershipContext>;
}

/** The signed-in person and their membership of the organization in the URL (/o/:orgId/…). */
export function useCurrentMembership(): CurrentMembership {
  const value = useContext(CurrentMembershipContext);
  if (!value) throw new Error('useCurrentMembership is used outside an organization page');
  return value;
}
