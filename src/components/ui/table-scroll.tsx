import type { ReactNode } from 'react';
import { cx } from './cx';

/**
 * The frame of a table that may be wider than a phone. Where it has to scroll sideways, a
 * keyboard must be able to scroll it too: the frame is a named, focusable region (WCAG 2.1.1;
 * axe's scrollable-region-focusable). Tables should still be laid out to fit, so their key
 * columns never depend on this scroll.
 */
export function TableScroll({
  label,
  children,
  className,
}: {
  /** the region's name, as the table's caption reads */
  label: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div
      role="region"
      aria-label={label}
      tabIndex={0}
      className={cx(
        'overflow-x-auto rounded-xl border border-field-200 bg-white shadow-card focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-field-800',
        className,
      )}
    >
      {children}
    </div>
  );
}
