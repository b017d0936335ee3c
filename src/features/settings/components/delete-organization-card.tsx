import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { isApiError } from '../../../lib/api-client';
import { farmExportHref } from '../api/farm-export';
import { useDeleteOrganization } from '../api/organization';

interface DeleteOrganizationCardProps {
  orgId: string;
  name: string;
  kind: 'farm' | 'dealer';
  canExport: boolean;
  onDeleted: () => void;
}

/**
 * Deleting an organization: first the offer of the farm's data, then its name typed out. The
 * button stays disabled until the name matches; the server checks the same.
 */
export function DeleteOrganizationCard({
  orgId,
  name,
  kind,
  canExport,
  onDeleted,
}: DeleteOrganizationCardProps) {
  const remove = useDeleteOrganization(orgId);
  const [typed, setTyped] = useState('');
  const fieldError =
    isApiError(remove.error) && remove.error.fields.confirmName
      ? remove.error.fields.confirmName
      : undefined;
  const formError = remove.error && !fieldError ? remove.error.message : null;

  return (
    <Card className="flex flex-col gap-4 border-poppy-300">
      <p>
        Deleting {name} removes{' '}
        {kind === 'farm'
          ? 'its machines, readings, schedules, service records, walkarounds, defects, photos and invoices'
          : 'its customers’ links and bookings'}{' '}
        and the team’s access to it, at once and for good.{' '}
        {kind === 'farm'
          ? 'Dealers linked with the farm are told by e-mail.'
          : 'The farms linked with it are told by e-mail.'}{' '}
        The people keep their accounts.
      </p>
      {canExport ? (
        <div className="flex flex-col gap-2">
          <p className="font-bold">Keep a copy first: download everything the farm holds here.</p>
          <div>
            <a className={buttonClasses('secondary')} href={farmExportHref(orgId)} download>
              <Icon name="download" />
              Download the farm’s data
            </a>
          </div>
        </div>
      ) : null}
      {formError ? <Alert>{formError}</Alert> : null}
      <form
        noValidate
        className="flex flex-col gap-4"
        onSubmit={(event) => {
          event.preventDefault();
          remove.mutate(typed.trim(), { onSuccess: onDeleted });
        }}
      >
        <TextField
          label={`Type ${name} to confirm`}
          autoComplete="off"
          spellCheck={false}
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
          error={fieldError}
        />
        <div>
          <Button
            type="submit"
            variant="danger"
            pending={remove.isPending}
            disabled={typed.trim() !== name}
          >
            Delete {name}
          </Button>
        </div>
      </form>
    </Card>
  );
}
