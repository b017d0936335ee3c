import { NavLink } from 'react-router-dom';
import { cx } from '../../../components/ui/cx';
import { formatDateTime, readerTimeZone } from '../../../lib/format';
import type { CaughtMail } from '../api/get-mail';

interface MailListProps {
  messages: CaughtMail[];
  hrefFor: (id: string) => string;
}

export function MailList({ messages, hrefFor }: MailListProps) {
  return (
    <ul
      aria-label="Caught mail"
      className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
    >
      {messages.map((message) => (
        <li key={message.id}>
          <NavLink
            to={hrefFor(message.id)}
            className={({ isActive }) =>
              cx(
                'flex min-h-touch flex-col gap-0.5 px-4 py-3 hover:bg-oat-50',
                isActive && 'bg-straw-50 shadow-[inset_4px_0_0] shadow-straw-500',
              )
            }
          >
            <span className="font-bold text-field-950">{message.subject || '(no subject)'}</span>
            <span className="truncate text-sm text-field-700">To {message.to.join(', ')}</span>
            <span className="text-xs text-field-600">
              {message.date ? formatDateTime(message.date, readerTimeZone()) : 'no date'}
            </span>
          </NavLink>
        </li>
      ))}
    </ul>
  );
}
