import { Icon } from '../../../components/ui/icons';
import { dueDateText, dueSpreadText, overText } from '../../../lib/due-format';
import type { BoardRow } from '../api/types';
import { isStaleReading, meterText, readingAgeText } from './dealer-format';

/** The due meter value (as the meter fitted now reads) and the calendar limit, if any. */
export function DueAt({ row }: { row: BoardRow }) {
  // a due value from before the meter fitted now was fitted is said on the lifetime scale
  const meter = row.dueOnMeter !== null && row.dueOnMeter >= 0 ? row.dueOnMeter : row.due.dueMeter;
  return (
    <span className="flex flex-col">
      {meter !== null ? (
        <span className="whitespace-nowrap tabular-nums">
          {meterText(meter, row.machine.meterUnit)}
        </span>
      ) : null}
      {row.due.dueDate ? (
        <span className="text-sm text-field-600">
          {meter !== null ? 'or by' : 'by'} {dueDateText(row.due.dueDate)}
        </span>
      ) : null}
      {meter === null && !row.due.dueDate ? <span className="text-field-600">—</span> : null}
    </span>
  );
}

/** The date it falls due and the projected range (slower and faster use). */
export function Projected({ row }: { row: BoardRow }) {
  // past its meter or its date: overdue, with how far, never "falls due today"
  if (row.due.status === 'overdue')
    return (
      <span className="flex flex-col font-bold text-poppy-800">
        <span>Overdue</span>
        <span className="text-sm">{overText(row.due, row.machine.meterUnit)}</span>
      </span>
    );
  // two outcomes in short beside the likelier date (the task's page gives both ranges)
  const range = dueSpreadText(row.due, { compact: true });
  if (!row.due.effectiveDate && !range) return <span className="text-field-600">No forecast</span>;
  return (
    <span className="flex max-w-48 flex-col">
      {row.due.effectiveDate ? <span>{dueDateText(row.due.effectiveDate)}</span> : null}
      {range ? <span className="text-sm text-field-600">{range}</span> : null}
    </span>
  );
}

/** How old the last reading is: the forecast is only as fresh as the meter. */
export function ReadingAge({ row }: { row: BoardRow }) {
  const stale = isStaleReading(row.lastReadingAgeDays);
  return (
    <span className="flex flex-col">
      <span className={stale ? 'flex items-center gap-1 font-bold text-straw-900' : undefined}>
        {stale ? <Icon name="alert" className="size-4" /> : null}
        {readingAgeText(row.lastReadingAgeDays)}
      </span>
      {row.lastReading ? (
        <span className="whitespace-nowrap text-sm text-field-600 tabular-nums">
          at {meterText(row.lastReading.value, row.machine.meterUnit)}
        </span>
      ) : null}
    </span>
  );
}
