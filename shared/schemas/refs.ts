import { z } from 'zod';
import { MACHINE_CATEGORIES, MACHINE_STATUSES, METER_UNITS } from '../constants';

// Small shapes many responses carry: a person, an organization, a machine, a page of a list.
// `.meta({ id })` names them in the OpenAPI document.

export const personRefSchema = z
  .object({ id: z.string(), name: z.string() })
  .meta({ id: 'PersonRef' });
export type PersonRef = z.infer<typeof personRefSchema>;

export const orgRefSchema = z.object({ id: z.string(), name: z.string() }).meta({ id: 'OrgRef' });
export type OrgRef = z.infer<typeof orgRefSchema>;

export const machineRefSchema = z
  .object({
    id: z.string(),
    fleetNumber: z.string(),
    name: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    status: z.enum(MACHINE_STATUSES),
    /** in service but restricted in use (its reason is on the machine and its checklist) */
    restricted: z.boolean(),
    meterUnit: z.enum(METER_UNITS),
  })
  .meta({ id: 'MachineRef' });
export type MachineRef = z.infer<typeof machineRefSchema>;

/** The `meta` of a paged list. */
export const pageMetaSchema = z.object({
  total: z.number(),
  page: z.number(),
  pageSize: z.number(),
});
export type PageMeta = z.infer<typeof pageMetaSchema>;
