import { z } from 'zod';
import { MACHINE_CATEGORIES, MACHINE_STATUSES, METER_UNITS } from '../constants';
import { uuid, pagingFields } from './common';

const money = (label: string) =>
  z
    .number({ error: `${label} must be a number` })
    .min(0, { error: `${label} may not be negative` })
    .max(100_000_000, { error: `${label} is too large` })
    .nullable()
    .default(null);

const machineFields = {
  fleetNumber: z
    .string({ error: 'Enter a fleet number' })
    .trim()
    .min(1, { error: 'Enter a fleet number' })
    .max(20, { error: 'Use at most 20 characters' }),
  name: z.string({ error: 'Enter a name' }).trim().min(1, { error: 'Enter a name' }).max(120),
  category: z.enum(MACHINE_CATEGORIES, {
    error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
  }),
  make: z.string().trim().max(80).default(''),
  model: z.string().trim().max(80).default(''),
  serialNumber: z.string().trim().max(80).default(''),
  year: z
    .number({ error: 'Year must be a number' })
    .int({ error: 'Year must be a whole number' })
    .min(1900, { error: 'Year must be 1900 or later' })
    .max(2100, { error: 'Year must be 2100 or earlier' })
    .nullable()
    .default(null),
  purchasePrice: money('Purchase price'),
  listPrice: money('List price'),
  meterUnit: z
    .enum(METER_UNITS, { error: `Meter unit must be one of: ${METER_UNITS.join(', ')}` })
    .default('h'),
  status: z
    .enum(MACHINE_STATUSES, { error: `Status must be one of: ${MACHINE_STATUSES.join(', ')}` })
    .default('in_service'),
  seasonMonths: z
    .array(
      z.number().int().min(1, { error: 'Months are 1–12' }).max(12, { error: 'Months are 1–12' }),
    )
    .max(12)
    .default([]),
  operatorIds: z.array(uuid).max(100).default([]),
  notes: z.string().max(5000).default(''),
};

export const machineCreateSchema = z.object(machineFields);
export type MachineCreateInput = z.infer<typeof machineCreateSchema>;

export const machineUpdateSchema = z.object(machineFields).partial();
export type MachineUpdateInput = z.infer<typeof machineUpdateSchema>;

export const MACHINE_SORTS = ['fleetNumber', 'name', 'category', 'status', 'nextDue'] as const;
export const machineListQuerySchema = z.object({
  category: z.enum(MACHINE_CATEGORIES).optional(),
  status: z.enum(MACHINE_STATUSES).optional(),
  dueStatus: z.enum(['overdue', 'due_soon', 'ok', 'no_forecast']).optional(),
  q: z.string().trim().max(100).optional(),
  sort: z.enum(MACHINE_SORTS).default('fleetNumber'),
  order: z.enum(['asc', 'desc']).default('asc'),
  ...pagingFields(50, 200),
});
export type MachineListQuery = z.infer<typeof machineListQuerySchema>;
