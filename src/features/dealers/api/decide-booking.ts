import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { Booking } from './types';
import { queryKeys } from '../../../lib/query-keys';

export type BookingAction = 'accept' | 'decline' | 'cancel';

/** accept / decline (the farm manager, with a note) or cancel (the dealer) a proposal. */
export const decideBooking = (orgId: string, bookingId: string, action: BookingAction, note = '') =>
  apiClient
    .post<DataEnvelope<Booking>>(
      `/organizations/${segment(orgId)}/bookings/${segment(bookingId)}/${action}`,
      action === 'cancel' ? undefined : { note },
    )
    .then((body) => body.data);

export function useDecideBooking(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: { bookingId: string; action: BookingAction; note?: string }) =>
      decideBooking(orgId, v.bookingId, v.action, v.note),
    // an accepted booking adds planned records: the shop's views refresh on their next visit
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.dealers.bookings(orgId) }),
  });
}
