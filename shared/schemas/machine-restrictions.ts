import { z } from 'zod';
import { plainText } from './common';
import { machineRefSchema } from './refs';

// Restricted use: a machine in service that may only be used within a limit ("Field only — no
// road: left flasher out"). The reason is for the people who pick the machine up, so it is short.

/** A restriction's reason: said in a few words, at most a line or two on a phone. */
export const RESTRICTION_REASON_BOUNDS = { min: 3, max: 300 } as const;

export const restrictionSetSchema = z
  .object({
    reason: plainText(RESTRICTION_REASON_BOUNDS.max, {
      required: 'Say what the machine may and may not be used for, and why',
    }).min(RESTRICTION_REASON_BOUNDS.min, {
      error: `Say why in at least ${RESTRICTION_REASON_BOUNDS.min} characters`,
    }),
  })
  .strict();
export type RestrictionSetInput = z.infer<typeof restrictionSetSchema>;

export const restrictionLiftSchema = z
  .object({
    /** what was done (optional): kept in the audit log beside the lifted reason */
    note: plainText(RESTRICTION_REASON_BOUNDS.max).default(''),
  })
  .strict();
export type RestrictionLiftInput = z.infer<typeof restrictionLiftSchema>;

// --- Responses ---------------------------------------------------------------------------------

/** Why and since when a machine's use is restricted; a dealer is told that it is, not why. */
export const machineRestrictionSchema = z
  .object({
    reason: z.string().nullable(),
    since: z.string(),
  })
  .meta({ id: 'MachineRestriction' });
export type MachineRestriction = z.infer<typeof machineRestrictionSchema>;

/** Set or lift: the machine and its restriction now (null once lifted). */
export const restrictionResponseSchema = z.object({
  data: z.object({
    machine: machineRefSchema,
    restriction: machineRestrictionSchema.nullable(),
  }),
});
export type RestrictionResponse = z.infer<typeof restrictionResponseSchema>;
