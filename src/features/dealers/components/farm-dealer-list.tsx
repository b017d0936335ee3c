import { useState } from 'react';
import {
  DEALER_ACCESS,
  DEALER_ACCESS_LABELS,
  type DealerAccess,
} from '../../../../shared/schemas/dealers';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { SelectField } from '../../../components/ui/field';
import { formatDate } from '../../../lib/format';
import { useRevokeDealerLink } from '../api/revoke-dealer-link';
import type { FarmDealerLink } from '../api/types';
import { useUpdateDealerLink } from '../api/update-dealer-link';
import { AccessBadge } from './access-badge';

const ACCESS_OPTIONS = DEALER_ACCESS.map((a) => ({ value: a, label: DEALER_ACCESS_LABELS[a] }));

/** The dealers with access to the farm: change the access, or revoke it at once. */
export function FarmDealerList({
  orgId,
  links,
  timeZone,
}: {
  orgId: string;
  links: FarmDealerLink[];
  timeZone: string;
}) {
  const update = useUpdateDealerLink(orgId);
  const revoke = useRevokeDealerLink(orgId);
  const [confirm, setConfirm] = useState<FarmDealerLink | null>(null);
  const active = links.filter((l) => l.status === 'active');
  const past = links.filter((l) => l.status === 'revoked');

  return (
    <div className="flex flex-col gap-4">
      {update.isError ? <Alert>{update.error.message}</Alert> : null}
      {active.length === 0 ? (
        <EmptyState icon="lock" title="No dealer has access">
          <p>Your machines are seen by your own people only. Give a dealer access below.</p>
        </EmptyState>
      ) : (
        <ul
          aria-label="Dealers with access"
          className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
        >
          {active.map((l) => (
            <li key={l.id} className="flex flex-col gap-3 p-4 sm:flex-row sm:items-end">
              <div className="min-w-0 flex-1">
                <p className="flex flex-wrap items-center gap-2 font-bold">
                  {l.dealer.name} <AccessBadge access={l.access} />
                </p>
                <p className="text-sm text-field-600">
                  {l.acceptedAt ? `Since ${formatDate(l.acceptedAt, timeZone)}` : null}
                </p>
              </div>
              <div className="sm:w-44">
                <SelectField
                  label={`Access for ${l.dealer.name}`}
                  options={ACCESS_OPTIONS}
                  value={l.access}
                  disabled={!l.abilities.update || update.isPending}
                  onChange={(e) =>
                    update.mutate({ linkId: l.id, access: e.target.value as DealerAccess })
                  }
                />
              </div>
              {l.abilities.revoke ? (
                <Button variant="danger" icon="lock" onClick={() => setConfirm(l)}>
                  Revoke
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {past.length > 0 ? (
        <details className="rounded-lg border border-field-200 bg-white p-3">
          <summary className="cursor-pointer font-bold">Revoked links ({past.length})</summary>
          <ul className="mt-2 flex flex-col gap-1 text-field-700">
            {past.map((l) => (
              <li key={l.id}>
                {l.dealer.name}: {DEALER_ACCESS_LABELS[l.access].toLowerCase()} access, revoked{' '}
                {l.revokedAt ? formatDate(l.revokedAt, timeZone) : ''}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
      <ConfirmDialog
        open={confirm !== null}
        title={`Revoke ${confirm?.dealer.name ?? 'this dealer'}'s access?`}
        confirmLabel="Revoke access"
        pending={revoke.isPending}
        error={revoke.isError ? revoke.error.message : null}
        onCancel={() => setConfirm(null)}
        onConfirm={() =>
          confirm && revoke.mutate(confirm.id, { onSuccess: () => setConfirm(null) })
        }
      >
        <p>
          Access ends with the dealer&apos;s next request: your machines leave their board at once.
          You can link them again later.
        </p>
      </ConfirmDialog>
    </div>
  );
}
