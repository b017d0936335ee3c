// The rows of the scale data sets (datasets.ts), as COPY text: machines of a farm, their 10 service
// tasks placed at a spread of points in their intervals, and two years of daily readings. Values
// are deterministic (from the machine's and task's index), so two runs build the same fleet.
import { randomUUID } from 'node:crypto';

const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;
export const TASKS_PER_MACHINE = 10;

const CATEGORIES = ['tractor', 'combine', 'sprayer', 'baler', 'loader', 'mower', 'truck'] as const;

// A tractor-like service plan: interval in hours, every third also by the calendar (days), and
// the hazards its line names (shared/schemas/schedule.ts HAZARDS).
const PLAN: { name: string; every: number; days: number | null; hazards: string[] }[] = [
  { name: 'Engine oil and filter', every: 250, days: 365, hazards: ['hot_fluid'] },
  { name: 'Fuel filters', every: 500, days: null, hazards: [] },
  { name: 'Air filter', every: 500, days: null, hazards: [] },
  { name: 'Hydraulic filter', every: 750, days: 365, hazards: ['hydraulic_pressure'] },
  { name: 'Grease driveline', every: 50, days: null, hazards: [] },
  { name: 'Transmission oil', every: 1000, days: null, hazards: ['hot_fluid'] },
  { name: 'PTO clutch check', every: 600, days: 365, hazards: ['pto'] },
  { name: 'Coolant', every: 2000, days: null, hazards: ['hot_fluid'] },
  { name: 'Valve clearance', every: 1500, days: null, hazards: [] },
  { name: 'Battery and cables', every: 400, days: 180, hazards: ['battery'] },
];

/** COPY text of one row: tab-separated, \N for null, arrays as {a,b}. */
export function copyLine(values: unknown[]): string {
  return `${values
    .map((v) =>
      v === null || v === undefined
        ? '\\N'
        : Array.isArray(v)
          ? `{${v.join(',')}}`
          : v instanceof Date
            ? v.toISOString()
            : String(v),
    )
    .join('\t')}\n`;
}

/** A fraction in [0, 1) from two integers (a fixed hash, so data sets repeat run to run). */
function spread(a: number, b: number): number {
  let h = Math.imul(a + 1, 0x9e3779b1) ^ Math.imul(b + 7, 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 15), 0xc2b2ae35);
  return ((h ^ (h >>> 13)) >>> 0) / 2 ** 32;
}

export interface BenchMachine {
  id: string;
  organizationId: string;
  /** hours a day the machine's meter runs (2–8) */
  rate: number;
  index: number;
}

/** `count` machines of one organization; `offset` keeps indexes (and so rates) apart across farms. */
export function machinesOf(organizationId: string, count: number, offset = 0): BenchMachine[] {
  return Array.from({ length: count }, (_, i) => ({
    id: randomUUID(),
    organizationId,
    rate: 2 + ((offset + i) % 7),
    index: offset + i,
  }));
}

export function* machineLines(machines: BenchMachine[]) {
  for (const m of machines) {
    const n = m.index + 1;
    const category = CATEGORIES[m.index % CATEGORIES.length];
    yield copyLine([
      m.id,
      m.organizationId,
      `SB-${String(n).padStart(5, '0')}`,
      `Scale machine ${n}`,
      category,
      ['Brindle', 'Tamsin', 'Corvid', 'Harl'][m.index % 4],
    ]);
  }
}
export const MACHINE_COLUMNS = [
  'id',
  'organization_id',
  'fleet_number',
  'name',
  'category',
  'make',
];

/** Meter value of a machine on its last reading (yesterday): `days` − 1 days of steady use. */
export const finalMeter = (m: BenchMachine, days: number) => (days - 1) * m.rate;

/**
 * The 10 tasks of each machine. Each sits at a spread point of its interval: about one in ten is
 * past its interval (overdue), the rest from just serviced to nearly due, as on a working fleet.
 */
export function* taskLines(machines: BenchMachine[], days: number, nowMs: number) {
  for (const m of machines) {
    const meter = finalMeter(m, days);
    for (const [t, task] of PLAN.entries()) {
      const used = 0.05 + 1.05 * spread(m.index, t); // share of the interval used since last done
      const lastDone = Math.max(0, Math.round(meter - used * task.every));
      const lastOn = new Date(nowMs - Math.round(used * (task.days ?? 300)) * DAY_MS);
      yield copyLine([
        m.organizationId,
        m.id,
        task.name,
        task.every,
        task.days,
        Math.round(task.every / 10),
        lastDone,
        lastOn.toISOString().slice(0, 10),
        t + 1,
        task.hazards,
        t % 2 ? 1.5 : 0.5,
      ]);
    }
  }
}
export const TASK_COLUMNS = [
  'organization_id',
  'machine_id',
  'name',
  'interval_meter',
  'interval_days',
  'warn_meter',
  'last_done_meter',
  'last_done_on',
  'position',
  'hazards',
  'labour_hours',
];

/** One reading a day at 18:00 UTC for `days` days, the last yesterday; the meter climbs `rate` a day. */
export function* readingLines(machines: BenchMachine[], days: number, nowMs: number) {
  const lastDay = Math.floor(nowMs / DAY_MS) - 1;
  for (const m of machines) {
    // one chunk per machine: COPY's stream takes fewer, larger writes
    let chunk = '';
    for (let d = 0; d < days; d++) {
      const value = d * m.rate;
      const at = new Date((lastDay - days + 1 + d) * DAY_MS + 18 * HOUR_MS).toISOString();
      chunk += `${m.organizationId}\t${m.id}\t${value}\t${value}\t${at}\ttelematics\n`;
    }
    yield chunk;
  }
}
export const READING_COLUMNS = [
  'organization_id',
  'machine_id',
  'value',
  'lifetime_value',
  'taken_at',
  'source',
];
