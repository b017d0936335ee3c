import type { DuePoint } from '../../../../shared/domain/types';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { fittedMeterText, projectionWords, seasonDueText } from '../../../lib/due-format';
import { describeRemaining } from '../lib/task-text';

const GOVERNS: Record<'meter' | 'calendar', string> = {
  meter: 'Meter comes first',
  calendar: 'Calendar comes first',
};

const BASIS: Record<DuePoint['basis'], string | null> = {
  recorded: null,
  first_service: 'First service (break-in point)',
  assumed: 'Never recorded as done: counted from the first reading',
  counted: 'Last service not known: counted from the start set for it',
  unknown: null,
};

/**
 * The figures of one due point, all as the server computed them. `meterOffset` is the lifetime
 * value minus what the meter fitted now shows (non-zero after a meter replacement): the due meter
 * is then said on the fitted meter, with the lifetime value in brackets.
 */
export function DuePointDetails({
  due,
  unit,
  meterOffset = 0,
}: {
  due: DuePoint;
  unit: string;
  meterOffset?: number;
}) {
  const remaining = describeRemaining(due.remainingMeter, due.remainingDays, unit);
  const rows: { term: string; detail: string }[] = [];
  if (due.dueMeter !== null)
    rows.push({
      term: 'Due meter',
      detail: meterOffset
        ? fittedMeterText(due.dueMeter - meterOffset, due.dueMeter, unit)
        : formatMeter(due.dueMeter, unit),
    });
  if (due.dueDate !== null) rows.push({ term: 'Due date', detail: formatLocalDate(due.dueDate) });
  if (due.season) rows.push({ term: 'Season service', detail: seasonDueText(due.season) });
  // an overdue task says how far over it is (Remaining), not a projection into a later year
  const projection = projectionWords(due, unit);
  if (projection) {
    rows.push({
      term: 'Meter reaches it',
      detail: `about ${projection.date}${projection.spread ? ` (${projection.spread})` : ''}`,
    });
    if (projection.beforePeak)
      rows.push({ term: 'Before the season', detail: projection.beforePeak });
  } else if (due.dueMeter !== null && due.status !== 'overdue') {
    rows.push({ term: 'Meter reaches it', detail: 'No projected date' });
  }
  if (due.governs) rows.push({ term: 'Governs', detail: GOVERNS[due.governs] });
  if (remaining) rows.push({ term: 'Remaining', detail: remaining });
  const basis = BASIS[due.basis];

  return (
    <div className="flex flex-col gap-2">
      <dl className="grid grid-cols-1 gap-x-6 gap-y-1 sm:grid-cols-2">
        {rows.map((row) => (
          <div key={row.term} className="flex flex-wrap gap-x-2">
            <dt className="text-field-600">{row.term}</dt>
            <dd className="font-bold text-field-950 tabular-nums">{row.detail}</dd>
          </div>
        ))}
      </dl>
      {basis ? <p className="text-sm text-field-600">{basis}</p> : null}
    </div>
  );
}
