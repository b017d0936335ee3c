import { formatDistanceToNowStrict } from 'date-fns';
import { formatMeter } from '../../../lib/fleet-format';
import { formatDateTime } from '../../../lib/format';

/** "3,118 h · 2 days ago", with the exact farm-local time on hover and for machines. */
export function LastReading({
  reading,
  unit,
  timeZone,
}: {
  reading: { value: number; takenAt: string } | null;
  unit: string;
  timeZone: string;
}) {
  if (!reading) return <span className="text-field-600">No reading yet</span>;
  const takenAt = new Date(reading.takenAt);
  const exact = formatDateTime(reading.takenAt, timeZone);
  const ago =
    Math.abs(Date.now() - takenAt.getTime()) < 60_000
      ? 'just now'
      : formatDistanceToNowStrict(takenAt, { addSuffix: true });
  return (
    <span>
      <span className="font-bold">{formatMeter(reading.value, unit)}</span>
      {' · '}
      <time dateTime={reading.takenAt} title={exact}>
        {ago}
      </time>
    </span>
  );
}
