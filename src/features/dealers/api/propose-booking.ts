import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BookingCreateInput } from '../../../../shared/schemas/dealers';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { Booking } from './types';
import { queryKeys } from '../../../lib/query-keys';

export const proposeBooking = (orgId: string, input: BookingCreateInput) =>
  apiClient
    .post<DataEnvelope<Booking>>(`/organizations/${segment(orgId)}/bookings`, input)
    .then((body) => body.data);

export function useProposeBooking(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: BookingCreateInput) => proposeBooking(orgId, input),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.dealers.bookings(orgId) }),
  });
}
