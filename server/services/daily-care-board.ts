// The dashboard's daily-care board (issue 11): per machine the caller sees, its grease rounds and
// daily items and where each stands today — done today, not yet today, overdue by its interval.
// They are signed off in the walkaround and never reach the due list or its e-mails.
import { QueryTypes } from 'sequelize';
import { sequelize } from '../db';
import type { Machine } from '../models';
import type { CareState } from '../../shared/domain/daily-care';
import { todayIso } from '../../shared/domain';
import type { DailyCareItem } from '../../shared/schemas/daily-care';
import type { OrgAccess } from '../policies/access';
import { dailyCareOf } from './daily-care';
import { ensureDuePointsCurrent } from './forecast';
import { loadVisibleMachines } from './machines';

export interface DailyCareRow {
  machine: Machine;
  tasks: DailyCareItem[];
  counts: Record<CareState, number>;
}

/** Machines with daily care the caller sees (not sold), most overdue first, then by fleet number. */
export async function dailyCareBoard(access: OrgAccess, now = new Date()) {
  const { id: orgId, timeZone } = access.organization;
  await ensureDuePointsCurrent(orgId, timeZone, now);
  const ids = await sequelize.query<{ machine_id: string }>(
    'SELECT DISTINCT machine_id FROM service_tasks WHERE organization_id = :orgId AND daily_care',
    { replacements: { orgId }, type: QueryTypes.SELECT },
  );
  const visible = await loadVisibleMachines(
    access,
    ids.map((r) => r.machine_id),
  );
  const machines = [...visible.values()].filter((m) => m.status !== 'sold');
  const care = await dailyCareOf(
    orgId,
    timeZone,
    machines.map((m) => m.id),
    { now },
  );
  const rows: DailyCareRow[] = machines.map((machine) => {
    const tasks = care.get(machine.id) ?? [];
    const counts = { overdue: 0, not_today: 0, done_today: 0 };
    for (const t of tasks) counts[t.state] += 1;
    return { machine, tasks, counts };
  });
  rows.sort(
    (a, b) =>
      b.counts.overdue - a.counts.overdue ||
      b.counts.not_today - a.counts.not_today ||
      a.machine.fleetNumber.localeCompare(b.machine.fleetNumber, 'en', { numeric: true }),
  );
  return { asOf: todayIso(timeZone, now), rows };
}
