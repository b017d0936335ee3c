import { formatDateTime, readerTimeZone } from '../../../lib/format';
import { MessageBody } from '../../../components/ui/message-body';
import type { CaughtMail } from '../api/get-mail';

export function MailViewer({ message }: { message: CaughtMail }) {
  return (
    <article
      aria-labelledby="mail-subject"
      className="flex flex-col gap-4 rounded-xl border border-field-200 bg-white p-4 shadow-card"
    >
      <header className="flex flex-col gap-1">
        <h2 id="mail-subject" className="text-xl font-black text-field-950">
          {message.subject || '(no subject)'}
        </h2>
        <dl className="grid grid-cols-[auto_1fr] gap-x-3 text-sm text-field-700">
          <dt>From</dt>
          <dd className="break-all">{message.from}</dd>
          <dt>To</dt>
          <dd className="break-all">{message.to.join(', ')}</dd>
          <dt>Date</dt>
          <dd>{message.date ? formatDateTime(message.date, readerTimeZone()) : '—'}</dd>
        </dl>
      </header>

      <MessageBody
        subject={message.subject}
        text={message.text}
        html={message.html}
        defaultView={message.html ? 'html' : 'text'}
        links="same-tab"
      />
    </article>
  );
}
