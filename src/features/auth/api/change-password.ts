import { useMutation } from '@tanstack/react-query';
import type { PasswordChangeInput } from '../../../../shared/schemas/auth';
import { apiClient } from '../../../lib/api-client';

/** Changes the password; the person's other sessions end, this one stays signed in. */
export const changePassword = (input: PasswordChangeInput) =>
  apiClient.post<void>('/auth/password', input);

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
