// Implements whose hours come from the hitch log (issue 13): one with a span on the log has no
// meter of its own to read — its hours are its tractors' over its spans (hitch-readings.ts) — so
// Log hours and the walkaround ask it for no reading and say where its hours come from instead.
import type { Transaction } from 'sequelize';
import { directQuery } from '../db-direct';
import type { HitchFed } from '../../shared/schemas/hitch';

interface HitchFedRow {
  implement_id: string;
  tractor_id: string | null;
  fleet_number: string | null;
  name: string | null;
  since: Date | null;
  hours: number | null;
}

/**
 * The implements among `machineIds` with spans on the hitch log, each with the tractor it is on
 * now (null: unhitched), since when, and its hours so far (its primary meter's last value).
 */
export async function hitchFedOf(
  organizationId: string,
  machineIds: string[],
  transaction: Transaction | null = null,
): Promise<Map<string, HitchFed>> {
  if (!machineIds.length) return new Map();
  const rows = await directQuery<HitchFedRow>(
    transaction,
    `SELECT s.implement_id, t.id AS tractor_id, t.fleet_number, t.name, o.started_at AS since,
            f.last_value::float8 AS hours
     FROM (SELECT DISTINCT implement_id FROM hitch_spans
           WHERE organization_id = $1 AND implement_id = ANY($2::uuid[])) s
     LEFT JOIN hitch_spans o ON o.organization_id = $1 AND o.implement_id = s.implement_id
       AND o.ended_at IS NULL
     LEFT JOIN machines t ON t.id = o.tractor_id AND t.organization_id = $1
     LEFT JOIN machine_meters pm ON pm.organization_id = $1 AND pm.machine_id = s.implement_id
       AND pm.is_primary
     LEFT JOIN machine_forecasts f ON f.meter_id = pm.id`,
    [organizationId, machineIds],
  );
  return new Map(
    rows.map((r) => [
      r.implement_id,
      {
        tractor:
          r.tractor_id && r.fleet_number !== null && r.name !== null
            ? { id: r.tractor_id, fleetNumber: r.fleet_number, name: r.name }
            : null,
        since: r.since ? new Date(r.since).toISOString() : null,
        hours: Number(r.hours ?? 0),
      },
    ]),
  );
}

/**
 * The implement's hours at `at` from its hitch readings: its last at or before then (0 before
 * any), on the lifetime scale — what a walkaround without a reading records.
 */
export async function hitchHoursAt(
  organizationId: string,
  implementId: string,
  at: Date,
  transaction: Transaction,
): Promise<number> {
  const [row] = await directQuery<{ value: number }>(
    transaction,
    `SELECT r.lifetime_value::float8 AS value FROM meter_readings r
     JOIN machine_meters pm ON pm.id = r.meter_id AND pm.is_primary
     WHERE r.organization_id = $1 AND r.machine_id = $2 AND r.taken_at <= $3
     ORDER BY r.taken_at DESC, r.lifetime_value DESC LIMIT 1`,
    [organizationId, implementId, at],
  );
  return row ? Number(row.value) : 0;
}
