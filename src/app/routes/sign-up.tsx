import type { QueryClient } from '@tanstack/react-query';
import { Link, redirect } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { PageSkeleton } from '../../components/ui/skeleton';
import { useSignUpStatus } from '../../features/auth/api/sign-up';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { homeStart } from '../../lib/auth';
import { optionalMe } from '../guards';
import { homeHref, paths } from '../paths';

const linkClasses = 'inline-flex min-h-touch items-center font-bold underline underline-offset-4';

/** Someone signed in already has an account: they go where they work. */
export const signUpLoader = (queryClient: QueryClient) => async () => {
  const me = await optionalMe(queryClient);
  if (me) throw redirect(homeHref(...homeStart(me)));
  return null;
};

export function SignUpPage() {
  const status = useSignUpStatus();
  return (
    <AuthLayout
      title="Create your account"
      description="Then set up your farm or dealership: machines, schedules and the team follow."
      footer={
        <p>
          Have an account?{' '}
          <Link to={paths.signIn.href()} className={linkClasses}>
            Sign in
          </Link>
        </p>
      }
    >
      {status.isPending ? (
        <PageSkeleton label="Loading" />
      ) : status.data?.open === false ? (
        <Alert tone="info" title="Sign-up is closed on this server">
          Ask a manager of your farm or dealer for an invitation; its link brings you straight in.
        </Alert>
      ) : (
        <SignUpForm
          afterSent={
            import.meta.env.DEV ? (
              <p className="text-sm text-field-700">
                Development:{' '}
                <Link to={paths.devMail.href()} className="font-bold underline underline-offset-4">
                  open the caught mail
                </Link>
                .
              </p>
            ) : null
          }
        />
      )}
    </AuthLayout>
  );
}
