// When the demo's service visits happened: each task's last-done point, and up to three earlier
// visits one interval apart on the generated readings, merged per day.
import { TZDate } from '@date-fns/tz';
import type { MachineCategory, UnitSystem } from '../../shared/constants';
import type { MachineClass } from '../../shared/domain/service-library/classes';
import type { TaskFluid, TaskPart } from '../../shared/schemas/schedule';
import { addDaysIso, isoFromDayNumber, localDayNumber } from '../../shared/domain';
import type { DemoReading } from './demo-readings';

export interface DemoTaskRow {
  id: string;
  machineId: string;
  name: string;
  intervalMeter: number | null;
  intervalDays: number | null;
  parts: TaskPart[];
  fluids: TaskFluid[];
  labourHours: number | null;
  lastDoneMeter: number;
  lastDoneOn: string;
}

export interface DemoMachineWorld {
  organizationKey: string;
  organizationId: string;
  id: string;
  fleetNumber: string;
  category: MachineCategory;
  /** picks the class's own walkaround items */
  machineClass: MachineClass | null;
  timeZone: string;
  units: UnitSystem;
  readings: DemoReading[];
  operatorIds: string[];
  /** the technician, or the manager where the farm has none */
  shopPersonId: string | null;
  tasks: DemoTaskRow[];
}

export const round = (n: number, places = 2) => Math.round(n * 10 ** places) / 10 ** places;
export const localDate = (at: Date, timeZone: string) =>
  isoFromDayNumber(localDayNumber(at, timeZone));

/** An instant at a local hour of an ISO date. */
export function localTime(iso: string, hour: number, timeZone: string): Date {
  const [y, m, d] = iso.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d, hour, 0, 0, timeZone).getTime());
}

/** Raw value on the meter fitted at the time (T-03's meter was replaced). */
export function rawValue(
  readings: DemoReading[],
  lifetime: number,
  date: string,
  timeZone: string,
) {
  const before = [...readings].reverse().find((r) => localDate(r.takenAt, timeZone) <= date);
  const offset = before ? before.lifetimeValue - before.value : 0;
  return round(lifetime - offset, 1);
}

export interface Visit {
  date: string;
  meter: number;
  tasks: DemoTaskRow[];
}

/** The visits of one machine: each task's last-done point, and up to three earlier ones. */
export function visitsOf(m: DemoMachineWorld, today: string): Visit[] {
  const byDate = new Map<string, Visit[]>();
  const first = m.readings[0];
  const firstDay = localDate(first.takenAt, m.timeZone);
  const add = (date: string, meter: number, task: DemoTaskRow, exact: boolean) => {
    const list = byDate.get(date) ?? [];
    let visit = exact ? list.find((v) => v.meter === meter) : list[0];
    if (!visit) {
      visit = { date, meter, tasks: [] };
      list.push(visit);
      byDate.set(date, list);
    }
    if (!visit.tasks.includes(task)) visit.tasks.push(task);
  };
  // Grease rounds are daily work, not shop visits.
  for (const task of m.tasks.filter((t) => !/grease/i.test(t.name))) {
    if (task.lastDoneOn < firstDay || task.lastDoneOn > today) continue;
    add(task.lastDoneOn, task.lastDoneMeter, task, true);
    for (let k = 1; k <= 3; k += 1) {
      if (task.intervalMeter !== null) {
        const target = task.lastDoneMeter - k * task.intervalMeter;
        if (target < first.lifetimeValue) break;
        const r = m.readings.find((x) => x.lifetimeValue >= target)!;
        add(localDate(r.takenAt, m.timeZone), r.lifetimeValue, task, false);
      } else if (task.intervalDays !== null) {
        const date = addDaysIso(task.lastDoneOn, -k * task.intervalDays);
        if (date < firstDay) break;
        const r = [...m.readings].reverse().find((x) => localDate(x.takenAt, m.timeZone) <= date);
        if (r) add(date, r.lifetimeValue, task, false);
      }
    }
  }
  return [...byDate.values()]
    .flat()
    .sort((a, b) => a.date.localeCompare(b.date) || a.meter - b.meter);
}
