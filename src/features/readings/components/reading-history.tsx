import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import type { MeterReplacement, Reading } from '../api/types';
import { ReadingRow } from './reading-row';

const PAGE = 10;

/** The readings, newest first, a few at a time; replacements shown where they happened. */
export function ReadingHistory({
  orgId,
  machineId,
  readings,
  replacements,
  unit,
  units,
  timeZone,
  canCorrect,
}: {
  orgId: string;
  machineId: string;
  readings: Reading[];
  replacements: MeterReplacement[];
  unit: string;
  units: UnitSystem;
  timeZone: string;
  canCorrect: boolean;
}) {
  const [shown, setShown] = useState(PAGE);
  if (readings.length === 0) {
    return (
      <EmptyState icon="gauge" title="No readings yet">
        <p>The first reading starts the meter history; a few more make a forecast.</p>
      </EmptyState>
    );
  }
  const visible = readings.slice(0, shown);
  return (
    <div className="flex flex-col gap-3">
      <ol
        aria-label="Reading history"
        className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
      >
        {visible.map((reading, index) => (
          <ReadingRow
            key={reading.id}
            orgId={orgId}
            machineId={machineId}
            reading={reading}
            replacementBefore={replacementBetween(replacements, reading, readings[index + 1])}
            unit={unit}
            units={units}
            timeZone={timeZone}
            canCorrect={canCorrect}
          />
        ))}
      </ol>
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-field-700">
          Showing {visible.length} of {readings.length} readings
        </p>
        {shown < readings.length ? (
          <Button variant="secondary" onClick={() => setShown((n) => n + PAGE * 3)}>
            Show more readings
          </Button>
        ) : null}
      </div>
    </div>
  );
}

/** The replacement that happened between this reading and the older one after it in the list. */
function replacementBetween(
  replacements: MeterReplacement[],
  reading: Reading,
  older: Reading | undefined,
): MeterReplacement | null {
  // the oldest reading has nothing older: a replacement before it is not shown against it
  if (!older) return null;
  const at = new Date(reading.takenAt).getTime();
  const olderAt = new Date(older.takenAt).getTime();
  return (
    replacements.find((r) => {
      const t = new Date(r.replacedAt).getTime();
      return t <= at && t > olderAt;
    }) ?? null
  );
}
