import { useMutation } from '@tanstack/react-query';
import type { ReminderInput } from '../../../../shared/schemas/dealers';
import type { ReminderSent } from '../../../../shared/schemas/dealer-responses';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';

export type ReminderResult = ReminderSent;

export const sendReminder = (orgId: string, customerId: string, input: ReminderInput) =>
  apiClient
    .post<DataEnvelope<ReminderResult>>(
      `/organizations/${segment(orgId)}/customers/${segment(customerId)}/reminders`,
      input,
    )
    .then((body) => body.data);

export const useSendReminder = (orgId: string, customerId: string) =>
  useMutation({ mutationFn: (input: ReminderInput) => sendReminder(orgId, customerId, input) });
