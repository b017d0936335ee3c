import { Fragment } from 'react';

const URL_PATTERN = /(https?:\/\/[^\s<>"')\]]+)/g;

/** Plain text with its web addresses turned into links, so a reset link can be followed. */
export function LinkifiedText({ text }: { text: string }) {
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
