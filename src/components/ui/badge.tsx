import type { ReactNode } from 'react';
import { cx } from './cx';
import { Icon, type IconName } from './icons';

export type BadgeTone = 'neutral' | 'ok' | 'due-soon' | 'overdue' | 'info' | 'accent';

const TONES: Record<BadgeTone, string> = {
  neutral: 'bg-field-100 text-field-800 border-field-200',
  ok: 'bg-clover-50 text-clover-800 border-clover-200',
  'due-soon': 'bg-straw-100 text-straw-900 border-straw-300',
  overdue: 'bg-poppy-50 text-poppy-800 border-poppy-300',
  info: 'bg-sky-50 text-sky-800 border-sky-200',
  accent: 'bg-loam-50 text-loam-800 border-loam-200',
};

/** A short label. Tone adds colour; the text (and the optional icon) carry the meaning. */
export function Badge({
  tone = 'neutral',
  icon,
  children,
  className,
}: {
  tone?: BadgeTone;
  icon?: IconName;
  children: ReactNode;
  className?: string;
}) {
  return (
    <span
      className={cx(
        'inline-flex items-center gap-1 rounded-full border px-2.5 py-0.5 text-sm font-bold whitespace-nowrap',
        TONES[tone],
        className,
      )}
    >
      {icon ? <Icon name={icon} className="size-4" /> : null}
      {children}
    </span>
  );
}
