// The demo's service history: completed visits consistent with the planned last-done points (each
// task's last visit is exactly its last-done meter and date; earlier visits sit on generated
// readings one interval apart), with parts, fluids, labour, measurements (a PTO clutch pressure
// check at each PTO visit) and reassembly settings; and a few plans for the coming days. Task
// statuses are untouched: service-plan.ts decided them.
import type { CreationAttributes, Transaction } from 'sequelize';
import { ServiceMeasurement, ServiceRecord } from '../models';
import { addDaysIso, todayIso } from '../../shared/domain';
import { prefillLines } from '../services/service-records';
import { createRandom, seedFromString } from './random';
import {
  localTime,
  rawValue,
  visitsOf,
  type DemoMachineWorld,
  type DemoTaskRow,
} from './demo-service-visits';
import { checksPto, measurementsFor, settingsFor } from './demo-service-findings';

type RecordRow = CreationAttributes<ServiceRecord>;
type MeasurementRow = CreationAttributes<ServiceMeasurement>;

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

const REMARKS = [
  'No leaks found after the run-up.',
  'Old oil clean; nothing on the magnetic plug.',
  'Filters showed normal wear.',
  'Topped up to the mark after a short run.',
  'Checked hoses and clamps while the covers were off.',
];

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
    ['Engine oil and filter', 'Fuel filters and water separator'],
    1,
    'Overdue oil change: first job of the morning.',
  ],
  ['T-01', ['Engine air filter'], 2, ''],
  ['C-01', ['Engine oil and filter', 'Engine air filter'], 4, 'Before harvest prep.'],
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
