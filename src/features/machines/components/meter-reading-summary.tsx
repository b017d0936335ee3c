import { STALE_READING_DAYS } from '../../../../shared/constants';
import { Icon } from '../../../components/ui/icons';
import { cx } from '../../../components/ui/cx';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { formatMeter } from '../../../lib/fleet-format';
import type { LastReading } from '../api/types';

const DAY_MS = 86_400_000;

/** The meter column: last (lifetime) reading with its unit, and how old it is. */
export function MeterReadingSummary({
  lastReading,
  unit,
  timeZone,
  className,
}: {
  lastReading: LastReading | null;
  unit: string;
  timeZone: string;
  className?: string;
}) {
  if (!lastReading) {
    return <span className={cx('text-field-600', className)}>No readings yet</span>;
  }
  const days = (Date.now() - new Date(lastReading.takenAt).getTime()) / DAY_MS;
  const stale = days >= STALE_READING_DAYS;
  return (
    <span className={cx('flex flex-col', className)}>
      <span className="font-bold whitespace-nowrap text-field-950 tabular-nums">
        {formatMeter(lastReading.value, unit)}
      </span>
      <span
        className={cx(
          'flex items-center gap-1 text-sm',
          stale ? 'font-bold text-straw-800' : 'text-field-600',
        )}
        title={formatDateTime(lastReading.takenAt, timeZone)}
      >
        {stale ? <Icon name="clock" className="size-4" /> : null}
        {formatRelative(lastReading.takenAt)}
        {stale ? <span className="sr-only"> (no recent reading)</span> : null}
      </span>
    </span>
  );
}
