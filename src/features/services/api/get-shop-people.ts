import { queryOptions, useQuery } from '@tanstack/react-query';
import type { MemberList } from '../../../../shared/schemas/members';
import { apiClient, segment } from '../../../lib/api-client';
import type { ShopPerson } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The farm's technicians and managers (from the member list): who can be named on a record. */
export const getShopPeople = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<MemberList>(`/organizations/${segment(orgId)}/members`, { signal })
    .then((body) =>
      body.data.flatMap((m): ShopPerson[] =>
        m.role === 'technician' || m.role === 'manager'
          ? [{ userId: m.user.id, name: m.user.name, role: m.role }]
          : [],
      ),
    );

export const shopPeopleQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.serviceRecords.shopPeople(orgId),
    queryFn: ({ signal }) => getShopPeople(orgId, signal),
    staleTime: 5 * 60_000,
  });

/** `enabled` false: not asked at all (a dealer's advisor is not shown the farm's team). */
export const useShopPeople = (orgId: string, enabled = true) =>
  useQuery({ ...shopPeopleQueryOptions(orgId), enabled });
