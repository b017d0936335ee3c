// The columns of a fleet file: which header names we accept for each machine field, the
// last-service columns named after schedule tasks ("Engine oil last done", "Engine oil last
// meter"), and the words accepted for categories and meter units.
import {
  CATEGORY_LABELS,
  MACHINE_CATEGORIES,
  METER_UNITS,
  type MachineCategory,
  type MeterUnit,
} from '../../shared/constants';
import { invalid } from '../errors';
import { normaliseHeader } from '../infra/csv-sheet';

export const FLEET_COLUMNS = {
  fleetNumber: ['fleet number', 'fleet_number', 'fleetnumber', 'fleet no', 'fleet no.', 'fleet'],
  name: ['name', 'machine name'],
  category: ['category', 'machine category', 'type', 'machine type'],
  make: ['make', 'manufacturer'],
  model: ['model'],
  serialNumber: [
    'serial',
    'serial number',
    'serial_number',
    'serial no',
    'serial no.',
    'serialnumber',
  ],
  year: ['year', 'model year', 'year built'],
  meterUnit: ['meter unit', 'meter_unit', 'meterunit', 'meter units'],
  meterValue: ['meter reading', 'current meter', 'meter', 'reading', 'hours', 'hour meter'],
  readingDate: ['reading date', 'meter date', 'read on', 'date read', 'taken at', 'reading taken'],
  schedule: ['schedule', 'schedule template', 'template'],
  machineClass: ['machine class', 'machine_class', 'class', 'service library class'],
  notes: ['notes'],
} as const;
export type FleetColumn = keyof typeof FLEET_COLUMNS;

const TASK_DATE = /^(.+?)[\s:–-]+last (?:done|done on|service|service date)$/i;
const TASK_METER = /^(.+?)[\s:–-]+last (?:meter|hours|done at|service meter)$/i;

export interface TaskColumns {
  /** the task's name as the header writes it */
  name: string;
  dateCol: number | null;
  meterCol: number | null;
}

export interface FleetColumns {
  machine: Partial<Record<FleetColumn, number>>;
  tasks: TaskColumns[];
  /** header cells, as written, that are none of the above */
  ignored: string[];
  /** header cells of the recognised machine columns, as written */
  machineText: string[];
}

/** Maps the header row to machine columns and task columns; a file without fleet number is refused. */
export function mapFleetColumns(header: string[], headerText: string[]): FleetColumns {
  const machine: FleetColumns['machine'] = {};
  const tasks = new Map<string, TaskColumns>();
  const ignored: string[] = [];
  const machineText: string[] = [];
  header.forEach((cell, i) => {
    const field = (Object.keys(FLEET_COLUMNS) as FleetColumn[]).find((key) =>
      (FLEET_COLUMNS[key] as readonly string[]).includes(cell),
    );
    if (field) {
      if (machine[field] !== undefined)
        throw invalid({ file: `The header names the ${field} column twice ("${headerText[i]}")` });
      machine[field] = i;
      machineText.push(headerText[i]);
      return;
    }
    const written = headerText[i].replace(/\s+/g, ' ').trim();
    const date = written.match(TASK_DATE);
    const meter = written.match(TASK_METER);
    const taskName = (date ?? meter)?.[1];
    if (taskName) {
      const key = normaliseHeader(taskName);
      const entry = tasks.get(key) ?? { name: taskName, dateCol: null, meterCol: null };
      if (date) entry.dateCol = i;
      else entry.meterCol = i;
      tasks.set(key, entry);
      return;
    }
    if (cell) ignored.push(headerText[i]);
  });
  if (machine.fleetNumber === undefined)
    throw invalid({
      file: 'The header row must name a fleet number column (and name and category for new machines)',
    });
  return { machine, tasks: [...tasks.values()], ignored, machineText };
}

const CATEGORY_WORDS = new Map<string, MachineCategory>(
  MACHINE_CATEGORIES.flatMap((c) => [
    [c, c],
    [CATEGORY_LABELS[c].toLowerCase(), c],
    [`${c}s`, c],
  ]),
);

/** A category cell ("Tractor", "balers") as the category, or null when it is none. */
export const parseCategory = (cell: string): MachineCategory | null =>
  CATEGORY_WORDS.get(cell.trim().toLowerCase()) ?? null;

const UNIT_WORDS: Record<string, MeterUnit> = {
  h: 'h',
  hr: 'h',
  hrs: 'h',
  hour: 'h',
  hours: 'h',
  km: 'km',
  kilometres: 'km',
  kilometers: 'km',
  mi: 'mi',
  mile: 'mi',
  miles: 'mi',
  bales: 'bales',
  bale: 'bales',
  ha: 'ha',
  hectares: 'ha',
  acres: 'acres',
  acre: 'acres',
  ac: 'acres',
};

/** A meter-unit cell ("hours", "km") as the unit, or null when it is none. */
export const parseMeterUnit = (cell: string): MeterUnit | null =>
  UNIT_WORDS[cell.trim().toLowerCase()] ?? null;

export const CATEGORY_CHOICES = MACHINE_CATEGORIES.join(', ');
export const METER_UNIT_CHOICES = METER_UNITS.join(', ');
