import { Link } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { paths } from '../paths';

const backToSignIn = (
  <Link
    to={paths.signIn.href()}
    className="inline-flex min-h-touch items-center font-bold underline underline-offset-4"
  >
    Back to sign in
  </Link>
);

export function ForgotPasswordPage() {
  return (
    <AuthLayout
      title="Reset your password"
      description="Enter the e-mail address you sign in with and we'll send you a link to set a new password."
      footer={backToSignIn}
    >
      <ForgotPasswordForm
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
    </AuthLayout>
  );
}
