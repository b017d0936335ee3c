import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { SignInInput } from '../../../../shared/schemas/auth';
import { apiClient, type DataEnvelope } from '../../../lib/api-client';
import { storeSession, type Me } from '../../../lib/auth';

export const signIn = (input: SignInInput) =>
  apiClient.post<DataEnvelope<Me>>('/auth/sign-in', input).then((body) => body.data);

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    // a 401 here means "wrong e-mail or password", not "session ended"
    meta: { allowUnauthorized: true },
    onSuccess: (me) => storeSession(queryClient, me),
  });
}
