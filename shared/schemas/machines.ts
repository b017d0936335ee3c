import { z } from 'zod';
import { MACHINE_CATEGORIES, MACHINE_STATUSES, METER_UNITS } from '../constants';
import { boundedNumber, pagingFields, plainText, uuid } from './common';

/** Ranges of a machine's numbers; prices fit numeric(12,2), years integer. */
export const MACHINE_BOUNDS = {
  price: { min: 0, max: 100_000_000 },
  year: { min: 1900, max: 2100, int: true },
} as const;

const money = (label: string) => boundedNumber(label, MACHINE_BOUNDS.price).nullable();

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
  year: boundedNumber('Year', MACHINE_BOUNDS.year).nullable(),
  purchasePrice: money('Purchase price'),
  listPrice: money('List price'),
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
  year: machineFields.year.default(null),
  purchasePrice: machineFields.purchasePrice.default(null),
  listPrice: machineFields.listPrice.default(null),
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
