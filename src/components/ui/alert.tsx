import type { ReactNode } from 'react';
import { cx } from './cx';
import { Icon, type IconName } from './icons';

export type AlertTone = 'error' | 'warning' | 'info' | 'success';

// Each tone has its own icon as well as its colour; the words carry the message.
const TONES: Record<AlertTone, { classes: string; icon: IconName }> = {
  error: { classes: 'border-poppy-300 bg-poppy-50 text-poppy-800', icon: 'error' },
  warning: {
    classes: 'border-straw-400 bg-straw-50 text-straw-900',
    icon: 'alert',
  },
  info: { classes: 'border-sky-300 bg-sky-50 text-sky-900', icon: 'info' },
  success: {
    classes: 'border-clover-300 bg-clover-50 text-clover-800',
    icon: 'check',
  },
};

interface AlertProps {
  tone?: AlertTone;
  title?: string;
  children: ReactNode;
  className?: string;
}

/**
 * A message box. Errors are announced at once (role="alert"); the other tones politely
 * (role="status"). The text itself is exactly the message, so it reads the same to everyone.
 */
export function Alert({ tone = 'error', title, children, className }: AlertProps) {
  const { classes, icon } = TONES[tone];
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cx('flex gap-3 rounded-lg border-2 p-3', classes, className)}
    >
      <Icon name={icon} className="mt-0.5 size-5" />
      <div className="min-w-0 flex-1">
        {title ? <p className="font-bold">{title}</p> : null}
        <div className={title ? 'mt-0.5' : undefined}>{children}</div>
      </div>
    </div>
  );
}
