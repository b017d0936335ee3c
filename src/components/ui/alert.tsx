import type { ReactNode } from 'react';
import { cx } from './cx';
import { Icon, type IconName } from './icons';

export type AlertTone = 'error' | 'warning' | 'info' | 'success';

const TONES: Record<AlertTone, { classes: string; icon: IconName; label: string }> = {
  error: { classes: 'border-poppy-300 bg-poppy-50 text-poppy-800', icon: 'error', label: 'Error' },
  warning: {
    classes: 'border-straw-400 bg-straw-50 text-straw-900',
    icon: 'alert',
    label: 'Warning',
  },
  info: { classes: 'border-sky-300 bg-sky-50 text-sky-900', icon: 'info', label: 'Note' },
  success: {
    classes: 'border-clover-300 bg-clover-50 text-clover-800',
    icon: 'check',
    label: 'Done',
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
 * (role="status"). The tone is spelled out for screen readers, not only coloured.
 */
export function Alert({ tone = 'error', title, children, className }: AlertProps) {
  const { classes, icon, label } = TONES[tone];
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cx('flex gap-3 rounded-lg border-2 p-3', classes, className)}
    >
      <Icon name={icon} className="mt-0.5 size-5" />
      <div className="min-w-0 flex-1">
        <span className="sr-only">{label}: </span>
        {title ? <p className="font-bold">{title}</p> : null}
        <div className={title ? 'mt-0.5' : undefined}>{children}</div>
      </div>
    </div>
  );
}
