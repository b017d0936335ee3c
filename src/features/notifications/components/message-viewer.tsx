import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { buttonClasses } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { Icon } from '../../../components/ui/icons';
import { PageSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useMessage } from '../api/get-message';
import { MessageBody } from '../../../components/ui/message-body';
import { kindLabel } from './message-list';
import { MessageStatusBadge } from './message-status-badge';

interface MessageViewerProps {
  orgId: string;
  messageId: string;
  timeZone: string;
  backHref: string;
}

/** One message of the outbox: who, what, what happened when sending, and the content. */
export function MessageViewer({ orgId, messageId, timeZone, backHref }: MessageViewerProps) {
  const message = useMessage(orgId, messageId);
  const back = (
    <Link to={backHref} className={buttonClasses('ghost', 'self-start')}>
      <Icon name="back" />
      All messages
    </Link>
  );

  if (message.isPending) return <PageSkeleton label="Loading the message" />;
  if (message.isError) {
    const missing = isApiError(message.error) && message.error.status === 404;
    return (
      <div className="flex flex-col gap-4">
        {back}
        <ErrorState
          title={missing ? 'No such message' : "The message didn't load"}
          message={missing ? 'It is not in this organization’s outbox.' : message.error.message}
          onRetry={missing ? undefined : () => message.refetch()}
          retrying={message.isRefetching}
        />
      </div>
    );
  }

  const m = message.data;
  return (
    <div className="flex flex-col gap-4">
      {back}
      <article
        aria-labelledby="message-subject"
        className="flex flex-col gap-4 rounded-xl border border-field-200 bg-white p-4 shadow-card"
      >
        <header className="flex flex-col gap-2">
          <h2 id="message-subject" className="text-xl font-black break-words text-field-950">
            {m.subject}
          </h2>
          <div className="flex flex-wrap gap-2">
            <Badge>{kindLabel(m.kind)}</Badge>
            <MessageStatusBadge status={m.status} />
          </div>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm text-field-700">
            <dt>To</dt>
            <dd className="break-all">{m.recipient}</dd>
            <dt>Written</dt>
            <dd>{formatDateTime(m.createdAt, timeZone)}</dd>
            {m.sentAt ? (
              <>
                <dt>Sent</dt>
                <dd>{formatDateTime(m.sentAt, timeZone)}</dd>
              </>
            ) : null}
            <dt>Attempts</dt>
            <dd>{m.attempts}</dd>
            {m.status === 'queued' && m.nextAttemptAt ? (
              <>
                <dt>Next try</dt>
                <dd>{formatDateTime(m.nextAttemptAt, timeZone)}</dd>
              </>
            ) : null}
          </dl>
        </header>
        {m.lastError && m.status !== 'sent' ? (
          <Alert tone={m.status === 'failed' ? 'error' : 'warning'} title="Last error">
            <span className="break-words">{m.lastError}</span>
          </Alert>
        ) : null}
        {m.status === 'failed' ? (
          <p className="text-field-700">
            Hourstone stopped trying after {m.attempts} attempts. Check the mail server settings
            (SMTP_URL).
          </p>
        ) : null}
        <MessageBody subject={m.subject} text={m.text} html={m.html} />
      </article>
    </div>
  );
}
