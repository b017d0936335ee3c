import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { serviceKeys } from './keys';
import type { ShopPerson } from './types';

interface MemberRow {
  role: string;
  user: { id: string; name: string };
}

/** The farm's technicians and managers (from the member list): who can be named on a record. */
export const getShopPeople = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<{ data: MemberRow[] }>(`/organizations/${segment(orgId)}/members`, { signal })
    .then((body) =>
      body.data.flatMap((m): ShopPerson[] =>
        m.role === 'technician' || m.role === 'manager'
          ? [{ userId: m.user.id, name: m.user.name, role: m.role }]
          : [],
      ),
    );

export const shopPeopleQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: serviceKeys.shopPeople(orgId),
    queryFn: ({ signal }) => getShopPeople(orgId, signal),
    staleTime: 5 * 60_000,
  });

export const useShopPeople = (orgId: string) => useQuery(shopPeopleQueryOptions(orgId));
