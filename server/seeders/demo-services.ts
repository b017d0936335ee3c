// The demo's service history: completed visits consistent with the planned last-done points (each
// task's last visit is exactly its last-done meter and date; earlier visits sit on generated
// readings one interval apart), with parts, fluids, labour, measurements (a PTO clutch pressure
// check at each PTO visit) and reassembly settings; and a few plans for the coming days. Task
// statuses are untouched: service-plan.ts decided them.
import type { CreationAttributes, Transaction } from 'sequelize';
import { ServiceMeasurement, ServiceRecord } from '../models';
import type { MachineCategory, UnitSystem } from '../../shared/constants';
import type { TaskFluid, TaskPart } from '../../shared/schemas/schedule';
import type { ReassemblySetting } from '../../shared/schemas/service-records';
import { addDaysIso, isoFromDayNumber, localDayNumber, todayIso } from '../../shared/domain';
import { prefillLines } from '../services/service-records';
import { TZDate } from '@date-fns/tz';
import type { DemoReading } from './demo-readings';
import { createRandom, seedFromString } from './random';

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
  timeZone: string;
  units: UnitSystem;
  readings: DemoReading[];
  operatorIds: string[];
  /** the technician, or the manager where the farm has none */
  shopPersonId: string | null;
  tasks: DemoTaskRow[];
}

type RecordRow = CreationAttributes<ServiceRecord>;
type MeasurementRow = CreationAttributes<ServiceMeasurement>;

const round = (n: number, places = 2) => Math.round(n * 10 ** places) / 10 ** places;
export const localDate = (at: Date, timeZone: string) =>
  isoFromDayNumber(localDayNumber(at, timeZone));

/** An instant at a local hour of an ISO date. */
export function localTime(iso: string, hour: number, timeZone: string): Date {
  const [y, m, d] = iso.split('-').map(Number);
  return new Date(new TZDate(y, m - 1, d, hour, 0, 0, timeZone).getTime());
}

/** A stable invented price for a part number, in cents (the demo has no price list). */
const partPrice = (partNumber: string) =>
  Math.round((14 + createRandom(seedFromString(`price/${partNumber}`)).between(0, 150)) * 100);

/** Invented prices per litre / kilogram, converted to the line's unit, in cents. */
function fluidPrice(kind: string, unit: string) {
  const k = kind.toLowerCase();
  const perBase = k.includes('grease')
    ? 9.5
    : k.includes('coolant')
      ? 3.6
      : k.includes('gear')
        ? 7.2
        : k.includes('engine')
          ? 5.8
          : 4.9;
  const factor = { L: 1, kg: 1, gal: 3.78541, qt: 0.946353, lb: 0.453592 }[unit] ?? 1;
  return Math.round(perBase * factor * 100);
}

/** Raw value on the meter fitted at the time (T-03's meter was replaced). */
function rawValue(readings: DemoReading[], lifetime: number, date: string, timeZone: string) {
  const before = [...readings].reverse().find((r) => localDate(r.takenAt, timeZone) <= date);
  const offset = before ? before.lifetimeValue - before.value : 0;
  return round(lifetime - offset, 1);
}

interface Visit {
  date: string;
  meter: number;
  tasks: DemoTaskRow[];
}

/** The visits of one machine: each task's last-done point, and up to three earlier ones. */
function visitsOf(m: DemoMachineWorld, today: string): Visit[] {
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

const REMARKS = [
  'No leaks found after the run-up.',
  'Old oil clean; nothing on the magnetic plug.',
  'Filters showed normal wear.',
  'Topped up to the mark after a short run.',
  'Checked hoses and clamps while the covers were off.',
];

const imperial = (units: UnitSystem) => units === 'imperial';

/** Tractor visits at which the PTO clutch pressure is checked: the PTO check and the larger services. */
const PRESSURE_CHECKED_WITH = [
  'PTO clutch and brake check',
  'Engine oil and filter',
  'Hydraulic/transmission filters',
  'Hydraulic/transmission oil',
];
const checksPto = (m: DemoMachineWorld, v: Visit) =>
  m.category === 'tractor' && v.tasks.some((t) => PRESSURE_CHECKED_WITH.includes(t.name));

/** PTO clutch pressure (bar or psi; spec 17–21 bar, invented for the demo), falling on T-01. */
function ptoPressure(
  m: DemoMachineWorld,
  index: number,
  count: number,
  rng: ReturnType<typeof createRandom>,
) {
  const bar =
    m.fleetNumber === 'T-01'
      ? 19.8 - (count > 1 ? (3.2 * index) / (count - 1) : 0)
      : 18.6 + rng.between(0, 1.8);
  const psi = imperial(m.units);
  return {
    name: 'PTO clutch pressure',
    value: psi ? round(bar * 14.5038, 0) : round(bar, 1),
    unit: psi ? 'psi' : 'bar',
    specMin: psi ? 247 : 17,
    specMax: psi ? 305 : 21,
  };
}

function measurementsFor(m: DemoMachineWorld, v: Visit, ptoIndex: number, ptoCount: number) {
  const rng = createRandom(seedFromString(`measure/${m.fleetNumber}/${v.date}`));
  const out: {
    name: string;
    value: number;
    unit: string;
    specMin: number | null;
    specMax: number | null;
  }[] = [];
  if (ptoIndex >= 0) out.push(ptoPressure(m, ptoIndex, ptoCount, rng));
  for (const t of v.tasks) {
    if (t.name === 'Battery check')
      out.push({
        name: 'Battery voltage (rested)',
        value: round(12.35 + rng.between(0, 0.4), 2),
        unit: 'V',
        specMin: 12.4,
        specMax: null,
      });
    if (t.name === 'Coolant')
      out.push(
        imperial(m.units)
          ? {
              name: 'Coolant freeze protection',
              value: round(-30 - rng.between(0, 8), 0),
              unit: '°F',
              specMin: null,
              specMax: -22,
            }
          : {
              name: 'Coolant freeze protection',
              value: round(-34 - rng.between(0, 4), 0),
              unit: '°C',
              specMin: null,
              specMax: -30,
            },
      );
  }
  return out;
}

function settingsFor(
  m: DemoMachineWorld,
  v: Visit,
  lastPto: boolean,
): { settings: ReassemblySetting[]; reason: string } {
  const psi = imperial(m.units);
  const settings: ReassemblySetting[] = [];
  let reason = '';
  if (v.tasks.some((t) => t.name === 'PTO clutch and brake check')) {
    const pending = lastPto && m.fleetNumber === 'T-02';
    settings.push(
      { what: 'PTO brake band adjuster', value: '2½ turns out from seated', restored: !pending },
      {
        what: 'Shim pack under the PTO brake anchor',
        value: psi ? '0.016 in (two shims), rear side' : '0.40 mm (two shims), rear side',
        restored: true,
      },
      {
        what: 'PTO clutch housing bolts',
        value: psi ? 'torque 89 lb·ft' : 'torque 120 N·m',
        restored: true,
      },
    );
    if (pending)
      reason =
        'Brake band adjuster left at 3 turns out until the new lining beds in; reset at the next check.';
  }
  if (v.tasks.some((t) => t.name === 'Hydraulic/transmission oil'))
    settings.push({
      what: 'Suction screen cover bolts',
      value: psi ? 'torque 18 lb·ft' : 'torque 25 N·m',
      restored: true,
    });
  return { settings, reason };
}

const withCosts = (tasks: DemoTaskRow[]) => {
  const lines = prefillLines(tasks);
  return {
    parts: lines.parts.map((p) => ({ ...p, unitCostMinor: partPrice(p.partNumber) })),
    fluids: lines.fluids.map((f) => ({ ...f, unitCostMinor: fluidPrice(f.kind, f.unit) })),
  };
};

/** Completed records and their measurements for one machine. */
export function machineServiceHistory(
  m: DemoMachineWorld,
  today: Date,
  id: (name: string) => string,
): { records: RecordRow[]; measurements: MeasurementRow[] } {
  const todayLocal = todayIso(m.timeZone, today);
  const visits = visitsOf(m, todayLocal);
  const ptoVisits = visits.filter((v) => checksPto(m, v));
  const records: RecordRow[] = [];
  const measurements: MeasurementRow[] = [];
  visits.forEach((v, i) => {
    const rng = createRandom(seedFromString(`visit/${m.fleetNumber}/${v.date}/${i}`));
    const recordId = id(`service/${m.organizationKey}/${m.fleetNumber}/${v.date}/${i}`);
    const labour = v.tasks.reduce((s, t) => s + (t.labourHours ?? 0), 0);
    const ptoIndex = ptoVisits.indexOf(v);
    const lastPtoCheck = visits.findLast((x) =>
      x.tasks.some((t) => t.name === 'PTO clutch and brake check'),
    );
    const { settings, reason } = settingsFor(m, v, v === lastPtoCheck);
    const at = localTime(v.date, 16, m.timeZone);
    records.push({
      id: recordId,
      organizationId: m.organizationId,
      machineId: m.id,
      status: 'completed',
      plannedFor: null,
      performedOn: v.date,
      meterValue: rawValue(m.readings, v.meter, v.date, m.timeZone),
      meterLifetime: v.meter,
      readingId: null,
      tasks: v.tasks.map((t) => ({ taskId: t.id, name: t.name })),
      technicianIds: m.shopPersonId ? [m.shopPersonId] : [],
      labourHours: Math.max(0.25, Math.round(labour * rng.between(0.9, 1.25) * 4) / 4),
      ...withCosts(v.tasks),
      otherCosts: rng.chance(0.3) ? [{ description: 'Shop consumables', amountMinor: 850 }] : [],
      notes: `${v.tasks.map((t) => t.name).join(', ')}. ${rng.pick(REMARKS)}`,
      reassemblySettings: settings,
      unrestoredReason: reason,
      defectIds: [],
      createdBy: m.shopPersonId,
      completedBy: m.shopPersonId,
      completedAt: at,
      createdAt: at,
      updatedAt: at,
    });
    measurementsFor(m, v, ptoIndex, ptoVisits.length).forEach((x, position) =>
      measurements.push({
        id: id(`measurement/${recordId}/${position}`),
        organizationId: m.organizationId,
        machineId: m.id,
        serviceRecordId: recordId,
        position,
        ...x,
        createdAt: at,
      }),
    );
  });
  return { records, measurements };
}

/** Plans booked for the coming days: [fleet number, task names, days from today, note]. */
const DEMO_PLANS: [string, string[], number, string][] = [
  [
    'T-02',
    ['Engine oil and filter', 'Fuel filters'],
    1,
    'Overdue oil change: first job of the morning.',
  ],
  ['T-01', ['Air filter inspection'], 2, ''],
  ['C-01', ['Engine oil and filter', 'Air filter inspection'], 4, 'Before harvest prep.'],
  ['T-11', ['Engine oil and filter', 'Hydraulic/transmission filters'], 1, 'Book the yard bay.'],
];

/** The demo's plans (parts prefilled from the tasks). */
export function demoPlans(
  machines: DemoMachineWorld[],
  today: Date,
  id: (name: string) => string,
): RecordRow[] {
  return DEMO_PLANS.flatMap(([fleet, names, days, notes]) => {
    const m = machines.find((x) => x.fleetNumber === fleet);
    if (!m) return [];
    const tasks = names
      .map((n) => m.tasks.find((t) => t.name === n))
      .filter((t): t is DemoTaskRow => !!t);
    const lines = prefillLines(tasks);
    return [
      {
        id: id(`plan/${m.organizationKey}/${fleet}`),
        organizationId: m.organizationId,
        machineId: m.id,
        status: 'planned' as const,
        plannedFor: addDaysIso(todayIso(m.timeZone, today), days),
        performedOn: null,
        meterValue: null,
        meterLifetime: null,
        readingId: null,
        tasks: tasks.map((t) => ({ taskId: t.id, name: t.name })),
        technicianIds: m.shopPersonId ? [m.shopPersonId] : [],
        labourHours: null,
        parts: lines.parts,
        fluids: lines.fluids,
        otherCosts: [],
        notes,
        reassemblySettings: [],
        unrestoredReason: '',
        defectIds: [],
        createdBy: m.shopPersonId,
        completedBy: null,
        completedAt: null,
      },
    ];
  });
}

/** Writes the service history and plans of every demo machine. */
export async function writeServiceHistory(
  machines: DemoMachineWorld[],
  today: Date,
  id: (name: string) => string,
  transaction: Transaction,
) {
  const records: RecordRow[] = [];
  const measurements: MeasurementRow[] = [];
  for (const m of machines) {
    const h = machineServiceHistory(m, today, id);
    records.push(...h.records);
    measurements.push(...h.measurements);
  }
  records.push(...demoPlans(machines, today, id));
  await ServiceRecord.bulkCreate(records, { transaction, returning: false });
  await ServiceMeasurement.bulkCreate(measurements, { transaction, returning: false });
  return { records: records.length, measurements: measurements.length };
}
