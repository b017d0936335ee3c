import { cx } from '../ui/cx';

/** The Hourstone mark (a field stone with a meter dial) and wordmark. */
export function BrandMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={cx('shrink-0', className)}>
      <path
        d="M6 20.5C4.4 14.2 8.2 6.5 15.6 5.2c6.7-1.2 11.3 3.6 11 10.1-.3 6.9-4.8 11.4-11.3 11.6C10.6 27 7.1 24.6 6 20.5z"
        fill="currentColor"
      />
      <circle cx="16" cy="16" r="6.5" fill="none" stroke="#e9b949" strokeWidth="2" />
      <path d="M16 16l3.6-2.4" stroke="#f6f1e7" strokeWidth="2" strokeLinecap="round" />
      <circle cx="16" cy="16" r="1.4" fill="#f6f1e7" />
    </svg>
  );
}

export function Brand({ compact = false }: { compact?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2 text-field-900">
      <BrandMark className="size-8" />
      <span
        className={cx('text-lg font-black tracking-tight', compact && 'sr-only sm:not-sr-only')}
      >
        Hourstone
      </span>
    </span>
  );
}
