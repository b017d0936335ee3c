import { z } from 'zod';
import { MACHINE_CATEGORIES } from '../constants';
import { boundedNumber, isoDateTime, pagingFields, PAST_DATES, plainText, uuid } from './common';
import { HAZARDS } from './schedule';
import { METER_BOUNDS } from './readings';
import { defectSchema } from './defects';
import { machineRefSchema, pageMetaSchema, personRefSchema } from './refs';
import { careDoneSchema, careSignedOffSchema, dailyCareItemSchema } from './daily-care';
import { MACHINE_CLASSES } from '../domain/service-library/classes';
import { machineRestrictionSchema } from './machine-restrictions';

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

/**
 * When an item is checked: walking round before start, engine off and key out; or from the seat
 * with the engine running (brakes, steering, gauges). A stored item without one is before_start.
 */
export const CHECKLIST_PHASES = ['before_start', 'running'] as const;
export type ChecklistPhase = (typeof CHECKLIST_PHASES)[number];
export const CHECKLIST_PHASE_LABELS: Record<ChecklistPhase, string> = {
  before_start: 'Before start — engine off, key out',
  running: 'In the seat, engine running',
};

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
  phase: z
    .enum(CHECKLIST_PHASES, { error: `Phase must be one of: ${CHECKLIST_PHASES.join(', ')}` })
    .default('before_start'),
  /** only on machines of these service-library classes; empty: every machine of the category */
  classes: z
    .array(
      z.enum(MACHINE_CLASSES, { error: `Classes must be among: ${MACHINE_CLASSES.join(', ')}` }),
    )
    .max(MACHINE_CLASSES.length)
    .default([]),
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
  /** the machine's daily-care tasks the operator ticked done (grease rounds, daily items) */
  careDone: careDoneSchema,
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

// --- Responses ---------------------------------------------------------------------------------

export const checklistItemOutSchema = z
  .object({
    id: z.string(),
    label: z.string(),
    guidance: z.string(),
    /** a fail here tags the machine out */
    critical: z.boolean(),
    hazards: z.array(z.enum(HAZARDS)),
    /** the server's caution text for the item's hazards (empty when it has none) */
    caution: z.string(),
    phase: z.enum(CHECKLIST_PHASES),
    /** only on machines of these classes; empty: every machine of the category */
    classes: z.array(z.enum(MACHINE_CLASSES)),
  })
  .meta({ id: 'ChecklistItem' });
export type ChecklistItem = z.infer<typeof checklistItemOutSchema>;

/** A farm's own checklist of a machine category. */
export const checklistTemplateSchema = z
  .object({
    id: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    name: z.string(),
    description: z.string(),
    items: z.array(checklistItemOutSchema),
    updatedAt: z.string(),
  })
  .meta({ id: 'ChecklistTemplate' });
export type ChecklistTemplate = z.infer<typeof checklistTemplateSchema>;

const editAbilities = z.object({ edit: z.boolean() });
export const checklistTemplateListResponseSchema = z.object({
  data: z.array(checklistTemplateSchema),
  abilities: editAbilities,
});
export type ChecklistTemplateList = z.infer<typeof checklistTemplateListResponseSchema>;
export const checklistTemplateResponseSchema = z.object({ data: checklistTemplateSchema });
export type ChecklistTemplateResponse = z.infer<typeof checklistTemplateResponseSchema>;
export const checklistTemplateWithAbilitiesSchema = checklistTemplateResponseSchema.extend({
  abilities: editAbilities,
});

/** The list Hourstone ships for a category: used where the farm has none, and a starting point. */
export const builtInChecklistSchema = checklistTemplateSchema.omit({ id: true, updatedAt: true });
export type BuiltInChecklist = z.infer<typeof builtInChecklistSchema>;
export const builtInChecklistResponseSchema = z.object({ data: builtInChecklistSchema });

/** The checklist a walkaround starts from, with the machine and its last reading. */
export const checklistSchema = z.object({
  machine: machineRefSchema.extend({
    lastReading: z.object({ value: z.number(), takenAt: z.string() }).nullable(),
    /** restricted use, with its reason: shown before the walkaround starts */
    restriction: machineRestrictionSchema.nullable(),
  }),
  purpose: z.enum(WALKAROUND_PURPOSES),
  template: z.object({
    id: z.string().nullable(),
    name: z.string(),
    description: z.string(),
    source: z.enum(['farm', 'built_in']),
  }),
  items: z.array(checklistItemOutSchema),
  criticalNote: z.string(),
  /** the machine's daily care, ticked done in the walkaround (careDone) */
  dailyCare: z.array(dailyCareItemSchema),
});
export type Checklist = z.infer<typeof checklistSchema>;
export const checklistResponseSchema = z.object({
  data: checklistSchema,
  abilities: z.object({ editTemplate: z.boolean(), inspect: z.boolean() }),
});
export type ChecklistResponse = z.infer<typeof checklistResponseSchema>;

export const walkaroundSchema = z
  .object({
    id: z.string(),
    clientId: z.string(),
    machine: machineRefSchema,
    operator: personRefSchema.nullable(),
    purpose: z.enum(WALKAROUND_PURPOSES),
    performedAt: z.string(),
    meterValue: z.number(),
    readingId: z.string().nullable(),
    templateId: z.string().nullable(),
    templateName: z.string(),
    result: z.enum(WALKAROUND_RESULTS),
    taggedOut: z.boolean(),
    notes: z.string(),
    /** daily care signed off with this walkaround */
    careDone: z.array(careSignedOffSchema),
    counts: z.object({ ok: z.number(), attention: z.number(), fail: z.number() }),
    items: z.array(
      z.object({
        itemId: z.string(),
        label: z.string(),
        critical: z.boolean(),
        result: z.enum(WALKAROUND_RESULTS),
        note: z.string(),
        photoId: z.string().nullable(),
        photoUrl: z.string().nullable(),
        thumbnailUrl: z.string().nullable(),
      }),
    ),
    createdAt: z.string(),
  })
  .meta({ id: 'Walkaround' });
export type Walkaround = z.infer<typeof walkaroundSchema>;

/** POST walkarounds: 201 new, 200 duplicate (that clientId was already sent). */
export const walkaroundOutcomeSchema = z.object({
  data: walkaroundSchema,
  defects: z.array(defectSchema),
  machine: machineRefSchema,
  taggedOut: z.boolean(),
  message: z.string().nullable(),
  duplicate: z.boolean(),
});
export type WalkaroundOutcome = z.infer<typeof walkaroundOutcomeSchema>;

export const walkaroundListResponseSchema = z.object({
  data: z.array(walkaroundSchema),
  meta: pageMetaSchema,
});
export const walkaroundResponseSchema = z.object({
  data: walkaroundSchema,
  defects: z.array(defectSchema),
});

export const walkaroundPhotoSchema = z.object({
  id: z.string(),
  photoUrl: z.string(),
  thumbnailUrl: z.string(),
});
export type UploadedPhoto = z.infer<typeof walkaroundPhotoSchema>;
export const walkaroundPhotoResponseSchema = z.object({ data: walkaroundPhotoSchema });
export type WalkaroundPhotoResponse = z.infer<typeof walkaroundPhotoResponseSchema>;
