import { z } from 'zod';
import { MACHINE_CATEGORIES } from '../constants';
import { uuid, pagingFields } from './common';
import { HAZARDS } from './schedule';

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
  label: z
    .string({ error: 'Enter what to check' })
    .trim()
    .min(1, { error: 'Enter what to check' })
    .max(160, { error: 'Use at most 160 characters' }),
  guidance: z.string().trim().max(600, { error: 'Use at most 600 characters' }).default(''),
  /** a fail here tags the machine out */
  critical: z.boolean({ error: 'Critical must be true or false' }).default(false),
  hazards: z
    .array(z.enum(HAZARDS, { error: `Hazards must be among: ${HAZARDS.join(', ')}` }))
    .max(6)
    .default([]),
  /** shown beside the item; left empty, the standard caution of its hazards is used */
  caution: z.string().trim().max(1200, { error: 'Use at most 1,200 characters' }).default(''),
});
export type ChecklistItemInput = z.infer<typeof checklistItemSchema>;

const items = z
  .array(checklistItemSchema)
  .min(1, { error: 'A checklist needs at least one item' })
  .max(80, { error: 'At most 80 items' });

const templateFields = {
  category: z.enum(MACHINE_CATEGORIES, {
    error: `Category must be one of: ${MACHINE_CATEGORIES.join(', ')}`,
  }),
  name: z
    .string({ error: 'Enter a name' })
    .trim()
    .min(1, { error: 'Enter a name' })
    .max(120, { error: 'Use at most 120 characters' }),
  description: z.string().trim().max(2000, { error: 'Use at most 2,000 characters' }),
  items,
};

export const checklistTemplateCreateSchema = z.object({
  ...templateFields,
  description: templateFields.description.default(''),
});
export type ChecklistTemplateCreateInput = z.infer<typeof checklistTemplateCreateSchema>;

export const checklistTemplateUpdateSchema = z.object(templateFields).partial();
export type ChecklistTemplateUpdateInput = z.infer<typeof checklistTemplateUpdateSchema>;

export const checklistQuerySchema = z.object({
  purpose: z
    .enum(WALKAROUND_PURPOSES, { error: 'Purpose must be use or inspection' })
    .default('use'),
});

export const walkaroundAnswerSchema = z.object({
  itemId: z
    .string({ error: 'Give the checklist item id' })
    .trim()
    .min(1, { error: 'Give the checklist item id' })
    .max(60),
  result: z.enum(WALKAROUND_RESULTS, { error: 'Result must be ok, attention or fail' }),
  note: z.string().trim().max(1000, { error: 'Use at most 1,000 characters' }).default(''),
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
  meterValue: z
    .number({ error: 'Hour meter must be a number' })
    .min(0, { error: 'Hour meter may not be negative' })
    .max(10_000_000, { error: 'Hour meter value is too large' }),
  /** when the walkaround was done (kept on the phone when offline); default now */
  performedAt: z.iso
    .datetime({ offset: true, error: 'Performed at must be an ISO date-time' })
    .optional(),
  items: z
    .array(walkaroundAnswerSchema)
    .min(1, { error: 'Answer the checklist items' })
    .max(100, { error: 'At most 100 items' }),
  notes: z.string().trim().max(2000, { error: 'Use at most 2,000 characters' }).default(''),
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
