import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { Booking } from './types';

export const getBookings = (orgId: string, signal?: AbortSignal) =>
  apiClient.get<{ data: Booking[]; abilities: { propose: boolean } }>(
    `/organizations/${segment(orgId)}/bookings`,
    { signal },
  );

export const bookingsQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: dealerKeys.bookings(orgId),
    queryFn: ({ signal }) => getBookings(orgId, signal),
  });

export const useBookings = (orgId: string) => useQuery(bookingsQueryOptions(orgId));
