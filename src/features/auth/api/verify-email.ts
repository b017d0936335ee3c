import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EmailTokenInput } from '../../../../shared/schemas/account';
import { apiClient, type DataEnvelope } from '../../../lib/api-client';
import { storeSession, type Me } from '../../../lib/auth';

/** Opens a sign-up's link: the account is created and signed in. */
export const verifyEmail = (input: EmailTokenInput) =>
  apiClient.post<DataEnvelope<Me>>('/auth/verify-email', input).then((b) => b.data);

export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: verifyEmail,
    meta: { allowUnauthorized: true },
    onSuccess: (me) => storeSession(queryClient, me),
  });
}
