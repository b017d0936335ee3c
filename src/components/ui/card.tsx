import { useId, type ReactNode } from 'react';
import { cx } from './cx';

export function Card({ children, className }: { children: ReactNode; className?: string }) {
  return (
    <div
      className={cx(
        'rounded-xl border border-field-200 bg-white p-4 shadow-card sm:p-6',
        className,
      )}
    >
      {children}
    </div>
  );
}

/** A titled block of a page; the heading level follows the page's h1. */
export function Section({
  title,
  description,
  actions,
  children,
}: {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div>
          <h2 id={headingId} className="text-xl font-black text-field-900">
            {title}
          </h2>
          {description ? <p className="text-field-600">{description}</p> : null}
        </div>
        {actions}
      </div>
      {children}
    </section>
  );
}
