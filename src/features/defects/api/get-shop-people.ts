import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MemberList } from '../../../../shared/schemas/members';
import { apiClient, segment } from '../../../lib/api-client';
import type { PersonRef } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** Who a defect can be assigned to: the farm's technicians and managers (from the members). */
export const getShopPeople = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<MemberList>(`/organizations/${segment(orgId)}/members`, { signal })
    .then((body) =>
      body.data
        .filter((m) => m.role === 'technician' || m.role === 'manager')
        .map((m): PersonRef => ({ id: m.user.id, name: m.user.name })),
    );

export const useShopPeople = (orgId: string, options: { enabled: boolean }) =>
  useQuery({
    ...queryOptions({
      queryKey: queryKeys.defects.shopPeople(orgId),
      queryFn: ({ signal }) => getShopPeople(orgId, signal),
      staleTime: 5 * 60_000,
    }),
    enabled: options.enabled,
  });
