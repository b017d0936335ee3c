// What every due list shares (the farm's due list and its counters, the dealer's board, the
// digest): the horizon's rule, what an operator sees, the columns of a due row selected from
// task_due_points d, service_tasks t, machines m and machine_forecasts f, and the one mapping from
// a result row to the DueRow the API presents.
import type { DuePoint } from '../../shared/domain';
import type { DueRow } from '../../shared/schemas/due';
import type { Usage } from '../../shared/schemas/machines';
import type { MachineRef } from '../../shared/schemas/refs';

export interface DueFilterFlags {
  category?: boolean;
  status?: boolean;
  machineId?: boolean;
  horizon?: boolean;
  operator?: boolean;
}

/**
 * The horizon's rule, one for the list, its total and every caller: a task past its meter or its
 * date (overdue) is always in, and so is one whose last service is not known (history unknown: it
 * cannot be dated until someone answers, and it may be the most overdue of all); any other task is
 * in when the date it falls due is inside the horizon. A task with no forecast yet (too few
 * readings) cannot be placed inside or outside any horizon, so it is listed last, under its status,
 * rather than hidden: on a farm that has just brought its fleet in, that is every task.
 */
export const HORIZON_RULE = `(d.status IN ('overdue','history_unknown','no_forecast') OR d.sort_date <= :until)`;

/**
 * The rows a due digest can carry: overdue, due soon, and OK ones the forecast brings due by
 * :digestUntil (asOf + DIGEST_HORIZON_DAYS); digest.ts's selectDigestRows draws the same line.
 */
export const DIGEST_RULE = `(d.status IN ('overdue','due_soon') OR (d.status = 'ok' AND d.sort_date <= :digestUntil))`;

/** An operator sees the machines assigned to them and every machine assigned to no one. */
export const visibleToOperator = (machine = 'm.id', org = 'm.organization_id') =>
  `(NOT EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = ${org} AND o.machine_id = ${machine})
  OR EXISTS (SELECT 1 FROM machine_operators o WHERE o.organization_id = ${org} AND o.machine_id = ${machine} AND o.user_id = :user))`;

/** The select list of a due row (the joins are the caller's: d, t, m, mt and f). */
export const DUE_ROW_COLUMNS = `d.task_id, d.due, t.name AS task_name, t.hazards, t.labour_hours,
      m.id AS machine_id, m.fleet_number, m.name AS machine_name, m.category, m.status AS machine_status, mt.unit AS meter_unit,
      mt.id AS meter_id, mt.kind AS meter_kind, mt.label AS meter_label, mt.is_primary AS meter_primary,
      m.restriction_reason IS NOT NULL AS machine_restricted,
      f.last_value, f.last_raw_value, f.last_taken_at, f.usage - array['profile', 'profileFast', 'profileSlow'] AS usage`;

/**
 * The due points of the fleet a list may show, as conditions on d alone (org given as SQL, e.g.
 * ':org' or 'h.farm_id'). Daily care (grease rounds, daily items) is signed off in the walkaround
 * and shown on the dashboard's daily-care board: never on the due list, so never in its digests,
 * overdue mails, calendar feed, shop week or dealer board, which a 10 h round would flood every day
 * in harvest. Sold machines are gone from the fleet. Both are left out by looking past the few
 * such rows (partial indexes of migration 0025) rather than joining every due point to its task
 * and machine, so a list's page and its counters read the due points' own indexes.
 */
export function fleetWhere(
  filters: Pick<DueFilterFlags, 'category' | 'machineId' | 'operator'>,
  org = ':org',
): string[] {
  const where = [
    `d.organization_id = ${org}`,
    `NOT EXISTS (SELECT 1 FROM service_tasks t WHERE t.organization_id = ${org} AND t.daily_care AND t.id = d.task_id)`,
    `NOT EXISTS (SELECT 1 FROM machines m WHERE m.organization_id = ${org} AND m.status = 'sold' AND m.id = d.machine_id)`,
  ];
  if (filters.category)
    where.push(
      `EXISTS (SELECT 1 FROM machines m WHERE m.organization_id = ${org} AND m.id = d.machine_id AND m.category = :category)`,
    );
  if (filters.machineId) where.push('d.machine_id = :machineId');
  if (filters.operator) where.push(visibleToOperator('d.machine_id', 'd.organization_id'));
  return where;
}

/** The list's order: overdue first, then history unknown, then the date each falls due. */
export const DUE_ORDER = `(d.status = 'overdue') DESC, (d.status = 'history_unknown') DESC, d.sort_date ASC NULLS LAST, d.status_rank, d.task_id`;

/**
 * The joins that give a due point d its task t, machine m, the task's meter mt and that meter's
 * forecast f (DUE_ROW_COLUMNS), each by its key and checked to be of the same organization. The check is written IS NOT DISTINCT
 * FROM (the columns are never null, so it means =) to keep it out of the planner's equalities: as
 * `=`, it let the planner reach a 5,000-machine farm's machines through their organization and
 * filter thousands per due point instead of reading each by its key (30 ms against 1.7 ms).
 */
export const DUE_ROW_JOINS = `JOIN service_tasks t ON t.id = d.task_id AND t.organization_id IS NOT DISTINCT FROM d.organization_id
    JOIN machines m ON m.id = d.machine_id AND m.organization_id IS NOT DISTINCT FROM d.organization_id
    JOIN machine_meters mt ON mt.id = t.meter_id AND mt.organization_id IS NOT DISTINCT FROM d.organization_id
    LEFT JOIN machine_forecasts f ON f.meter_id = t.meter_id AND f.organization_id IS NOT DISTINCT FROM d.organization_id`;

export interface RawDueRow {
  task_id: string;
  due: DuePoint;
  task_name: string;
  hazards: string[];
  labour_hours: number | null;
  machine_id: string;
  fleet_number: string;
  machine_name: string;
  category: MachineRef['category'];
  machine_status: MachineRef['status'];
  machine_restricted: boolean;
  meter_unit: MachineRef['meterUnit'];
  meter_id: string;
  meter_kind: DueRow['meter']['kind'];
  meter_label: string;
  meter_primary: boolean;
  last_value: number | null;
  last_raw_value: number | null;
  last_taken_at: Date | null;
  usage: Pick<Usage, 'method' | 'rate' | 'low' | 'high'> | null;
}

/** A result row of DUE_ROW_COLUMNS as the API's DueRow. */
export function toDueRow(r: RawDueRow): DueRow {
  return {
    taskId: r.task_id,
    taskName: r.task_name,
    hazards: r.hazards,
    labourHours: r.labour_hours === null ? null : Number(r.labour_hours),
    machine: {
      id: r.machine_id,
      fleetNumber: r.fleet_number,
      name: r.machine_name,
      category: r.category,
      status: r.machine_status,
      restricted: r.machine_restricted,
      meterUnit: r.meter_unit,
    },
    meter: { id: r.meter_id, kind: r.meter_kind, label: r.meter_label, isPrimary: r.meter_primary },
    due: r.due,
    lastReading:
      r.last_value !== null && r.last_taken_at
        ? {
            value: Number(r.last_raw_value ?? r.last_value),
            lifetimeValue: Number(r.last_value),
            takenAt: new Date(r.last_taken_at).toISOString(),
          }
        : null,
    // The due value as the meter fitted now will show it (differs after a meter replacement).
    dueOnMeter:
      r.due.dueMeter !== null && r.last_value !== null
        ? r.due.dueMeter - (Number(r.last_value) - Number(r.last_raw_value ?? r.last_value))
        : r.due.dueMeter,
    usage: r.usage && {
      method: r.usage.method,
      rate: r.usage.rate,
      low: r.usage.low,
      high: r.usage.high,
    },
  };
}
