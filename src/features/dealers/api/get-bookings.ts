import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { Bookings } from '../../../../shared/schemas/dealer-responses';

export const getBookings = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<Bookings>(`/organizations/${segment(orgId)}/bookings`, { signal });

export const bookingsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: dealerKeys.bookings(orgId),
    queryFn: ({ signal }) => getBookings(orgId, signal),
  });

export const useBookings = (orgId: string) => useQuery(bookingsQueryOptions(orgId));
