import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BookingCreateInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { dealerKeys } from './keys';
import type { Booking } from './types';

export const proposeBooking = (orgId: string, input: BookingCreateInput) =>
  apiClient
    .post<DataEnvelope<Booking>>(`/organizations/${segment(orgId)}/bookings`, input)
    .then((body) => body.data);

export function useProposeBooking(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BookingCreateInput) => proposeBooking(orgId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: dealerKeys.bookings(orgId) }),
  });
}
