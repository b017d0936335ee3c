import { Link, useNavigate } from 'react-router-dom';
import { Button, buttonClasses } from '../../components/ui/button';
import { Card, Section } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form';
import { AccountDetails } from '../../features/settings/components/account-details';
import { AccountSettings } from '../../features/settings/components/account-settings';
import { useCurrentMembership, useSignOut } from '../../lib/auth';
import { paths } from '../paths';

export function AccountPage() {
  const { me } = useCurrentMembership();
  const signOut = useSignOut();
  const navigate = useNavigate();

  return (
    <>
      <PageHeader title="Account" />
      <Card>
        <AccountDetails me={me} />
      </Card>
      <div className="mt-3">
        <Link to={paths.organizationNew.href()} className={buttonClasses('secondary')}>
          Set up another farm or dealer
        </Link>
      </div>
      <div className="mt-8">
        <AccountSettings
          teamHref={paths.organization.team.href}
          onDeleted={() => navigate(paths.signIn.href(), { replace: true })}
        >
          <Section title="Change password">
            <Card>
              <ChangePasswordForm />
            </Card>
          </Section>
        </AccountSettings>
      </div>
      <div className="mt-6">
        <Button
          variant="secondary"
          icon="signOut"
          pending={signOut.isPending}
          className="w-full sm:w-auto"
          onClick={() =>
            signOut.mutate(undefined, {
              onSettled: () => navigate(paths.signIn.href(), { replace: true }),
            })
          }
        >
          Sign out
        </Button>
        <p className="mt-2 text-sm text-field-600">
          On a shared phone or shop computer, sign out when you're done.
        </p>
      </div>
    </>
  );
}
