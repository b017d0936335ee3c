import type { HitchLog, HitchSpan as HitchSpanJson } from '../../shared/schemas/hitch';
import type { HitchLogRow } from '../services/hitch-log';

/** A span as the hitch log lists it. */
export const presentHitchSpan = (row: HitchLogRow): HitchSpanJson => ({
  id: row.id,
  implement: row.implement,
  tractor: row.tractor,
  meterKind: row.meterKind,
  startedAt: row.startedAt.toISOString(),
  endedAt: row.endedAt?.toISOString() ?? null,
  note: row.note,
  enteredBy: row.enteredBy,
  hours: row.hours,
});

/** A machine's hitch log: its spans, the implement's hours from hitching, what the caller may do. */
export const presentHitchLog = (log: {
  spans: HitchLogRow[];
  hitchHours: number;
  abilities: HitchLog['abilities'];
}): HitchLog => ({
  spans: log.spans.map(presentHitchSpan),
  hitchHours: log.hitchHours,
  abilities: log.abilities,
});
