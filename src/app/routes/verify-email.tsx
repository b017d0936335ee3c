import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { useVerifyEmail } from '../../features/auth/api/verify-email';
import { ConfirmLinkButton } from '../../features/auth/components/confirm-link-button';
import { homeStart } from '../../lib/auth';
import { homeHref, paths } from '../paths';

/** The sign-up's e-mailed link: confirming makes the account and signs in. */
export function VerifyEmailPage() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const token = searchParams.get('token');
  const verify = useVerifyEmail();

  const confirm = () =>
    verify.mutate(
      { token: token ?? '' },
      {
        onSuccess: (me) => {
          const [orgId, role] = homeStart(me);
          navigate(orgId ? homeHref(orgId, role) : paths.organizationNew.href(), { replace: true });
        },
      },
    );

  return (
    <AuthLayout title="Confirm your e-mail" description="One step and your account is ready.">
      {token ? (
        <ConfirmLinkButton
          label="Confirm and continue"
          pending={verify.isPending}
          error={verify.error}
          onConfirm={confirm}
          recovery={{ href: paths.signIn.href(), label: 'Sign in' }}
        />
      ) : (
        <div className="flex flex-col gap-4">
          <Alert title="This link is incomplete">
            Open the link from the e-mail again, or sign up again for a new one.
          </Alert>
          <Link to={paths.signUp.href()} className={buttonClasses('primary')}>
            Sign up
          </Link>
        </div>
      )}
    </AuthLayout>
  );
}
