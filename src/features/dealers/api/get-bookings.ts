import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { Bookings } from '../../../../shared/schemas/dealer-responses';
import { queryKeys } from '../../../lib/query-keys';

export const getBookings = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<Bookings>(`/organizations/${segment(orgId)}/bookings`, { signal });

export const bookingsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.dealers.bookings(orgId),
    queryFn: ({ signal }) => getBookings(orgId, signal),
  });

export const useBookings = (orgId: string) => useQuery(bookingsQueryOptions(orgId));
