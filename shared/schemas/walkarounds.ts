import { z } from 'zod';
import { MACHINE_CATEGORIES } from '../constants';
import { boundedNumber, isoDateTime, pagingFields, PAST_DATES, plainText, uuid } from './common';
import { HAZARDS } from './schedule';
import { METER_BOUNDS } from './readings';

// Daily walkarounds (pre-operation inspections) and the checklist templates they follow.

export const WALKAROUND_RESULTS = ['ok', 'attention', 'fail'] as const;
export type WalkaroundResult = (typeof WALKAROUND_RESULTS)[number];
export const WALKAROUND_RESULT_LABELS: Record<WalkaroundResult, string> = {
  ok: 'OK',
  attention: 'Needs attention',
  fail: 'Fail',
};

/** 'use': the check before working the machine (refused on a tagged-out one); 'inspection': a shop check. */
export const WALKAROUND_PURPOSES = ['use', 'inspection'] as const;
export type WalkaroundPurpose = (typeof WALKAROUND_PURPOSES)[number];

export const checklistItemSchema = z.object({
  /** stable within its template; generated from the label when left out */
  id: z
    .string()
    .trim()
    .regex(/^[a-z0-9][a-z0-9-]{0,59}$/, {
      error: 'Item id: lower-case letters, digits and hyphens, at most 60',
    })
    .optional(),
  label: plainText(160, { required: 'Enter what to check' }),
  guidance: plainText(600, { multiline: true }).default(''),
  /** a fail here tags the machine out */
  critical: z.boolean({ error: 'Critical must be true or false' }).default(false),
  hazards: z
    .array(z.enum(HAZARDS, { error: `Hazards must be among: ${HAZARDS.join(', ')}` }))
    .max(6)
    .default([]),
  /** shown beside the item; left empty, the standard caution of its hazards is used */
  caution: plainText(1200, { multiline: true }).default(''),
});
export type ChecklistItemInput = z.infer<typeof checklistItemSchema>;

const items = z
  .array(checklistItemSchema, { error: 'A checklist needs at least one item' })
  .min(1, { error: 'A checklist needs at least one item' })
  .max(80, { error: 'At most 80 items' });

const templateFields = {
  category: z.enum(MACHINE_CATEGORIES, {
    error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
  }),
  name: plainText(120, { required: 'Enter a name' }),
  description: plainText(2000, { multiline: true }),
  items,
};

export const checklistTemplateCreateSchema = z.object({
  ...templateFields,
  description: templateFields.description.default(''),
});
export type ChecklistTemplateCreateInput = z.infer<typeof checklistTemplateCreateSchema>;

/** Only the fields sent (items, when sent, replace the list); an unknown field is refused by name. */
export const checklistTemplateUpdateSchema = z.object(templateFields).partial().strict();
export type ChecklistTemplateUpdateInput = z.infer<typeof checklistTemplateUpdateSchema>;

export const checklistQuerySchema = z.object({
  purpose: z
    .enum(WALKAROUND_PURPOSES, { error: 'Purpose must be use or inspection' })
    .default('use'),
});

export const walkaroundAnswerSchema = z.object({
  itemId: plainText(60, { required: 'Give the checklist item id' }),
  result: z.enum(WALKAROUND_RESULTS, { error: 'Result must be ok, attention or fail' }),
  note: plainText(1000, { multiline: true }).default(''),
  /** id from POST …/walkaround-photos */
  photoId: uuid.nullable().default(null),
});
export type WalkaroundAnswer = z.infer<typeof walkaroundAnswerSchema>;

export const walkaroundCreateSchema = z.object({
  machineId: uuid,
  /** generated on the phone when the form opens; a re-sent submission with it is not doubled */
  clientId: z.uuid({ error: 'clientId must be a uuid generated on the device' }),
  purpose: z
    .enum(WALKAROUND_PURPOSES, { error: 'Purpose must be use or inspection' })
    .default('use'),
  meterValue: boundedNumber('Hour meter', METER_BOUNDS),
  /** when the walkaround was done (kept on the phone when offline); default now */
  performedAt: isoDateTime('Performed at', PAST_DATES).optional(),
  items: z
    .array(walkaroundAnswerSchema, { error: 'Answer the checklist items' })
    .min(1, { error: 'Answer the checklist items' })
    .max(100, { error: 'At most 100 items' }),
  notes: plainText(2000, { multiline: true }).default(''),
});
export type WalkaroundCreateInput = z.infer<typeof walkaroundCreateSchema>;

export const walkaroundListQuerySchema = z.object({
  machineId: uuid.optional(),
  result: z.enum(WALKAROUND_RESULTS).optional(),
  ...pagingFields(20, 100),
});
export type WalkaroundListQuery = z.infer<typeof walkaroundListQuerySchema>;

/** Largest walkaround photo, bytes. */
export const WALKAROUND_PHOTO_MAX_BYTES = 10 * 1024 * 1024;
