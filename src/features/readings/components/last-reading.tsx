import { TZDate } from '@date-fns/tz';
import { format, formatDistanceToNowStrict } from 'date-fns';
import { formatMeter } from '../../../lib/fleet-format';

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
  const exact = format(new TZDate(takenAt.getTime(), timeZone), 'd MMM yyyy, HH:mm');
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
