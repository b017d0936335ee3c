import { z } from 'zod';
import type {
  Machine,
  MachineForecast,
  MeterReading,
  MeterReplacement,
  ServiceTask,
} from '../models';
import type { DuePoint, UsageEstimate } from '../../shared/domain';
import {
  DUE_STATUSES,
  MACHINE_CATEGORIES,
  MACHINE_STATUSES,
  METER_UNITS,
  READING_SOURCES,
} from '../../shared/constants';

export const duePointSchema = z
  .object({
    status: z.enum(DUE_STATUSES),
    governs: z.enum(['meter', 'calendar']).nullable(),
    dueMeter: z.number().nullable(),
    dueDate: z.string().nullable(),
    projectedDate: z.string().nullable(),
    projectedLow: z.string().nullable(),
    projectedHigh: z.string().nullable(),
    effectiveDate: z.string().nullable(),
    remainingMeter: z.number().nullable(),
    remainingDays: z.number().nullable(),
    basis: z.enum(['recorded', 'first_service', 'assumed', 'counted', 'unknown']),
  })
  .openapi('DuePoint');

export const usageSchema = z
  .object({
    method: z.enum(['trend', 'season', 'none']),
    rate: z.number(),
    low: z.number(),
    high: z.number(),
    readingCount: z.number(),
    explanation: z.string(),
  })
  .openapi('Usage');

/** The last reading: `value` as shown on the meter fitted now, `lifetimeValue` on the machine's lifetime scale. */
export const lastReadingSchema = z
  .object({ value: z.number(), lifetimeValue: z.number(), takenAt: z.string() })
  .openapi('LastReading');

/** The last reading of a forecast summary, in both scales. */
export function presentLastReading(
  f:
    | { lastValue: number | null; lastRawValue?: number | null; lastTakenAt: Date | null }
    | null
    | undefined,
) {
  if (!f || f.lastValue == null || !f.lastTakenAt) return null;
  return {
    value: f.lastRawValue ?? f.lastValue,
    lifetimeValue: f.lastValue,
    takenAt: f.lastTakenAt.toISOString(),
  };
}

export const machineSchema = z
  .object({
    id: z.string(),
    fleetNumber: z.string(),
    name: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    make: z.string(),
    model: z.string(),
    serialNumber: z.string(),
    year: z.number().nullable(),
    purchasePrice: z.number().nullable(),
    listPrice: z.number().nullable(),
    meterUnit: z.enum(METER_UNITS),
    status: z.enum(MACHINE_STATUSES),
    seasonMonths: z.array(z.number()),
    notes: z.string(),
    operatorIds: z.array(z.string()),
    lastReading: lastReadingSchema.nullable(),
    dueStatus: z.enum(DUE_STATUSES).nullable(),
    nextDueDate: z.string().nullable(),
    photoUrl: z.string().nullable(),
    thumbnailUrl: z.string().nullable(),
  })
  .openapi('Machine');

const photoUrls = (m: Machine) => {
  if (!m.photoKey) return { photoUrl: null, thumbnailUrl: null };
  // The key changes with every upload, so the URL does too (safe to cache).
  const base = `/api/v1/organizations/${m.organizationId}/machines/${m.id}/photo?v=${m.photoKey.slice(-8)}`;
  return { photoUrl: base, thumbnailUrl: `${base}&size=thumb` };
};

export function presentMachine(
  m: Machine,
  extra: {
    operatorIds: string[];
    forecast?: MachineForecast | null;
    dueStatus?: string | null;
    nextDueDate?: string | null;
  },
) {
  return {
    id: m.id,
    fleetNumber: m.fleetNumber,
    name: m.name,
    category: m.category,
    make: m.make,
    model: m.model,
    serialNumber: m.serialNumber,
    year: m.year,
    purchasePrice: m.purchasePrice,
    listPrice: m.listPrice,
    meterUnit: m.meterUnit,
    status: m.status,
    seasonMonths: m.seasonMonths,
    notes: m.notes,
    operatorIds: extra.operatorIds,
    lastReading: presentLastReading(extra.forecast),
    dueStatus: (extra.dueStatus as DuePoint['status']) ?? null,
    nextDueDate: extra.nextDueDate ?? null,
    ...photoUrls(m),
  };
}

export const presentUsage = (u: UsageEstimate | null) =>
  u
    ? {
        method: u.method,
        rate: u.rate,
        low: u.low,
        high: u.high,
        readingCount: u.readingCount,
        explanation: u.explanation,
      }
    : null;

export const taskSchema = z
  .object({
    id: z.string(),
    machineId: z.string(),
    name: z.string(),
    intervalMeter: z.number().nullable(),
    intervalDays: z.number().nullable(),
    firstServiceMeter: z.number().nullable(),
    warnMeter: z.number().nullable(),
    warnDays: z.number().nullable(),
    parts: z.array(
      z.object({ partNumber: z.string(), description: z.string(), quantity: z.number() }),
    ),
    fluids: z.array(z.object({ kind: z.string(), volume: z.number(), unit: z.string() })),
    labourHours: z.number().nullable(),
    instructions: z.string(),
    safetyNotes: z.string(),
    hazards: z.array(z.string()),
    lastDoneMeter: z.number().nullable(),
    lastDoneOn: z.string().nullable(),
    /** "start counting from now" in place of an unknown last service (lifetime meter, ISO date) */
    countFromMeter: z.number().nullable(),
    countFromOn: z.string().nullable(),
    due: duePointSchema.nullable(),
  })
  .openapi('ServiceTask');

export const presentTask = (t: ServiceTask, due: DuePoint | null) => ({
  id: t.id,
  machineId: t.machineId,
  name: t.name,
  intervalMeter: t.intervalMeter,
  intervalDays: t.intervalDays,
  firstServiceMeter: t.firstServiceMeter,
  warnMeter: t.warnMeter,
  warnDays: t.warnDays,
  parts: t.parts,
  fluids: t.fluids,
  labourHours: t.labourHours,
  instructions: t.instructions,
  safetyNotes: t.safetyNotes,
  hazards: t.hazards,
  lastDoneMeter: t.lastDoneMeter,
  lastDoneOn: t.lastDoneOn,
  countFromMeter: t.countFromMeter ?? null,
  countFromOn: t.countFromOn ?? null,
  due,
});

export const readingSchema = z
  .object({
    id: z.string(),
    value: z.number(),
    lifetimeValue: z.number(),
    takenAt: z.string(),
    source: z.enum(READING_SOURCES),
    enteredBy: z.string().nullable(),
  })
  .openapi('MeterReading');

export const presentReading = (r: MeterReading) => ({
  id: r.id,
  value: r.value,
  lifetimeValue: r.lifetimeValue,
  takenAt: r.takenAt.toISOString(),
  source: r.source,
  enteredBy: r.enteredBy,
});

export const replacementSchema = z
  .object({
    id: z.string(),
    replacedAt: z.string(),
    oldFinalValue: z.number(),
    newStartValue: z.number(),
    note: z.string(),
  })
  .openapi('MeterReplacement');

export const presentReplacement = (r: MeterReplacement) => ({
  id: r.id,
  replacedAt: r.replacedAt.toISOString(),
  oldFinalValue: r.oldFinalValue,
  newStartValue: r.newStartValue,
  note: r.note,
});
