import { useId, useState } from 'react';
import type { CalendarFeedScope } from '../../../../shared/schemas/notifications';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { useCreateCalendarFeed } from '../api/create-calendar-feed';
import { useRevokeCalendarFeed } from '../api/revoke-calendar-feed';
import type { CalendarFeed } from '../api/types';

const errorText = (error: unknown) =>
  error ? (isApiError(error) ? error.message : 'Try again.') : null;

interface CalendarFeedCardProps {
  orgId: string;
  scope: CalendarFeedScope;
  feed: CalendarFeed | null;
  timeZone: string;
  title: string;
  /** what the feed holds, in words */
  description: string;
}

/** A private calendar address: create it, copy it into a calendar app, revoke it. */
export function CalendarFeedCard({
  orgId,
  scope,
  feed,
  timeZone,
  title,
  description,
}: CalendarFeedCardProps) {
  const create = useCreateCalendarFeed(orgId);
  const revoke = useRevokeCalendarFeed(orgId);
  const [confirming, setConfirming] = useState<'revoke' | 'replace' | null>(null);
  const [copied, setCopied] = useState(false);
  const inputId = useId();
  const label = scope === 'farm' ? 'Farm calendar address' : 'Your calendar address';

  const copy = async () => {
    if (!feed) return;
    try {
      await navigator.clipboard.writeText(feed.url);
      setCopied(true);
    } catch {
      // no clipboard access (plain http, old browser): the address stays selectable
      setCopied(false);
    }
  };

  return (
    <Card className="flex flex-col gap-3">
      <h3 className="text-lg font-black text-field-900">{title}</h3>
      <p className="text-field-700">{description}</p>
      {create.error ? <Alert>{errorText(create.error)}</Alert> : null}
      {feed ? (
        <>
          <div className="flex flex-col gap-1.5">
            <label htmlFor={inputId} className="font-bold text-field-900">
              {label}
            </label>
            <input
              id={inputId}
              readOnly
              value={feed.url}
              onFocus={(event) => event.currentTarget.select()}
              className="min-h-touch w-full rounded-lg border border-field-300 bg-field-50 px-3 py-2 font-mono text-sm text-field-950"
            />
            <p className="text-sm text-field-600">
              Created {formatDate(feed.createdAt, timeZone)}. Add it in your calendar app as a
              subscription (“from URL”). Anyone with this address can read the dates: keep it
              private, and revoke it if it gets out.
            </p>
          </div>
          {copied ? <Alert tone="success">Address copied.</Alert> : null}
          <div className="flex flex-col gap-2 sm:flex-row">
            <Button icon="check" onClick={() => void copy()}>
              Copy address
            </Button>
            <Button variant="secondary" icon="refresh" onClick={() => setConfirming('replace')}>
              New link
            </Button>
            <Button variant="ghost" icon="close" onClick={() => setConfirming('revoke')}>
              Revoke
            </Button>
          </div>
        </>
      ) : (
        <div>
          <Button
            icon="plus"
            pending={create.isPending}
            onClick={() => create.mutate(scope)}
            className="w-full sm:w-auto"
          >
            Create feed link
          </Button>
        </div>
      )}
      <ConfirmDialog
        open={confirming !== null}
        title={confirming === 'replace' ? 'Make a new link?' : 'Revoke this link?'}
        confirmLabel={confirming === 'replace' ? 'Make a new link' : 'Revoke'}
        pending={create.isPending || revoke.isPending}
        error={errorText(confirming === 'replace' ? create.error : revoke.error)}
        onCancel={() => {
          setConfirming(null);
          revoke.reset();
          create.reset();
        }}
        onConfirm={() => {
          if (!feed) return;
          const done = { onSuccess: () => setConfirming(null) };
          setCopied(false);
          if (confirming === 'replace') create.mutate(scope, done);
          else revoke.mutate(feed.id, done);
        }}
      >
        Calendars subscribed to the current address stop updating
        {confirming === 'replace' ? ' until you give them the new one' : ''}.
      </ConfirmDialog>
    </Card>
  );
}
