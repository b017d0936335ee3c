// The hitch log of one machine as its page shows it: the spans where it is the implement or the
// tractor, newest first, each with the hours the implement gained in it, and the implement's
// hours from hitching in all.
import { directQuery } from '../db-direct';
import type { OrgAccess } from '../policies/context';
import { canCorrectHitch, canHitch } from '../policies/hitch';
import { hitchHoursAt, spanHoursUntil } from '../../shared/domain/hitch-hours';
import type { HitchMeterKind } from '../../shared/schemas/hitch';
import { spanHoursInput } from './hitch-readings';
import { loadMachine } from './machine-load';

/** How many spans the page lists (newest first); the hours count every span. */
export const HITCH_LOG_LIMIT = 200;

export interface HitchLogRow {
  id: string;
  implement: { id: string; fleetNumber: string; name: string };
  tractor: { id: string; fleetNumber: string; name: string };
  meterKind: HitchMeterKind;
  startedAt: Date;
  endedAt: Date | null;
  note: string;
  enteredBy: string | null;
  hours: number;
}

interface SpanRow {
  id: string;
  meter_kind: HitchMeterKind;
  started_at: Date;
  ended_at: Date | null;
  note: string;
  entered_by: string | null;
  implement_id: string;
  implement_fleet: string;
  implement_name: string;
  tractor_id: string;
  tractor_fleet: string;
  tractor_name: string;
}

const SPANS_SQL = `
  SELECT s.id, s.meter_kind, s.started_at, s.ended_at, s.note, u.name AS entered_by,
    i.id AS implement_id, i.fleet_number AS implement_fleet, i.name AS implement_name,
    t.id AS tractor_id, t.fleet_number AS tractor_fleet, t.name AS tractor_name
  FROM hitch_spans s
  JOIN machines i ON i.id = s.implement_id
  JOIN machines t ON t.id = s.tractor_id
  LEFT JOIN users u ON u.id = s.entered_by
  WHERE s.organization_id = $1 AND (s.implement_id = $2 OR s.tractor_id = $2)
  ORDER BY s.started_at DESC, s.id LIMIT ${HITCH_LOG_LIMIT}`;

const rounded = (h: number) => Math.round(h * 100) / 100;

/** The machine's hitch log (404 for a machine the caller cannot see). */
export async function hitchLog(access: OrgAccess, machineId: string, now = new Date()) {
  const { machine, operatorIds } = await loadMachine(access, machineId);
  const orgId = access.organization.id;
  const [rows, inputs] = await Promise.all([
    directQuery<SpanRow>(null, SPANS_SQL, [orgId, machine.id]),
    spanHoursInput(orgId, machine.id, null),
  ]);
  const nowMs = now.getTime();
  const spans: HitchLogRow[] = rows.map((r) => {
    const input = inputs.get(r.id);
    return {
      id: r.id,
      implement: { id: r.implement_id, fleetNumber: r.implement_fleet, name: r.implement_name },
      tractor: { id: r.tractor_id, fleetNumber: r.tractor_fleet, name: r.tractor_name },
      meterKind: r.meter_kind,
      startedAt: new Date(r.started_at),
      endedAt: r.ended_at && new Date(r.ended_at),
      note: r.note,
      enteredBy: r.entered_by,
      hours: input ? rounded(spanHoursUntil(input, nowMs)) : 0,
    };
  });
  const asImplement = [...inputs.values()].filter((s) => s.implementId === machine.id);
  return {
    spans,
    hitchHours: rounded(hitchHoursAt(asImplement, nowMs)),
    abilities: {
      // what the page offers; the tractor's side is checked again when one is picked
      start: canHitch(access, operatorIds, operatorIds),
      correct: canCorrectHitch(access),
    },
  };
}
