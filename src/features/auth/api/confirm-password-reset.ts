import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PasswordResetConfirmInput } from '../../../../shared/schemas/auth';
import { apiClient, type DataEnvelope } from '../../../lib/api-client';
import { storeSession, type Me } from '../../../lib/auth';

/** Sets the new password; the answer signs the person in. */
export const confirmPasswordReset = (input: PasswordResetConfirmInput) =>
  apiClient.post<DataEnvelope<Me>>('/auth/password-reset/confirm', input).then((body) => body.data);

export function useConfirmPasswordReset() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmPasswordReset,
    meta: { allowUnauthorized: true },
    onSuccess: (me) => storeSession(queryClient, me),
  });
}
