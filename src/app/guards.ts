import type { QueryClient } from '@tanstack/react-query';
import { redirect } from 'react-router-dom';
import { meQueryOptions, type Me } from '../lib/auth';
import { paths } from './paths';

/**
 * For loaders of signed-in pages: the session, or a redirect to sign-in that comes back here.
 * Anything other than "not signed in" (the API is down) is thrown on to the error page.
 */
export async function requireMe(queryClient: QueryClient, request: Request): Promise<Me> {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (!me) {
    const url = new URL(request.url);
    throw redirect(paths.signIn.href(url.pathname + url.search));
  }
  return me;
}

/** For loaders of signed-out pages: the session if there is one, never an error. */
export async function optionalMe(queryClient: QueryClient): Promise<Me | null> {
  try {
    return await queryClient.ensureQueryData(meQueryOptions());
  } catch {
    return null;
  }
}
