import { Fragment, useState } from 'react';
import { cx } from '../../../components/ui/cx';

const URL_PATTERN = /(https?:\/\/[^\s<>"')\]]+)/g;

// The HTML part is markup we generated but still render it like mail: in a sandboxed frame with
// no scripts and no access to this page; links open in a new tab.
const SANDBOX = 'allow-popups allow-popups-to-escape-sandbox';
const framed = (html: string) => `<!doctype html><base target="_blank">${html}`;

function LinkedText({ text }: { text: string }) {
  const parts = text.split(URL_PATTERN);
  return (
    <pre className="font-sans text-base break-words whitespace-pre-wrap text-field-900">
      {parts.map((part, index) =>
        index % 2 === 1 ? (
          <a
            key={index}
            href={part}
            className="font-bold break-all text-sky-700 underline underline-offset-2"
          >
            {part}
          </a>
        ) : (
          <Fragment key={index}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}

/** A message's content: plain text (links live), or the formatted HTML part as the person saw it. */
export function MessageBody({
  subject,
  text,
  html,
}: {
  subject: string;
  text: string;
  html: string | null;
}) {
  const [view, setView] = useState<'text' | 'html'>('text');
  const shown = html ? view : 'text';
  return (
    <div className="flex flex-col gap-3">
      {html ? (
        <fieldset className="flex gap-2">
          <legend className="sr-only">Show the message as</legend>
          {(['text', 'html'] as const).map((option) => (
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
                name="message-view"
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
      {shown === 'html' && html ? (
        <iframe
          title={`Message: ${subject}`}
          sandbox={SANDBOX}
          srcDoc={framed(html)}
          className="h-[60dvh] w-full rounded-lg border border-field-200 bg-white"
        />
      ) : (
        <div className="rounded-lg border border-field-200 bg-oat-50 p-4">
          <LinkedText text={text} />
        </div>
      )}
    </div>
  );
}
