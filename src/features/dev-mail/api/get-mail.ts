import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CaughtMailList } from '../../../../shared/schemas/dev-mail';
import { apiClient } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

/** One message caught by the local mail catcher (development and test only). */
export type { CaughtMail } from '../../../../shared/schemas/dev-mail';

export const getMail = (signal?: AbortSignal) =>
  apiClient.get<CaughtMailList>('/dev/mail', { signal }).then((body) =>
    // newest first: the link someone is waiting for is the one just sent
    [...body.data].sort((a, b) => Date.parse(b.date) - Date.parse(a.date)),
  );

export const mailQueryOptions = () =>
  queryOptions({
    queryKey: queryKeys.devMail.list(),
    queryFn: ({ signal }) => getMail(signal),
    staleTime: 0,
    // new mail arrives while the page is open (an invitation just sent from another tab)
    refetchInterval: 5_000,
    meta: { allowUnauthorized: true },
  });

export const useMail = () => useQuery(mailQueryOptions());
