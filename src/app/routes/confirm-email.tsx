import { Link, useSearchParams } from 'react-router-dom';
import { AuthLayout } from '../../components/layouts/auth-layout';
import { Alert } from '../../components/ui/alert';
import { buttonClasses } from '../../components/ui/button';
import { useConfirmEmailChange } from '../../features/auth/api/confirm-email-change';
import { ConfirmLinkButton } from '../../features/auth/components/confirm-link-button';
import { paths } from '../paths';

/** An address change's e-mailed link: the account signs in with the new address from then on. */
export function ConfirmEmailPage() {
  const [searchParams] = useSearchParams();
  const token = searchParams.get('token');
  const confirm = useConfirmEmailChange();

  return (
    <AuthLayout title="Confirm your new address">
      {confirm.isSuccess ? (
        <div className="flex flex-col gap-4">
          <Alert tone="success" title="Address changed">
            Your account now signs in with {confirm.data.email}, and mail goes there.
          </Alert>
          <Link to={paths.home.href()} className={buttonClasses('primary')}>
            Continue
          </Link>
        </div>
      ) : token ? (
        <ConfirmLinkButton
          label="Use this address"
          pending={confirm.isPending}
          error={confirm.error}
          onConfirm={() => confirm.mutate({ token })}
          recovery={{ href: paths.home.href(), label: 'Back to Hourstone' }}
        />
      ) : (
        <Alert title="This link is incomplete">
          Open the link from the e-mail again, or ask for the change again on your account page.
        </Alert>
      )}
    </AuthLayout>
  );
}
