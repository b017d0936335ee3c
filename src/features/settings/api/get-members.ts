import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MemberList } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const getMembers = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<MemberList>(`/organizations/${segment(orgId)}/members`, { signal });

export const membersQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.members.list(orgId),
    queryFn: ({ signal }) => getMembers(orgId, signal),
  });

export const useMembers = (orgId: string) => useQuery(membersQueryOptions(orgId));
