import type { QueryClient } from '@tanstack/react-query';
import { redirect, useNavigate, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { SignUpLink } from '../../features/auth/components/sign-up-link';
import { homeStart, type Me } from '../../lib/auth';
import { optionalMe } from '../guards';
import { homeHref, paths, safeNextPath } from '../paths';

const destinationFor = (me: Me, next: string | null) =>
  safeNextPath(next) ?? homeHref(...homeStart(me));

/** Someone already signed in goes on to where they were headed. */
export const signInLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const me = await optionalMe(queryClient);
    if (me) throw redirect(destinationFor(me, new URL(request.url).searchParams.get('next')));
    return null;
  };

export function SignInPage() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const next = searchParams.get('next');

  return (
    <AuthLayout
      title="Sign in"
      description={
        safeNextPath(next)
          ? 'Sign in to continue where you were.'
          : 'Service intervals, hour meters and the team, in one place.'
      }
      footer={<SignUpLink href={paths.signUp.href()} />}
    >
      <SignInForm
        forgotPasswordHref={paths.forgotPassword.href()}
        onSignedIn={(me) => navigate(destinationFor(me, next), { replace: true })}
      />
    </AuthLayout>
  );
}
