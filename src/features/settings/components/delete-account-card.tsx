import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useDeleteAccount } from '../api/account';

interface DeleteAccountCardProps {
  /** organizations only this person runs: the account cannot go while there are any */
  lastManagerOf: { id: string; name: string }[];
  teamHref: (orgId: string) => string;
  onDeleted: () => void;
}

/** Deleting one's own account, with the current password; never an organization's last manager. */
export function DeleteAccountCard({ lastManagerOf, teamHref, onDeleted }: DeleteAccountCardProps) {
  const remove = useDeleteAccount();
  const [password, setPassword] = useState('');
  const fieldError = isApiError(remove.error) ? remove.error.fields.currentPassword : undefined;
  const formError = remove.error && !fieldError ? remove.error.message : null;

  return (
    <Card className="flex flex-col gap-4 border-poppy-300">
      {lastManagerOf.length ? (
        <Alert tone="warning" title="Your account cannot be deleted yet">
          <p>
            You are the last manager of{' '}
            {lastManagerOf.map((o, i) => (
              <span key={o.id}>
                {i > 0 ? ', ' : ''}
                <Link to={teamHref(o.id)} className="font-bold underline underline-offset-4">
                  {o.name}
                </Link>
              </span>
            ))}
            . Make someone else its manager on its Team page, or delete the organization in its
            Settings, first.
          </p>
        </Alert>
      ) : (
        <p>
          Deleting your account signs you out everywhere and removes you from every farm and dealer.
          What you recorded stays with them, without your name.
        </p>
      )}
      {formError ? <Alert>{formError}</Alert> : null}
      <form
        noValidate
        className="flex flex-col gap-4"
        onSubmit={(event) => {
          event.preventDefault();
          remove.mutate(password, { onSuccess: onDeleted });
        }}
      >
        <TextField
          label="Your password, to confirm"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(event) => setPassword(event.target.value)}
          error={fieldError}
          disabled={lastManagerOf.length > 0}
        />
        <div>
          <Button
            type="submit"
            variant="danger"
            pending={remove.isPending}
            disabled={lastManagerOf.length > 0 || password === ''}
          >
            Delete my account
          </Button>
        </div>
      </form>
    </Card>
  );
}
