import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';
import { homeStart } from '../../lib/auth';
import { homeHref, paths } from '../paths';

export function ResetPasswordPage() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const token = searchParams.get('token');

  return (
    <AuthLayout
      title="Set a new password"
      footer={
        <Link
          to={paths.signIn.href()}
          className="inline-flex min-h-touch items-center font-bold underline underline-offset-4"
        >
          Back to sign in
        </Link>
      }
    >
      {token ? (
        <ResetPasswordForm
          token={token}
          forgotPasswordHref={paths.forgotPassword.href()}
          onReset={(me) => navigate(homeHref(...homeStart(me)), { replace: true })}
        />
      ) : (
        <div className="flex flex-col gap-4">
          <Alert title="This link is incomplete">
            Open the link from the e-mail again, or ask for a new one.
          </Alert>
          <Link to={paths.forgotPassword.href()} className={buttonClasses('primary')}>
            Send me a new link
          </Link>
        </div>
      )}
    </AuthLayout>
  );
}
