// An implement's hours from the hitch log, kept as its own readings (source 'hitch'), so the
// forecast, the due points and the charts work on it unchanged. They are derived, never typed:
// each recompute works out the whole set from the spans and the tractors' readings
// (shared/domain/hitch-hours.ts) and writes only the difference — nothing when nothing changed,
// the new readings alone when a hitched tractor logged one, and the implement's summary rebuilt
// when a correction took readings away. Callers hold the tractor's row lock (a reading writer) or
// take it first (the hitch log), then this takes the implement's: always tractor before implement.
import type { Transaction } from 'sequelize';
import { directQuery } from '../db-direct';
import { hitchReadingPoints, type HitchSpanHours } from '../../shared/domain/hitch-hours';
import { refreshMachineForecast } from './forecast';
import { lockMachineReadings } from './reading-neighbours';
import { insertReadingRows } from './reading-rows';

interface SpanReadingRow {
  span_id: string;
  implement_id: string;
  started_at: Date;
  ended_at: Date | null;
  taken_at: Date | null;
  lifetime: number | null;
}

/**
 * Each span of the machine (implement or tractor) with the readings of its tractor's meter that its hours need: those
 * inside it and the nearest either side (the tractor's meter of the span's kind, its primary
 * first when it has two of that kind). One statement; a span without readings comes as one row.
 */
const SPAN_READINGS_SQL = `
  SELECT s.id AS span_id, s.implement_id, s.started_at, s.ended_at, r.taken_at, r.lifetime::float8 AS lifetime
  FROM hitch_spans s
  LEFT JOIN LATERAL (SELECT mm.id FROM machine_meters mm
      WHERE mm.organization_id = s.organization_id AND mm.machine_id = s.tractor_id
        AND mm.kind = s.meter_kind ORDER BY mm.is_primary DESC, mm.position LIMIT 1) tm ON true
  LEFT JOIN LATERAL (
    (SELECT taken_at, lifetime_value AS lifetime FROM meter_readings
      WHERE organization_id = s.organization_id AND meter_id = tm.id
        AND taken_at >= s.started_at AND taken_at <= coalesce(s.ended_at, 'infinity'))
    UNION ALL
    (SELECT taken_at, lifetime_value FROM meter_readings
      WHERE organization_id = s.organization_id AND meter_id = tm.id AND taken_at < s.started_at
      ORDER BY taken_at DESC, lifetime_value DESC LIMIT 1)
    UNION ALL
    (SELECT taken_at, lifetime_value FROM meter_readings
      WHERE organization_id = s.organization_id AND meter_id = tm.id
        AND taken_at > coalesce(s.ended_at, 'infinity')
      ORDER BY taken_at, lifetime_value LIMIT 1)
  ) r ON true
  WHERE s.organization_id = $1 AND (s.implement_id = $2 OR s.tractor_id = $2)
  ORDER BY s.started_at, r.taken_at`;

/**
 * The implement's primary meter, its hitch readings now, and its base: the lifetime value of its
 * last reading of another source before its first span (0 for one that never had a meter).
 */
const IMPLEMENT_SQL = `
  SELECT pm.id AS meter_id,
    (SELECT coalesce(json_agg(json_build_object('id', r.id, 'takenAt', r.taken_at,
              'value', r.value::float8)), '[]')
     FROM meter_readings r WHERE r.organization_id = $1 AND r.meter_id = pm.id
       AND r.source = 'hitch') AS hitch,
    coalesce((SELECT r.lifetime_value::float8 FROM meter_readings r
       WHERE r.organization_id = $1 AND r.meter_id = pm.id AND r.source <> 'hitch'
         AND r.taken_at < (SELECT min(started_at) FROM hitch_spans
                           WHERE organization_id = $1 AND implement_id = $2)
       ORDER BY r.taken_at DESC, r.lifetime_value DESC LIMIT 1), 0) AS base
  FROM machine_meters pm WHERE pm.organization_id = $1 AND pm.machine_id = $2 AND pm.is_primary`;

interface ImplementRow {
  meter_id: string;
  hitch: { id: string; takenAt: string; value: number }[];
  base: number;
}

const twoDecimals = (v: number) => Math.round(v * 100) / 100;

/** A span as the domain function takes it, with the implement it is of. */
export interface SpanHoursInput extends HitchSpanHours {
  implementId: string;
}

/**
 * The spans of a machine (as the implement or as the tractor) with the tractor readings each
 * needs, by span id, oldest first.
 */
export async function spanHoursInput(
  organizationId: string,
  machineId: string,
  transaction: Transaction | null,
): Promise<Map<string, SpanHoursInput>> {
  const rows = await directQuery<SpanReadingRow>(transaction, SPAN_READINGS_SQL, [
    organizationId,
    machineId,
  ]);
  const spans = new Map<string, SpanHoursInput>();
  for (const r of rows) {
    let span = spans.get(r.span_id);
    if (!span) {
      span = {
        implementId: r.implement_id,
        startMs: new Date(r.started_at).getTime(),
        endMs: r.ended_at && new Date(r.ended_at).getTime(),
        readings: [],
      };
      spans.set(r.span_id, span);
    }
    if (r.taken_at !== null && r.lifetime !== null) {
      span.readings.push({ takenAtMs: new Date(r.taken_at).getTime(), lifetime: r.lifetime });
    }
  }
  return spans;
}

export interface HitchRecompute {
  organizationId: string;
  timeZone: string;
  /** whose change it follows: the hitch readings are entered in their name */
  userId: string | null;
  now?: Date;
}

/**
 * Brings one implement's hitch readings in line with its spans and its tractors' readings, inside
 * the caller's transaction (see the header for the lock order). Returns how many readings it
 * added and removed.
 */
export async function recomputeHitchReadings(
  who: HitchRecompute,
  implementId: string,
  transaction: Transaction,
): Promise<{ added: number; removed: number }> {
  const { organizationId } = who;
  await lockMachineReadings(implementId, transaction);
  const spans = [
    ...(await spanHoursInput(organizationId, implementId, transaction)).values(),
  ].filter((s) => s.implementId === implementId);
  const [implement] = await directQuery<ImplementRow>(transaction, IMPLEMENT_SQL, [
    organizationId,
    implementId,
  ]);
  if (!implement) return { added: 0, removed: 0 };
  const nowMs = (who.now ?? new Date()).getTime();
  const wanted = hitchReadingPoints(spans, Number(implement.base), nowMs).map((p) => ({
    takenAtMs: p.takenAtMs,
    value: twoDecimals(p.value),
  }));
  const keyOf = (ms: number, value: number) => `${ms}|${value}`;
  const have = new Map(
    implement.hitch.map((r) => [keyOf(Date.parse(r.takenAt), Number(r.value)), r.id]),
  );
  const wantedKeys = new Set(wanted.map((p) => keyOf(p.takenAtMs, p.value)));
  const stale = [...have].filter(([key]) => !wantedKeys.has(key)).map(([, id]) => id);
  const fresh = wanted.filter((p) => !have.has(keyOf(p.takenAtMs, p.value)));
  if (!stale.length && !fresh.length) return { added: 0, removed: 0 };

  if (stale.length) {
    await directQuery(transaction, 'DELETE FROM meter_readings WHERE id = ANY($1::uuid[])', [
      stale,
    ]);
  }
  if (fresh.length) {
    await insertReadingRows(
      fresh.map((p) => ({
        organizationId,
        machineId: implementId,
        meterId: implement.meter_id,
        // an implement on the hitch log has no meter of its own: shown and lifetime agree
        value: p.value,
        lifetimeValue: p.value,
        takenAt: new Date(p.takenAtMs),
        source: 'hitch' as const,
        enteredBy: who.userId,
        importKey: null,
      })),
      transaction,
    );
  }
  // the summary, usage and due points from every reading: derived readings may move anywhere
  await refreshMachineForecast(implementId, organizationId, transaction, {
    timeZone: who.timeZone,
  });
  return { added: fresh.length, removed: stale.length };
}

/** Recomputes each implement in turn (sorted, so two writers lock them in one order). */
export async function recomputeImplements(
  who: HitchRecompute,
  implementIds: Iterable<string>,
  transaction: Transaction,
): Promise<void> {
  for (const id of [...new Set(implementIds)].sort()) {
    await recomputeHitchReadings(who, id, transaction);
  }
}

/** After a change of a tractor's readings: every implement it ever pulled (none, mostly). */
export async function recomputeImplementsOf(
  who: HitchRecompute,
  tractorId: string,
  transaction: Transaction,
): Promise<void> {
  const rows = await directQuery<{ implement_id: string }>(
    transaction,
    'SELECT DISTINCT implement_id FROM hitch_spans WHERE organization_id = $1 AND tractor_id = $2',
    [who.organizationId, tractorId],
  );
  await recomputeImplements(
    who,
    rows.map((r) => r.implement_id),
    transaction,
  );
}
