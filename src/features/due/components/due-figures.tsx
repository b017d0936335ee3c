import {
  dueDateText,
  projectionWords,
  remainingDaysText,
  remainingMeterText,
  seasonDueText,
} from '../../../lib/due-format';
import { formatMeter } from '../../../lib/fleet-format';
import type { DueRow } from '../api/types';
import { GOVERNS_TEXT } from './due-format';

// The figures of one due row, used by both the table (desk) and the cards (phone).

const muted = 'text-sm text-field-600';

/** The due meter value and/or due date, and which of the two falls first. */
export function DueAtFigure({ row }: { row: DueRow }) {
  const { dueMeter, dueDate, governs, season } = row.due;
  if (row.due.status === 'history_unknown')
    return <span className={muted}>Not known until last done is set</span>;
  if (dueMeter === null && dueDate === null)
    return (
      <span className={muted}>
        {season ? `Season service: ${seasonDueText(season)}` : 'Not scheduled'}
      </span>
    );
  return (
    <div className="flex flex-col">
      {dueMeter !== null ? (
        <span className={governs === 'meter' ? 'font-bold' : undefined}>
          {/* a due value from before the meter fitted now was fitted is said on the lifetime scale */}
          <span className="whitespace-nowrap">
            {formatMeter(
              row.dueOnMeter !== null && row.dueOnMeter >= 0 ? row.dueOnMeter : dueMeter,
              row.machine.meterUnit,
            )}
          </span>
          {row.dueOnMeter !== null && row.dueOnMeter !== dueMeter ? (
            <span className="block text-xs font-normal text-field-600">
              {row.dueOnMeter >= 0
                ? `on the meter fitted now (${formatMeter(dueMeter, row.machine.meterUnit)} lifetime)`
                : 'lifetime (before the meter fitted now)'}
            </span>
          ) : null}
        </span>
      ) : null}
      {dueDate !== null ? (
        <span className={governs === 'calendar' ? 'font-bold' : undefined}>
          {dueDateText(dueDate)}
        </span>
      ) : null}
      {season ? <span className={muted}>{seasonDueText(season)}</span> : null}
      {governs && dueMeter !== null && dueDate !== null ? (
        <span className={muted}>{GOVERNS_TEXT[governs]}</span>
      ) : null}
    </div>
  );
}

/**
 * The date the meter is projected to reach its due value, with its spread and the before-the-peak
 * advice; for an overdue task no projection, only what passed (its meter value or its date).
 */
export function ProjectedFigure({ row }: { row: DueRow }) {
  const { status, dueMeter } = row.due;
  const unit = row.machine.meterUnit;
  if (status === 'no_forecast')
    return (
      <span className={muted}>
        {row.usage && row.usage.method !== 'none'
          ? 'Meter not moving: no date'
          : 'Not enough readings'}
      </span>
    );
  if (status === 'history_unknown') return <span className={muted}>—</span>;
  // overdue: the badge and Remaining say it and how far; a projection into a later year is noise
  if (status === 'overdue')
    return (
      <span className={muted}>
        {(row.due.remainingMeter ?? 1) <= 0 ? 'Already reached' : 'Date passed'}
      </span>
    );
  const projection = projectionWords(row.due, unit);
  if (!projection)
    return <span className={muted}>{dueMeter === null ? 'Calendar only' : '—'}</span>;
  return (
    <div className="flex flex-col">
      <span>{projection.date}</span>
      {projection.spread ? <span className={muted}>{projection.spread}</span> : null}
      {projection.beforePeak ? (
        <span className="text-sm font-bold text-straw-900">{projection.beforePeak}</span>
      ) : null}
    </div>
  );
}

/** What is left (or how far past) in meter units and in days, as the server counted them. */
export function RemainingFigure({ row }: { row: DueRow }) {
  const { remainingMeter, remainingDays, status } = row.due;
  const tone = status === 'overdue' ? 'font-bold text-poppy-800' : undefined;
  if (remainingMeter === null && remainingDays === null) return <span className={muted}>—</span>;
  return (
    <div className={`flex flex-col ${tone ?? ''}`}>
      {remainingMeter !== null ? (
        <span>{remainingMeterText(remainingMeter, row.machine.meterUnit)}</span>
      ) : null}
      {remainingDays !== null ? <span>{remainingDaysText(remainingDays)}</span> : null}
    </div>
  );
}
