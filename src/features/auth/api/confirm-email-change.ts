import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { EmailChangedResponse, EmailTokenInput } from '../../../../shared/schemas/account';
import { apiClient } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** Opens an address change's link: the account uses the new address from now on. */
export const confirmEmailChange = (input: EmailTokenInput) =>
  apiClient.post<EmailChangedResponse>('/account/email/confirm', input).then((b) => b.data);

export function useConfirmEmailChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: confirmEmailChange,
    meta: { allowUnauthorized: true },
    // whoever is signed in here may be the one whose address changed
    onSuccess: () => queryClient.invalidateQueries({ queryKey: queryKeys.session.me() }),
  });
}
