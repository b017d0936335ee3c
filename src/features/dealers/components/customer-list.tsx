import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { formatDate } from '../../../lib/format';
import type { Customer } from '../api/types';
import { useWithdrawCustomerInvitation } from '../api/withdraw-customer-invitation';
import { AccessBadge } from './access-badge';

/** The dealer's linked farms, and the requests no farm manager has answered yet. */
export function CustomerList({
  orgId,
  customers,
  timeZone,
  boardHref,
}: {
  orgId: string;
  customers: Customer[];
  timeZone: string;
  boardHref: (customerId: string) => string;
}) {
  const active = customers.filter((c) => c.status === 'active');
  const pending = customers.filter((c) => c.status === 'pending');
  const withdraw = useWithdrawCustomerInvitation(orgId);
  const [confirm, setConfirm] = useState<Customer | null>(null);

  return (
    <div className="flex flex-col gap-6">
      {active.length === 0 ? (
        <EmptyState icon="team" title="No linked customers yet">
          <p>Ask a farm for access below; its manager chooses what you may see.</p>
        </EmptyState>
      ) : (
        <ul
          aria-label="Customers"
          className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
        >
          {active.map((c) => (
            <li key={c.id} className="flex flex-wrap items-center gap-3 p-4">
              <div className="min-w-0 flex-1">
                <p className="font-bold">{c.customer?.name}</p>
                <p className="text-sm text-field-600">
                  {c.machineCount} {c.machineCount === 1 ? 'machine' : 'machines'}
                  {c.acceptedAt ? ` · linked ${formatDate(c.acceptedAt, timeZone)}` : ''}
                </p>
              </div>
              {c.access ? <AccessBadge access={c.access} /> : null}
              {c.customer ? (
                <Link className="font-bold text-field-800 underline" to={boardHref(c.customer.id)}>
                  Coming due
                </Link>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {pending.length > 0 ? (
        <div className="flex flex-col gap-2">
          <h3 className="text-lg font-black">Waiting for an answer</h3>
          {withdraw.isError ? <Alert>{withdraw.error.message}</Alert> : null}
          <ul
            aria-label="Requests waiting"
            className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
          >
            {pending.map((c) => (
              <li key={c.id} className="flex flex-wrap items-center gap-3 p-4">
                <div className="min-w-0 flex-1">
                  <p className="font-bold break-all">{c.invitedEmail}</p>
                  <p className="text-sm text-field-600">
                    Asked {formatDate(c.createdAt, timeZone)}
                    {c.expiresAt ? ` · link expires ${formatDate(c.expiresAt, timeZone)}` : ''}
                  </p>
                </div>
                <Badge tone="due-soon" icon="clock">
                  Pending
                </Badge>
                <Button variant="ghost" icon="close" onClick={() => setConfirm(c)}>
                  Withdraw
                </Button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <ConfirmDialog
        open={confirm !== null}
        title="Withdraw this request?"
        confirmLabel="Withdraw request"
        pending={withdraw.isPending}
        error={withdraw.isError ? withdraw.error.message : null}
        onCancel={() => setConfirm(null)}
        onConfirm={() =>
          confirm && withdraw.mutate(confirm.id, { onSuccess: () => setConfirm(null) })
        }
      >
        <p>The link e-mailed to {confirm?.invitedEmail} stops working.</p>
      </ConfirmDialog>
    </div>
  );
}
