import { queryOptions, useQuery } from '@tanstack/react-query';
import type { FarmContacts, MemberList } from '../../../../shared/schemas/members';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { FarmContacts };

/** The farm's managers and technicians by name, for "ask …" lines on an operator's screens. */
export const getFarmContacts = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<MemberList>(`/organizations/${segment(orgId)}/members`, { signal })
    .then((body): FarmContacts => {
      const named = (...roles: string[]) =>
        body.data
          .filter((m) => roles.includes(m.role))
          .map((m) => m.user.name)
          .sort((a, b) => a.localeCompare(b));
      return { managers: named('manager'), shop: named('technician', 'manager') };
    });

export const farmContactsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.members.contacts(orgId),
    queryFn: ({ signal }) => getFarmContacts(orgId, signal),
  });

export const useFarmContacts = (orgId: string, enabled = true) =>
  useQuery({ ...farmContactsQueryOptions(orgId), enabled });
