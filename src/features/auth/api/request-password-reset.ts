import { useMutation } from '@tanstack/react-query';
import type { MailSentResponse, PasswordResetRequestInput } from '../../../../shared/schemas/auth';
import { apiClient } from '../../../lib/api-client';

// The server answers 202 whether or not the address has an account, so nobody can probe for one.
export const requestPasswordReset = (input: PasswordResetRequestInput) =>
  apiClient.post<MailSentResponse>('/auth/password-reset', input).then((body) => body.data);

export const useRequestPasswordReset = () =>
  useMutation({ mutationFn: requestPasswordReset, meta: { allowUnauthorized: true } });
