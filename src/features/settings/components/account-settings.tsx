import { Card, Section } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { useAccount } from '../api/account';
import { AccountNameForm } from './account-name-form';
import { DeleteAccountCard } from './delete-account-card';
import { EmailChangeForm } from './email-change-form';

interface AccountSettingsProps {
  teamHref: (orgId: string) => string;
  onDeleted: () => void;
  /** sections shown between the address and deleting (the password form) */
  children?: React.ReactNode;
}

/** The person's own name, address and, last, deleting the account. */
export function AccountSettings({ teamHref, onDeleted, children }: AccountSettingsProps) {
  const account = useAccount();
  if (account.isPending) return <ListSkeleton rows={3} label="Loading your account" />;
  if (account.isError)
    return (
      <ErrorState
        title="Your account didn't load"
        message={account.error.message}
        onRetry={() => account.refetch()}
        retrying={account.isRefetching}
      />
    );
  const { name, email, pendingEmail, lastManagerOf } = account.data;
  return (
    <div className="flex flex-col gap-8">
      <Section title="Your name">
        <Card>
          <AccountNameForm name={name} />
        </Card>
      </Section>
      <Section
        title="E-mail address"
        description="A new address is used once you open the link we send to it."
      >
        <Card>
          <EmailChangeForm email={email} pendingEmail={pendingEmail} />
        </Card>
      </Section>
      {children}
      <Section title="Delete your account" description="This cannot be undone.">
        <DeleteAccountCard
          lastManagerOf={lastManagerOf}
          teamHref={teamHref}
          onDeleted={onDeleted}
        />
      </Section>
    </div>
  );
}
