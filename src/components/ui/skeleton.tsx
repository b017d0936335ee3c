import type { ReactNode } from 'react';
import { cx } from './cx';

// Skeletons keep the page's shape while data loads, so nothing jumps when it arrives.
// The container says "Loading" once to assistive technology; the blocks are decoration.

export function Skeleton({ className }: { className?: string }) {
  return (
    <span
      aria-hidden="true"
      className={cx('block animate-pulse rounded bg-field-100', className)}
    />
  );
}

export function LoadingRegion({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div role="status">
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}

/** Rows of a list that is on its way: one line of title, one of detail, per row. */
export function ListSkeleton({ rows = 3, label = 'Loading' }: { rows?: number; label?: string }) {
  return (
    <LoadingRegion label={label}>
      <ul className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white">
        {Array.from({ length: rows }, (_, index) => (
          <li key={index} className="flex items-center gap-3 p-4">
            <Skeleton className="size-10 rounded-full" />
            <div className="flex flex-1 flex-col gap-2">
              <Skeleton className="h-4 w-2/5" />
              <Skeleton className="h-3 w-3/5" />
            </div>
          </li>
        ))}
      </ul>
    </LoadingRegion>
  );
}

/** A page that is on its way: heading and a couple of blocks. */
export function PageSkeleton({ label = 'Loading page' }: { label?: string }) {
  return (
    <LoadingRegion label={label}>
      <div className="flex flex-col gap-4">
        <Skeleton className="h-8 w-48" />
        <Skeleton className="h-4 w-72 max-w-full" />
        <Skeleton className="mt-2 h-32 w-full rounded-xl" />
      </div>
    </LoadingRegion>
  );
}
