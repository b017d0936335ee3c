import { useState } from 'react';
import type { DealerAccess } from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { useAcceptDealerInvitation } from '../api/accept-dealer-invitation';
import type { DealerInvitation, FarmDealerLink } from '../api/types';
import { AccessChoice } from './access-choice';

/** The farm manager answers a dealer's request: which farm, and view or service access. */
export function AcceptDealerInvitationForm({
  token,
  invitation,
  onAccepted,
}: {
  token: string;
  invitation: DealerInvitation;
  onAccepted: (link: FarmDealerLink, farmId: string) => void;
}) {
  const open = invitation.farms.filter((f) => !f.linked);
  const [farmId, setFarmId] = useState(open[0]?.id ?? '');
  const [access, setAccess] = useState<DealerAccess>('view');
  const accept = useAcceptDealerInvitation(token);
  if (invitation.farms.length === 0)
    return (
      <Alert tone="warning">
        Only a farm&apos;s manager can accept this. Sign in as the manager of the farm, or forward
        the e-mail to them.
      </Alert>
    );
  if (open.length === 0)
    return (
      <Alert tone="info">
        {invitation.dealer.name} has access to your farms already. Change it on the farm&apos;s
        Dealers page.
      </Alert>
    );
  const error = accept.error as { fields?: Record<string, string>; message?: string } | null;
  return (
    <form
      className="flex flex-col gap-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        accept.mutate(
          { organizationId: farmId, access },
          { onSuccess: (link) => onAccepted(link, farmId) },
        );
      }}
    >
      {error ? <Alert>{error.fields?.organizationId ?? error.message}</Alert> : null}
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 font-bold text-field-900">Farm</legend>
        {open.map((f) => (
          <label
            key={f.id}
            className="flex min-h-touch items-center gap-3 rounded-lg border border-field-200 bg-white px-3"
          >
            <input
              type="radio"
              name="farm"
              className="size-5 accent-field-800"
              checked={farmId === f.id}
              onChange={() => setFarmId(f.id)}
            />
            {f.name}
          </label>
        ))}
      </fieldset>
      <AccessChoice
        value={access}
        onChange={setAccess}
        legend={`Access for ${invitation.dealer.name}`}
      />
      <p className="text-sm text-field-700">
        You can change or revoke the access at any time on the farm&apos;s Dealers page; every look
        the dealer takes is recorded there.
      </p>
      <div>
        <Button type="submit" icon="check" pending={accept.isPending}>
          Accept and give access
        </Button>
      </div>
    </form>
  );
}
