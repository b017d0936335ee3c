import {
  queryOptions,
  useMutation,
  useQuery,
  useQueryClient,
  type QueryClient,
} from '@tanstack/react-query';
import type {
  OrganizationCreateInput,
  OrganizationResponse,
  OrganizationUpdateInput,
} from '../../../../shared/schemas/organizations';
import { apiClient, segment } from '../../../lib/api-client';
import { meQueryOptions, type Me } from '../../../lib/auth';
import { queryKeys } from '../../../lib/query-keys';

const orgPath = (orgId: string) => `/organizations/${segment(orgId)}`;

/** The session's memberships changed (the switcher and the route guards read them): load now. */
const reloadMe = (queryClient: QueryClient) =>
  queryClient.fetchQuery({ ...meQueryOptions(), staleTime: 0 });

export const getOrganization = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<OrganizationResponse>(orgPath(orgId), { signal });

export const organizationQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.organizations.detail(orgId),
    queryFn: ({ signal }) => getOrganization(orgId, signal),
  });

export const useOrganization = (orgId: string) => useQuery(organizationQueryOptions(orgId));

/** Creates a farm or dealer; the session's memberships (the switcher) gain it. */
export function useCreateOrganization() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganizationCreateInput) =>
      apiClient.post<OrganizationResponse>('/organizations', input),
    onSuccess: async (created) => {
      queryClient.setQueryData(queryKeys.organizations.detail(created.data.id), created);
      await reloadMe(queryClient);
    },
  });
}

/** Saves the changed settings only; the name and time zone also live in the session. */
export function useUpdateOrganization(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganizationUpdateInput) =>
      apiClient.patch<OrganizationResponse>(orgPath(orgId), input),
    onSuccess: async (updated) => {
      queryClient.setQueryData(queryKeys.organizations.detail(orgId), updated);
      await reloadMe(queryClient);
    },
  });
}

export function useDeleteOrganization(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (confirmName: string) =>
      apiClient.delete(orgPath(orgId), { body: { confirmName } }),
    onSuccess: () => {
      // Gone from the session at once (no page may open it again), then confirmed by the server.
      queryClient.setQueryData<Me | null>(queryKeys.session.me(), (me) =>
        me ? { ...me, memberships: me.memberships.filter((m) => m.organization.id !== orgId) } : me,
      );
      queryClient.removeQueries({ queryKey: queryKeys.organizations.detail(orgId) });
      void queryClient.invalidateQueries({ queryKey: queryKeys.session.me() });
    },
  });
}
