import { useState } from 'react';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime, formatRelative, roleLabel } from '../../../lib/format';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';
import type { PendingInvitation } from '../api/types';

interface InvitationListProps {
  orgId: string;
  timeZone: string;
}

/** Invitations sent and not yet accepted; a manager can take one back before it is used. */
export function InvitationList({ orgId, timeZone }: InvitationListProps) {
  const invitations = useInvitations(orgId);
  const [revoking, setRevoking] = useState<PendingInvitation | null>(null);
  const revoke = useRevokeInvitation(orgId);

  if (invitations.isPending) return <ListSkeleton rows={2} label="Loading invitations" />;
  if (invitations.isError) {
    return (
      <ErrorState
        title="Invitations didn't load"
        message={invitations.error.message}
        onRetry={() => invitations.refetch()}
        retrying={invitations.isRefetching}
      />
    );
  }
  if (invitations.data.length === 0) {
    return (
      <EmptyState icon="mail" title="No invitations waiting">
        When you invite someone, their invitation waits here until they accept it.
      </EmptyState>
    );
  }

  const now = new Date();
  return (
    <>
      <ul
        aria-label="Pending invitations"
        className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white shadow-card"
      >
        {invitations.data.map((invitation) => {
          const expired = new Date(invitation.expiresAt) <= now;
          return (
            <li key={invitation.id} className="flex flex-col gap-3 p-4 sm:flex-row sm:items-center">
              <div className="min-w-0 flex-1">
                <p className="font-bold text-field-950">{invitation.name}</p>
                <p className="truncate text-sm text-field-600">{invitation.email}</p>
                <p className="mt-1 text-sm text-field-600">
                  <time
                    dateTime={invitation.expiresAt}
                    title={formatDateTime(invitation.expiresAt, timeZone)}
                  >
                    {expired ? 'Expired ' : 'Expires '}
                    {formatRelative(invitation.expiresAt, now)}
                  </time>
                </p>
              </div>
              <div className="flex flex-wrap items-center gap-2 sm:justify-end">
                <Badge>{roleLabel(invitation.role)}</Badge>
                {expired ? (
                  <Badge tone="overdue" icon="clock">
                    Expired
                  </Badge>
                ) : (
                  <Badge tone="info" icon="mail">
                    Waiting
                  </Badge>
                )}
                <Button
                  variant="ghost"
                  icon="close"
                  aria-label={`Revoke invitation for ${invitation.email}`}
                  onClick={() => setRevoking(invitation)}
                >
                  Revoke
                </Button>
              </div>
            </li>
          );
        })}
      </ul>
      <ConfirmDialog
        open={revoking !== null}
        title="Revoke this invitation?"
        confirmLabel="Revoke"
        pending={revoke.isPending}
        error={
          revoke.error ? (isApiError(revoke.error) ? revoke.error.message : 'Try again.') : null
        }
        onCancel={() => {
          setRevoking(null);
          revoke.reset();
        }}
        onConfirm={() => {
          if (revoking) revoke.mutate(revoking.id, { onSuccess: () => setRevoking(null) });
        }}
      >
        The link sent to {revoking?.email} stops working. You can invite them again later.
      </ConfirmDialog>
    </>
  );
}
