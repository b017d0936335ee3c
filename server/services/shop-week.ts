import { Op } from 'sequelize';
import { Machine, ServiceRecord, ServiceTask } from '../models';
import type { ServiceFluid, ServicePart } from '../../shared/schemas/service-records';
import { addDaysIso, dayNumberFromIso, todayIso } from '../../shared/domain';
import type { OrgAccess } from '../policies/access';
import { dueList, type DueRow } from './due-list';

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
const round = (n: number) => Math.round(n * 100) / 100;

/** Weekday index (0 = Sunday) of an ISO date; day 0 (1970-01-01) was a Thursday. */
const weekdayOf = (iso: string) => (((dayNumberFromIso(iso) + 4) % 7) + 7) % 7;

/** The Monday on or before an ISO date. */
export const mondayOf = (iso: string) => addDaysIso(iso, -((weekdayOf(iso) + 6) % 7));

export interface PartToPull {
  partNumber: string;
  description: string;
  quantity: number;
}
export interface FluidToPull {
  kind: string;
  unit: string;
  volume: number;
}

/** Parts summed by part number, and fluids by kind + unit, across record lines. */
export function sumLines(records: { parts: ServicePart[]; fluids: ServiceFluid[] }[]) {
  const parts = new Map<string, PartToPull>();
  const fluids = new Map<string, FluidToPull>();
  for (const r of records) {
    for (const p of r.parts) {
      const key = p.partNumber.trim().toUpperCase();
      const line = parts.get(key) ?? {
        partNumber: p.partNumber,
        description: p.description,
        quantity: 0,
      };
      line.quantity = round(line.quantity + p.quantity);
      parts.set(key, line);
    }
    for (const f of r.fluids) {
      const key = `${f.kind.trim().toLowerCase()}|${f.unit}`;
      const line = fluids.get(key) ?? { kind: f.kind, unit: f.unit, volume: 0 };
      line.volume = round(line.volume + f.volume);
      fluids.set(key, line);
    }
  }
  const byName = (a: PartToPull, b: PartToPull) => a.partNumber.localeCompare(b.partNumber);
  return {
    parts: [...parts.values()].sort(byName),
    fluids: [...fluids.values()].sort((a, b) => a.kind.localeCompare(b.kind)),
  };
}

/**
 * The shop's week from a start date: per day the planned records (estimated labour from their
 * tasks, parts to pull summed by part number) and the tasks falling due that day from the stored
 * due points (the due list; nothing is recomputed here), plus everything overdue (past its meter
 * or its date), which no day lists.
 * Plans carry their machine and technician ids; the presenter names them.
 */
export async function shopWeek(access: OrgAccess, startIso?: string) {
  const org = access.organization;
  const today = todayIso(org.timeZone);
  const start = startIso ?? mondayOf(today);
  const end = addDaysIso(start, 6);
  const [planned, allPlanned, due] = await Promise.all([
    ServiceRecord.findAll({
      where: {
        organizationId: org.id,
        status: 'planned',
        plannedFor: { [Op.between]: [start, end] },
      },
      order: [
        ['plannedFor', 'ASC'],
        ['createdAt', 'ASC'],
      ],
    }),
    ServiceRecord.findAll({
      where: { organizationId: org.id, status: 'planned' },
      attributes: ['id', 'plannedFor', 'tasks'],
    }),
    dueList(access, {}),
  ]);
  const [machines, tasks] = await Promise.all([
    Machine.findAll({
      where: {
        organizationId: org.id,
        id: { [Op.in]: [...new Set(planned.map((r) => r.machineId))] },
      },
    }),
    ServiceTask.findAll({
      where: {
        organizationId: org.id,
        id: { [Op.in]: [...new Set(planned.flatMap((r) => r.tasks.map((t) => t.taskId)))] },
      },
      attributes: ['id', 'labourHours', 'hazards', 'safetyNotes'],
    }),
  ]);
  const machineOf = new Map(machines.map((m) => [m.id, m]));
  const taskOf = new Map(tasks.map((t) => [t.id, t]));
  // A task already booked on a plan (any date) is shown as such beside its due date.
  const bookedOn = new Map<string, { recordId: string; plannedFor: string }>();
  for (const r of [...allPlanned].sort((a, b) =>
    (a.plannedFor ?? '').localeCompare(b.plannedFor ?? ''),
  ))
    for (const t of r.tasks)
      if (!bookedOn.has(t.taskId))
        bookedOn.set(t.taskId, { recordId: r.id, plannedFor: r.plannedFor! });
  const withBooking = (row: DueRow) => ({ ...row, booked: bookedOn.get(row.taskId) ?? null });

  const plannedItem = (r: ServiceRecord) => {
    const taskRows = r.tasks.map((t) => {
      const task = taskOf.get(t.taskId);
      return {
        taskId: t.taskId,
        name: t.name,
        labourHours: task?.labourHours ?? null,
        // a task removed from the schedule since keeps its name, without a caution to show
        hazards: task?.hazards ?? [],
        safetyNotes: task?.safetyNotes ?? '',
      };
    });
    const lines = sumLines([r]);
    return {
      id: r.id,
      plannedFor: r.plannedFor!,
      machine: machineOf.get(r.machineId)!,
      tasks: taskRows,
      technicianIds: r.technicianIds,
      notes: r.notes,
      defectIds: r.defectIds,
      estimatedLabourHours: round(taskRows.reduce((s, t) => s + (t.labourHours ?? 0), 0)),
      partsToPull: lines.parts,
      fluidsToPull: lines.fluids,
    };
  };

  const days = Array.from({ length: 7 }, (_, i) => {
    const date = addDaysIso(start, i);
    const records = planned.filter((r) => r.plannedFor === date);
    // An overdue task is filed under Overdue, never under a day (its date may say today).
    const dueRows = due.rows
      .filter((row) => row.due.status !== 'overdue' && row.due.effectiveDate === date)
      .map(withBooking);
    const lines = sumLines(records);
    const items = records.map(plannedItem);
    return {
      date,
      weekday: WEEKDAYS[weekdayOf(date)],
      planned: items,
      due: dueRows,
      plannedLabourHours: round(items.reduce((s, p) => s + p.estimatedLabourHours, 0)),
      // labour of due tasks that no plan covers yet
      unbookedDueLabourHours: round(
        dueRows.filter((d) => !d.booked).reduce((s, d) => s + (d.labourHours ?? 0), 0),
      ),
      partsToPull: lines.parts,
      fluidsToPull: lines.fluids,
    };
  });
  // Past its meter or its date is overdue, whichever week is shown.
  const overdue = due.rows.filter((row) => row.due.status === 'overdue').map(withBooking);
  const week = sumLines(planned);
  return {
    start,
    end,
    asOf: due.asOf,
    days,
    overdue,
    totals: {
      plannedRecords: planned.length,
      dueTasks: days.reduce((s, d) => s + d.due.length, 0),
      overdueTasks: overdue.length,
      plannedLabourHours: round(days.reduce((s, d) => s + d.plannedLabourHours, 0)),
      unbookedDueLabourHours: round(days.reduce((s, d) => s + d.unbookedDueLabourHours, 0)),
      partsToPull: week.parts,
      fluidsToPull: week.fluids,
    },
  };
}

export type ShopWeekData = Awaited<ReturnType<typeof shopWeek>>;
