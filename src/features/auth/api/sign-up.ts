import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import type { SignUpInput, SignUpStatusResponse } from '../../../../shared/schemas/account';
import type { MailSentResponse } from '../../../../shared/schemas/auth';
import { apiClient } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** Whether this server takes sign-ups (SIGNUP=open) or only invitations. */
export const getSignUpStatus = (signal?: AbortSignal) =>
  apiClient.get<SignUpStatusResponse>('/auth/sign-up', { signal }).then((b) => b.data);

export const signUpStatusQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.auth.signUpStatus(),
    queryFn: ({ signal }) => getSignUpStatus(signal),
    staleTime: 10 * 60_000,
  });

export const useSignUpStatus = () => useQuery(signUpStatusQueryOptions());

// The server answers 202 whether or not the address has an account, so nobody can probe for one.
export const signUp = (input: SignUpInput) =>
  apiClient.post<MailSentResponse>('/auth/sign-up', input).then((b) => b.data);

export const useSignUp = () =>
  useMutation({ mutationFn: signUp, meta: { allowUnauthorized: true } });
