import { DUE_STATUSES } from '../../../shared/constants';
import type { DueStatus } from '../../../shared/domain/types';
import { cx } from './cx';
import { DueStatusBadge } from './status-badges';

export type DueCounts = Record<DueStatus, number>;

const RING: Record<DueStatus, string> = {
  overdue: 'border-poppy-600',
  due_soon: 'border-straw-600',
  history_unknown: 'border-loam-600',
  ok: 'border-clover-600',
  no_forecast: 'border-field-600',
};

/**
 * How many tasks of each status fall inside the horizon. Each count is a toggle button that
 * filters the list to that status (aria-pressed says which one is on); pressing it again clears.
 * Its name is what it shows ("Overdue 4"), so a voice command of the visible words works. On a
 * phone each count is one line (the badge, then the number) so the list below starts on the
 * first screen.
 */
export function StatusCounts({
  counts,
  active,
  onSelect,
  label = 'Task counts',
}: {
  /** the list's accessible name */
  label?: string;
  counts: DueCounts;
  active: DueStatus | null;
  onSelect: (status: DueStatus | null) => void;
}) {
  return (
    <ul
      aria-label={label}
      className="flex flex-wrap gap-2 sm:grid sm:grid-cols-3 sm:gap-3 lg:grid-cols-5"
    >
      {DUE_STATUSES.map((status) => {
        const pressed = active === status;
        return (
          <li key={status}>
            <button
              type="button"
              aria-pressed={pressed}
              onClick={() => onSelect(pressed ? null : status)}
              className={cx(
                'flex min-h-touch flex-row items-center gap-2 rounded-xl border-2 bg-white px-2.5 py-1 text-left sm:w-full shadow-card transition-colors hover:bg-oat-50 sm:flex-col sm:items-start sm:justify-start sm:p-3',
                pressed ? RING[status] : 'border-transparent',
              )}
            >
              <DueStatusBadge status={status} />
              <span className="text-xl font-black text-field-950 tabular-nums sm:text-3xl">
                {counts[status]}
              </span>
              {/* the ring and aria-pressed say it on a phone, where the line would cost a row */}
              <span className="hidden min-h-5 text-sm text-field-600 sm:block">
                {pressed ? 'Showing only these' : null}
              </span>
            </button>
          </li>
        );
      })}
    </ul>
  );
}
