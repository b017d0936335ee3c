import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  AccountResponse,
  AccountUpdateInput,
  EmailChangeInput,
} from '../../../../shared/schemas/account';
import { apiClient } from '../../../lib/api-client';
import { clearSession } from '../../../lib/auth';
import { queryKeys } from '../../../lib/query-keys';

export const getAccount = (signal?: AbortSignal) =>
  apiClient.get<AccountResponse>('/account', { signal }).then((b) => b.data);

export const accountQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.account.detail(),
    queryFn: ({ signal }) => getAccount(signal),
  });

export const useAccount = () => useQuery(accountQueryOptions());

export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AccountUpdateInput) =>
      apiClient.patch<AccountResponse>('/account', input).then((b) => b.data),
    onSuccess: async (account) => {
      queryClient.setQueryData(queryKeys.account.detail(), account);
      await queryClient.invalidateQueries({ queryKey: queryKeys.session.me() });
    },
  });
}

/** Sends the confirmation link to the new address; the account keeps its address until then. */
export function useRequestEmailChange() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: EmailChangeInput) =>
      apiClient.post<AccountResponse>('/account/email', input).then((b) => b.data),
    onSuccess: (account) => queryClient.setQueryData(queryKeys.account.detail(), account),
  });
}

export function useDeleteAccount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (currentPassword: string) =>
      apiClient.delete('/account', { body: { currentPassword } }),
    // the account and its session are gone: nothing cached belongs to anyone now
    onSuccess: () => clearSession(queryClient),
  });
}
