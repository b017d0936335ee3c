import { useState } from 'react';
import { cx } from '../../../components/ui/cx';
import { formatDateTime } from '../../../lib/format';
import type { CaughtMail } from '../api/get-mail';
import { LinkifiedText } from './linkified-text';

// The HTML part is someone else's markup: it renders in a sandboxed frame with no scripts and no
// access to this page. <base target="_top"> plus top navigation on a click lets its links open
// in this tab, which is the point of the page (following invitation and reset links).
const SANDBOX =
  'allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation';
const framed = (html: string) => `<!doctype html><base target="_top">${html}`;

type View = 'html' | 'text';

export function MailViewer({ message }: { message: CaughtMail }) {
  const [view, setView] = useState<View>(message.html ? 'html' : 'text');
  const shown: View = message.html ? view : 'text';

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
          <dd>{message.date ? formatDateTime(message.date) : '—'}</dd>
        </dl>
      </header>

      {message.html ? (
        <fieldset className="flex gap-2">
          <legend className="sr-only">Show the message as</legend>
          {(['html', 'text'] as const).map((option) => (
            <label
              key={option}
              className={cx(
                'flex min-h-touch cursor-pointer items-center gap-2 rounded-lg border px-3 font-bold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-sky-600',
                shown === option
                  ? 'border-field-800 bg-field-800 text-oat-50'
                  : 'border-field-300 text-field-800',
              )}
            >
              <input
                type="radio"
                name="mail-view"
                value={option}
                checked={shown === option}
                onChange={() => setView(option)}
                className="sr-only"
              />
              {option === 'html' ? 'Formatted' : 'Plain text'}
            </label>
          ))}
        </fieldset>
      ) : null}

      {shown === 'html' && message.html ? (
        <iframe
          title={`Message: ${message.subject}`}
          sandbox={SANDBOX}
          srcDoc={framed(message.html)}
          className="h-[60dvh] w-full rounded-lg border border-field-200 bg-white"
        />
      ) : (
        <div className="rounded-lg border border-field-200 bg-oat-50 p-4">
          <LinkifiedText text={message.text} />
        </div>
      )}
    </article>
  );
}
