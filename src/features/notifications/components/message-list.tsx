import { Link } from 'react-router-dom';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../components/ui/cx';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { formatDateTime } from '../../../lib/format';
import {
  NOTIFICATION_KIND_LABELS,
  NOTIFICATION_STATUSES,
  type NotificationStatusName,
} from '../../../../shared/schemas/notifications';
import { MESSAGES_PAGE_SIZE, useMessages } from '../api/get-messages';
import type { MessageFilters } from '../api/types';
import type { SentMessage } from '../api/types';
import { MessageStatusBadge, messageStatusLabel } from './message-status-badge';

/** A kind the labels do not know yet still reads as words: "frost_alert" → "Frost alert". */
export const kindLabel = (kind: string) =>
  NOTIFICATION_KIND_LABELS[kind] ?? kind.charAt(0).toUpperCase() + kind.slice(1).replace(/_/g, ' ');

interface MessageListProps {
  orgId: string;
  timeZone: string;
  filters: MessageFilters;
  onFiltersChange: (next: MessageFilters) => void;
  messageHref: (id: string) => string;
}

function MessageRow({
  message,
  timeZone,
  href,
}: {
  message: SentMessage;
  timeZone: string;
  href: string;
}) {
  const when = message.sentAt ?? message.createdAt;
  return (
    <li>
      <Link
        to={href}
        className="flex flex-col gap-2 p-4 hover:bg-field-50 focus-visible:bg-field-50 sm:flex-row sm:items-start"
      >
        <div className="min-w-0 flex-1">
          <p className="font-bold break-words text-field-950">{message.subject}</p>
          <p className="truncate text-sm text-field-600">To {message.recipient}</p>
          <p className="mt-1 text-sm text-field-600">
            <time dateTime={when}>
              {message.sentAt ? 'Sent ' : 'Written '}
              {formatDateTime(when, timeZone)}
            </time>
            {' · '}
            {message.attempts === 1 ? '1 attempt' : `${message.attempts} attempts`}
            {message.status === 'queued' && message.nextAttemptAt ? (
              <> · next try {formatDateTime(message.nextAttemptAt, timeZone)}</>
            ) : null}
          </p>
          {message.lastError && message.status !== 'sent' ? (
            <p className="mt-1 text-sm break-words text-poppy-800">
              Last error: {message.lastError}
            </p>
          ) : null}
        </div>
        <div className="flex flex-wrap gap-2 sm:justify-end">
          <Badge>{kindLabel(message.kind)}</Badge>
          <MessageStatusBadge status={message.status} />
        </div>
      </Link>
    </li>
  );
}

/** The outbox, newest first, filtered by status, a page at a time. */
export function MessageList({
  orgId,
  timeZone,
  filters,
  onFiltersChange,
  messageHref,
}: MessageListProps) {
  const messages = useMessages(orgId, filters);
  const counts = messages.data?.meta.counts;
  const choices: { value: NotificationStatusName | undefined; label: string }[] = [
    { value: undefined, label: 'All' },
    ...NOTIFICATION_STATUSES.map((status) => ({
      value: status,
      label: messageStatusLabel(status),
    })),
  ];

  return (
    <div className="flex flex-col gap-4">
      <fieldset className="flex flex-wrap gap-2">
        <legend className="sr-only">Show messages</legend>
        {choices.map((choice) => {
          const active = filters.status === choice.value;
          const count = counts
            ? choice.value
              ? counts[choice.value]
              : Object.values(counts).reduce((a, b) => a + b, 0)
            : null;
          return (
            <label
              key={choice.label}
              className={cx(
                'flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border px-3 font-bold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-sky-600',
                active
                  ? 'border-field-800 bg-field-800 text-oat-50'
                  : 'border-field-300 bg-white text-field-800',
              )}
            >
              <input
                type="radio"
                name="message-status"
                className="sr-only"
                checked={active}
                onChange={() => onFiltersChange({ status: choice.value, page: 1 })}
              />
              {choice.label}
              {count !== null ? <span className="font-normal">({count})</span> : null}
            </label>
          );
        })}
      </fieldset>

      {messages.isPending ? (
        <ListSkeleton rows={4} label="Loading messages" />
      ) : messages.isError ? (
        <ErrorState
          title="The messages didn't load"
          message={messages.error.message}
          onRetry={() => messages.refetch()}
          retrying={messages.isRefetching}
        />
      ) : messages.data.data.length === 0 ? (
        <EmptyState
          icon="mail"
          title={filters.status ? 'No messages with this status' : 'No messages yet'}
        >
          Due lists, log-hours reminders, overdue alerts and invitations appear here as soon as
          Hourstone writes them, with what happened when it tried to send them.
        </EmptyState>
      ) : (
        <>
          <ul
            aria-label="Messages"
            className="divide-y divide-field-100 overflow-hidden rounded-xl border border-field-200 bg-white shadow-card"
          >
            {messages.data.data.map((message) => (
              <MessageRow
                key={message.id}
                message={message}
                timeZone={timeZone}
                href={messageHref(message.id)}
              />
            ))}
          </ul>
          <Pager
            page={filters.page}
            total={messages.data.meta.total}
            onPage={(page) => onFiltersChange({ ...filters, page })}
          />
        </>
      )}
    </div>
  );
}

function Pager({
  page,
  total,
  onPage,
}: {
  page: number;
  total: number;
  onPage: (page: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / MESSAGES_PAGE_SIZE));
  if (pages === 1) return null;
  return (
    <nav aria-label="Pages of messages" className="flex items-center justify-between gap-2">
      <Button variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Newer
      </Button>
      <span className="text-field-700">
        Page {page} of {pages}
      </span>
      <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Older
      </Button>
    </nav>
  );
}
