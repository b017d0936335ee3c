import { useState } from 'react';
import { cx } from './cx';
import { LinkifiedText } from './linkified-text';

type View = 'html' | 'text';

// The HTML part renders like mail: in a sandboxed frame with no scripts and no access to this
// page. `same-tab` lets a click on its links navigate this tab (the caught-mail page, where following
// invitation and reset links is the point); `new-tab` opens them beside the app.
const SANDBOX = {
  'same-tab': 'allow-popups allow-popups-to-escape-sandbox allow-top-navigation-by-user-activation',
  'new-tab': 'allow-popups allow-popups-to-escape-sandbox',
} as const;
const framed = (html: string, target: '_top' | '_blank') =>
  `<!doctype html><base target="${target}">${html}`;

/** A message's content: plain text with live links, or its formatted HTML part, with a switch. */
export function MessageBody({
  subject,
  text,
  html,
  defaultView = 'text',
  links = 'new-tab',
}: {
  subject: string;
  text: string;
  html: string | null;
  defaultView?: View;
  links?: keyof typeof SANDBOX;
}) {
  const [view, setView] = useState<View>(defaultView);
  const shown: View = html ? view : 'text';
  const options: View[] = defaultView === 'html' ? ['html', 'text'] : ['text', 'html'];
  return (
    <div className="flex flex-col gap-3">
      {html ? (
        <fieldset className="flex gap-2">
          <legend className="sr-only">Show the message as</legend>
          {options.map((option) => (
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
          sandbox={SANDBOX[links]}
          srcDoc={framed(html, links === 'same-tab' ? '_top' : '_blank')}
          className="h-[60dvh] w-full rounded-lg border border-field-200 bg-white"
        />
      ) : (
        <div className="rounded-lg border border-field-200 bg-oat-50 p-4">
          <LinkifiedText text={text} />
        </div>
      )}
    </div>
  );
}
