import { z } from 'zod';
import { DUE_STATUSES, MACHINE_CATEGORIES, MACHINE_STATUSES, METER_UNITS } from '../constants';
import { boundedNumber, pagingFields, plainText, uuid } from './common';
import { machineRefSchema, pageMetaSchema } from './refs';
import { MONEY_MAX_MINOR, minorAmount } from './money';
import { MACHINE_CLASSES } from '../domain/service-library/classes';
import { machineRestrictionSchema } from './machine-restrictions';

/** Ranges of a machine's numbers; prices are minor units (bigint), years integer. */
export const MACHINE_BOUNDS = {
  priceMinor: { max: MONEY_MAX_MINOR },
  year: { min: 1900, max: 2100, int: true },
} as const;

const money = (label: string) => minorAmount(label, MACHINE_BOUNDS.priceMinor.max).nullable();

/** A machine's fields, without defaults: an update changes only the fields it names. */
const machineFields = {
  fleetNumber: plainText(20, { required: 'Enter a fleet number' }),
  name: plainText(120, { required: 'Enter a name' }),
  category: z.enum(MACHINE_CATEGORIES, {
    error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
  }),
  make: plainText(80),
  model: plainText(80),
  serialNumber: plainText(80),
  /** the id a telematics feed sends for the machine (ISO 15143-3 EquipmentID); unique per farm */
  telematicsId: plainText(80).nullable(),
  year: boundedNumber('Year', MACHINE_BOUNDS.year).nullable(),
  /** minor units of the organization's currency */
  purchasePriceMinor: money('Purchase price'),
  /** list price when new, minor units of the organization's currency */
  listPriceMinor: money('List price'),
  meterUnit: z.enum(METER_UNITS, { error: `Meter unit must be one of: ${METER_UNITS.join(', ')}` }),
  status: z.enum(MACHINE_STATUSES, {
    error: `Status must be one of: ${MACHINE_STATUSES.join(', ')}`,
  }),
  seasonMonths: z
    .array(boundedNumber('Month', { min: 1, max: 12, int: true }), {
      error: 'Season months must be a list of months 1–12',
    })
    .max(12, { error: 'At most 12 months' }),
  operatorIds: z
    .array(uuid, { error: 'Operators must be a list of user ids' })
    .max(100, { error: 'At most 100 operators' }),
  notes: plainText(5000, { multiline: true }),
};

export const machineCreateSchema = z.object({
  ...machineFields,
  make: machineFields.make.default(''),
  model: machineFields.model.default(''),
  serialNumber: machineFields.serialNumber.default(''),
  telematicsId: machineFields.telematicsId.default(null),
  year: machineFields.year.default(null),
  purchasePriceMinor: machineFields.purchasePriceMinor.default(null),
  listPriceMinor: machineFields.listPriceMinor.default(null),
  meterUnit: machineFields.meterUnit.default('h'),
  status: machineFields.status.default('in_service'),
  seasonMonths: machineFields.seasonMonths.default([]),
  operatorIds: machineFields.operatorIds.default([]),
  notes: machineFields.notes.default(''),
});
export type MachineCreateInput = z.infer<typeof machineCreateSchema>;

/** Only the fields sent; an unknown field is refused by name. */
export const machineUpdateSchema = z.object(machineFields).partial().strict();
export type MachineUpdateInput = z.infer<typeof machineUpdateSchema>;

export const MACHINE_SORTS = ['fleetNumber', 'name', 'category', 'status', 'nextDue'] as const;
export const machineListQuerySchema = z.object({
  category: z.enum(MACHINE_CATEGORIES).optional(),
  status: z.enum(MACHINE_STATUSES).optional(),
  dueStatus: z.enum(['overdue', 'due_soon', 'ok', 'no_forecast', 'history_unknown']).optional(),
  q: plainText(100).optional(),
  sort: z.enum(MACHINE_SORTS).default('fleetNumber'),
  order: z.enum(['asc', 'desc']).default('asc'),
  ...pagingFields(50, 200),
});
export type MachineListQuery = z.infer<typeof machineListQuerySchema>;

// ── Responses ────────────────────────────────────────────────────────────────────────────────

/** The last reading: `value` as shown on the meter fitted now, `lifetimeValue` on the machine's lifetime scale. */
export const lastReadingSchema = z
  .object({
    /** the value shown on the meter fitted now */
    value: z.number(),
    /** the same reading on the machine's lifetime scale (differs after a meter replacement) */
    lifetimeValue: z.number(),
    takenAt: z.string(),
  })
  .meta({ id: 'LastReading' });
export type LastReading = z.infer<typeof lastReadingSchema>;

/** The server's usage estimate: meter units per day, with a low/high range. */
export const usageSchema = z
  .object({
    method: z.enum(['trend', 'season', 'none']),
    rate: z.number(),
    low: z.number(),
    high: z.number(),
    readingCount: z.number(),
    explanation: z.string(),
  })
  .meta({ id: 'Usage' });
export type Usage = z.infer<typeof usageSchema>;

export const machineSchema = z
  .object({
    id: z.string(),
    fleetNumber: z.string(),
    name: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    /** the service library's class the machine was given; null until one is applied */
    machineClass: z.enum(MACHINE_CLASSES).nullable(),
    make: z.string(),
    model: z.string(),
    serialNumber: z.string(),
    /** the id a telematics feed sends for it; null when none is mapped */
    telematicsId: z.string().nullable(),
    year: z.number().nullable(),
    /** minor units of the organization's currency */
    purchasePriceMinor: z.number().nullable(),
    listPriceMinor: z.number().nullable(),
    meterUnit: z.enum(METER_UNITS),
    status: z.enum(MACHINE_STATUSES),
    /** restricted use (shared/schemas/machine-restrictions.ts); null when there is none */
    restriction: machineRestrictionSchema.nullable(),
    seasonMonths: z.array(z.number()),
    notes: z.string(),
    operatorIds: z.array(z.string()),
    lastReading: lastReadingSchema.nullable(),
    dueStatus: z.enum(DUE_STATUSES).nullable(),
    /** ISO local date (yyyy-mm-dd) */
    nextDueDate: z.string().nullable(),
    /** served by the API to people who may see the machine; null without a photo */
    photoUrl: z.string().nullable(),
    thumbnailUrl: z.string().nullable(),
  })
  .meta({ id: 'Machine' });
export type Machine = z.infer<typeof machineSchema>;

export const machineAbilitiesSchema = z
  .object({
    update: z.boolean(),
    editSchedule: z.boolean(),
    setLastDone: z.boolean(),
    logReading: z.boolean(),
    correctReading: z.boolean(),
    replaceMeter: z.boolean(),
    /** the machine is tagged out and the caller is one of the farm's technicians or managers */
    returnToService: z.boolean(),
    /** set (or change) a restriction: the farm's technicians and managers, not on a sold machine */
    restrict: z.boolean(),
    /** lift the restriction it has: the farm's technicians and managers */
    liftRestriction: z.boolean(),
  })
  .meta({ id: 'MachineAbilities' });
export type MachineAbilities = z.infer<typeof machineAbilitiesSchema>;

/** Why and since when a machine is tagged out; a dealer is told neither why nor how many. */
export const tagOutSchema = z
  .object({
    since: z.string().nullable(),
    reason: z.string().nullable(),
    openCriticalDefects: z.number().nullable(),
  })
  .meta({ id: 'TagOut' });
export type TagOut = z.infer<typeof tagOutSchema>;

/** GET machines: one page of the fleet. */
export const machineListResponseSchema = z.object({
  data: z.array(machineSchema),
  meta: pageMetaSchema,
  abilities: z.object({ create: z.boolean() }),
});
export type MachineList = z.infer<typeof machineListResponseSchema>;

/** POST and PATCH of a machine: the machine as stored, with the caller's abilities on it. */
export const machineResponseSchema = z.object({
  data: machineSchema,
  abilities: machineAbilitiesSchema,
});
export type MachineResponse = z.infer<typeof machineResponseSchema>;

/** GET one machine: with its usage estimate and tag-out state. */
export const machineDetailResponseSchema = z.object({
  data: machineSchema.extend({ usage: usageSchema.nullable(), tagOut: tagOutSchema.nullable() }),
  abilities: machineAbilitiesSchema,
});
export type MachineDetail = z.infer<typeof machineDetailResponseSchema>;

/** Return to service: the machine with its new status. */
export const machineRefResponseSchema = z.object({ data: machineRefSchema });
export type MachineRefResponse = z.infer<typeof machineRefResponseSchema>;

/** PUT photo: where the new photo and its thumbnail are served. */
export const machinePhotoResponseSchema = z.object({
  data: z.object({ photoUrl: z.string(), thumbnailUrl: z.string() }),
});
export type MachinePhotoResponse = z.infer<typeof machinePhotoResponseSchema>;
