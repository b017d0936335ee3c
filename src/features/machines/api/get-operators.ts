import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MemberList } from '../../../../shared/schemas/members';
import type { Operator } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The farm's operators (from the member list), for assigning machines and naming who is assigned. */
export const getOperators = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<MemberList>(`/organizations/${segment(orgId)}/members`, { signal })
    .then((body) =>
      body.data
        .filter((m) => m.role === 'operator')
        .map((m): Operator => ({ userId: m.user.id, name: m.user.name })),
    );

export const operatorsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.members.operators(orgId),
    queryFn: ({ signal }) => getOperators(orgId, signal),
    staleTime: 5 * 60_000,
  });

export const useOperators = (orgId: string) => useQuery(operatorsQueryOptions(orgId));
