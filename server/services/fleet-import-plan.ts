// The checks of one fleet-file row that need no writing: its cells parsed and validated with the
// same schemas as the machine form, the reading and the last-done form. What the row asks for is
// returned as a plan; every problem as a line-numbered message.
import type { z } from 'zod';
import {
  machineCreateSchema,
  machineUpdateSchema,
  type MachineCreateInput,
  type MachineUpdateInput,
} from '../../shared/schemas/machines';
import { readingCreateSchema } from '../../shared/schemas/readings';
import { lastDoneSchema, type LastDoneInput } from '../../shared/schemas/schedule';
import { meterNumberMessage } from '../../shared/domain/meter-number';
import type { MeterUnit } from '../../shared/constants';
import {
  MACHINE_CLASS_LABELS,
  MACHINE_CLASSES,
  parseMachineClass,
  serviceLibraryClass,
  type MachineClass,
} from '../../shared/domain/service-library';
import { machineClassProblem } from './machine-class';
import type { Machine, ScheduleTemplate } from '../models';
import { parseCsvNumber, parseLocalDate, parseTakenAt } from '../infra/csv-sheet';
import {
  CATEGORY_CHOICES,
  METER_UNIT_CHOICES,
  parseCategory,
  parseMeterUnit,
  type FleetColumn,
  type FleetColumns,
} from './fleet-import-columns';

export interface RowPlan {
  line: number;
  fleetNumber: string;
  /** the machine's name after the import: the row's name cell, else the machine's own */
  name: string | null;
  existing: Machine | null;
  create: MachineCreateInput | null;
  /** only the fields whose value differs from the machine's */
  update: MachineUpdateInput;
  reading: { value: number; takenAt: Date; text: string } | null;
  template: ScheduleTemplate | null;
  /** the service library's class to apply (its missing tasks are added) */
  machineClass: MachineClass | null;
  lastDone: { taskName: string; input: LastDoneInput }[];
  errors: string[];
}

export interface PlanContext {
  columns: FleetColumns;
  timeZone: string;
  order: 'mdy' | 'dmy';
  decimalComma: boolean;
  /** existing machines by lower-case fleet number, with their tasks' names */
  machines: Map<string, { machine: Machine; taskNames: string[] }>;
  templates: ScheduleTemplate[];
}

const LABELS: Record<FleetColumn, string> = {
  fleetNumber: 'fleet number',
  name: 'name',
  category: 'category',
  make: 'make',
  model: 'model',
  serialNumber: 'serial',
  year: 'year',
  meterUnit: 'meter unit',
  meterValue: 'meter reading',
  readingDate: 'reading date',
  schedule: 'schedule',
  machineClass: 'machine class',
  notes: 'notes',
};

const issuesOf = (error: z.ZodError, line: number, label: (field: string) => string) =>
  error.issues.map((i) => `Line ${line}, ${label(String(i.path[0] ?? ''))}: ${i.message}`);

function findTemplate(templates: ScheduleTemplate[], name: string, category: string | null) {
  const named = templates.filter((t) => t.name.toLowerCase() === name.toLowerCase());
  return named.find((t) => t.category === category) ?? named[0] ?? null;
}

/** Checks one data row; `seen` holds the fleet numbers of earlier rows (lower case → line). */
export function planRow(
  ctx: PlanContext,
  record: string[],
  line: number,
  seen: Map<string, number>,
): RowPlan {
  const cell = (field: FleetColumn): string | undefined => {
    const i = ctx.columns.machine[field];
    const value = i === undefined ? '' : (record[i] ?? '').trim();
    return value === '' ? undefined : value;
  };
  const fleetNumber = cell('fleetNumber') ?? '';
  const found = ctx.machines.get(fleetNumber.toLowerCase()) ?? null;
  const plan: RowPlan = {
    line,
    fleetNumber,
    name: cell('name') ?? found?.machine.name ?? null,
    existing: found?.machine ?? null,
    create: null,
    update: {},
    reading: null,
    template: null,
    machineClass: null,
    lastDone: [],
    errors: [],
  };
  const fail = (message: string, field?: string) =>
    plan.errors.push(field ? `Line ${line}, ${field}: ${message}` : `Line ${line}: ${message}`);
  if (!fleetNumber) {
    fail('fleet number is empty');
    return plan;
  }
  const earlier = seen.get(fleetNumber.toLowerCase());
  if (earlier !== undefined) {
    fail(`fleet number ${fleetNumber} is already on line ${earlier}; give each machine one row`);
    return plan;
  }
  seen.set(fleetNumber.toLowerCase(), line);

  // The machine's own fields: only the cells given.
  const fields: Record<string, unknown> = {};
  for (const field of ['name', 'make', 'model', 'serialNumber', 'notes'] as const) {
    if (cell(field) !== undefined) fields[field] = cell(field);
  }
  const category = cell('category');
  if (category !== undefined) {
    const parsed = parseCategory(category);
    if (parsed) fields.category = parsed;
    else fail(`"${category}" is not a category; use one of ${CATEGORY_CHOICES}`, 'category');
  }
  const unit = cell('meterUnit');
  if (unit !== undefined) {
    const parsed = parseMeterUnit(unit);
    if (parsed) fields.meterUnit = parsed;
    else fail(`"${unit}" is not a meter unit; use one of ${METER_UNIT_CHOICES}`, 'meter unit');
  }
  const year = cell('year');
  if (year !== undefined) {
    if (/^\d{4}$/.test(year)) fields.year = Number(year);
    else fail(`"${year}" must be a year like 2016`, 'year');
  }
  const label = (field: string) => LABELS[field as FleetColumn] ?? field;
  if (plan.existing) {
    const machine = plan.existing;
    const changed = Object.fromEntries(
      Object.entries(fields).filter(([k, v]) => machine.get(k as keyof Machine) !== v),
    );
    const parsed = machineUpdateSchema.safeParse(changed);
    if (parsed.success) plan.update = parsed.data;
    else plan.errors.push(...issuesOf(parsed.error, line, label));
  } else {
    if (fields.name === undefined) fail('name is empty; a new machine needs a name', 'name');
    if (fields.category === undefined && category === undefined)
      fail(`category is empty; a new machine needs one of ${CATEGORY_CHOICES}`, 'category');
    if (fields.name !== undefined && fields.category !== undefined) {
      const parsed = machineCreateSchema.safeParse({ ...fields, fleetNumber });
      if (parsed.success) plan.create = parsed.data;
      else plan.errors.push(...issuesOf(parsed.error, line, label));
    }
  }

  // The current meter reading and its date go together.
  const meter = cell('meterValue');
  const date = cell('readingDate');
  if (meter !== undefined || date !== undefined) {
    const number = meter === undefined ? null : parseCsvNumber(meter, ctx.decimalComma);
    const value = number?.ok ? number.value : null;
    if (meter === undefined) fail('is empty but a reading date is given', 'meter reading');
    else if (number && !number.ok) fail(meterNumberMessage(meter, number), 'meter reading');
    else {
      const bounds = readingCreateSchema.shape.value.safeParse(value);
      if (!bounds.success) fail(bounds.error.issues[0].message, 'meter reading');
    }
    const takenAt = date === undefined ? null : parseTakenAt(date, ctx.timeZone, ctx.order, 0);
    if (date === undefined)
      fail(`is empty; give the date the meter showed ${meter}`, 'reading date');
    else if (typeof takenAt === 'string') fail(`"${date}" ${takenAt}`, 'reading date');
    if (value !== null && takenAt instanceof Date && !plan.errors.length) {
      if (plan.existing?.status === 'sold')
        fail(`${plan.existing.fleetNumber} is sold; readings are closed`, 'meter reading');
      else plan.reading = { value, takenAt, text: `${meter} on ${date}` };
    }
  }

  // The schedule to apply, and the last service of its tasks.
  const schedule = cell('schedule');
  const categoryNow = (fields.category as string | undefined) ?? plan.existing?.category ?? null;
  if (schedule !== undefined) {
    plan.template = findTemplate(ctx.templates, schedule, categoryNow);
    if (!plan.template)
      fail(
        ctx.templates.length
          ? `"${schedule}" is not a schedule template of this farm; use one of ${ctx.templates.map((t) => t.name).join(', ')}`
          : `"${schedule}" is not a schedule template of this farm (it has none yet)`,
        'schedule',
      );
  }
  const machineClass = cell('machineClass');
  if (machineClass !== undefined) {
    const parsed = parseMachineClass(machineClass);
    const unit = (fields.meterUnit as MeterUnit | undefined) ?? plan.existing?.meterUnit ?? 'h';
    const problem = parsed && machineClassProblem(unit, parsed);
    if (!parsed)
      fail(
        `"${machineClass}" is not a machine class; use one of ${MACHINE_CLASSES.map((c) => MACHINE_CLASS_LABELS[c]).join(', ')}`,
        'machine class',
      );
    else if (problem) fail(problem, 'machine class');
    else plan.machineClass = parsed;
  }
  const libraryNames = plan.machineClass
    ? serviceLibraryClass(plan.machineClass).tasks.map((t) => t.name)
    : [];
  const taskNames = new Set(
    [
      ...(found?.taskNames ?? []),
      ...(plan.template?.tasks.map((t) => t.name) ?? []),
      ...libraryNames,
    ].map((n) => n.toLowerCase()),
  );
  for (const task of ctx.columns.tasks) {
    const on = task.dateCol === null ? '' : (record[task.dateCol] ?? '').trim();
    const at = task.meterCol === null ? '' : (record[task.meterCol] ?? '').trim();
    if (!on && !at) continue;
    const field = `${task.name} last done`;
    if (!on || !at) {
      fail('give both the date (last done) and the meter (last meter) of that service', field);
      continue;
    }
    if (!taskNames.has(task.name.toLowerCase())) {
      fail(`${fleetNumber} has no task "${task.name}"; give a schedule that has it`, field);
      continue;
    }
    const lastDoneOn = parseLocalDate(on, ctx.order);
    const lastDoneMeter = parseCsvNumber(at, ctx.decimalComma);
    if (typeof lastDoneOn !== 'string') fail(`"${on}" ${lastDoneOn.error}`, field);
    if (!lastDoneMeter.ok) fail(meterNumberMessage(at, lastDoneMeter), `${task.name} last meter`);
    if (typeof lastDoneOn !== 'string' || !lastDoneMeter.ok) continue;
    const parsed = lastDoneSchema.safeParse({ lastDoneOn, lastDoneMeter: lastDoneMeter.value });
    if (parsed.success) plan.lastDone.push({ taskName: task.name, input: parsed.data });
    else plan.errors.push(...issuesOf(parsed.error, line, () => field));
  }
  return plan;
}
