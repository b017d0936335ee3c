import { z } from 'zod';
import { pagingFields, plainText, uuid } from './common';
import { machineRefSchema, pageMetaSchema, personRefSchema } from './refs';

// Defects: found on a walkaround or reported directly, handled by the shop.

export const DEFECT_SEVERITIES = ['critical', 'major', 'minor'] as const;
export type DefectSeverity = (typeof DEFECT_SEVERITIES)[number];
export const DEFECT_SEVERITY_LABELS: Record<DefectSeverity, string> = {
  critical: 'Critical — do not use',
  major: 'Major',
  minor: 'Minor',
};

export const DEFECT_STATUSES = ['open', 'in_repair', 'fixed'] as const;
export type DefectStatus = (typeof DEFECT_STATUSES)[number];
export const DEFECT_STATUS_LABELS: Record<DefectStatus, string> = {
  open: 'Open',
  in_repair: 'In repair',
  fixed: 'Fixed',
};

const title = plainText(160, { required: 'Say what is wrong' });
const description = plainText(2000, { multiline: true });
const severity = z.enum(DEFECT_SEVERITIES, {
  error: `Severity must be one of: ${DEFECT_SEVERITIES.join(', ')}`,
});

export const defectCreateSchema = z.object({
  title,
  description: description.default(''),
  /** critical tags the machine out until a technician or manager returns it to service */
  severity: severity.default('major'),
});
export type DefectCreateInput = z.infer<typeof defectCreateSchema>;

export const defectUpdateSchema = z
  .object({
    title,
    description,
    severity,
    status: z.enum(['open', 'in_repair'], {
      error: 'Status must be open or in_repair (close a defect with …/close)',
    }),
    assignedTo: uuid.nullable(),
  })
  .partial()
  .strict();
export type DefectUpdateInput = z.infer<typeof defectUpdateSchema>;

export const defectCloseSchema = z
  .object({
    note: description.default(''),
    /** a completed service record of the same machine that fixed it */
    serviceRecordId: uuid.optional(),
  })
  .refine((c) => c.note.length > 0 || c.serviceRecordId !== undefined, {
    error: 'Say what was done, or link the service record that fixed it',
    path: ['note'],
  });
export type DefectCloseInput = z.infer<typeof defectCloseSchema>;

export const defectListQuerySchema = z.object({
  /** active = open and in repair */
  status: z
    .enum(['active', 'all', ...DEFECT_STATUSES], {
      error: 'Status must be active, all, open, in_repair or fixed',
    })
    .default('active'),
  severity: severity.optional(),
  machineId: uuid.optional(),
  /** a user id, "me" or "none" */
  assignedTo: z
    .union([z.literal('me'), z.literal('none'), uuid], {
      error: 'Assigned to must be a user id, me or none',
    })
    .optional(),
  ...pagingFields(50, 200),
});
export type DefectListQuery = z.infer<typeof defectListQuerySchema>;

/** Returning a tagged-out machine to service: its own step, with the note of what was checked. */
export const returnToServiceSchema = z.object({
  note: plainText(2000, {
    required: 'Say what was checked before returning it to service',
    multiline: true,
  }),
});
export type ReturnToServiceInput = z.infer<typeof returnToServiceSchema>;

// --- Responses ---------------------------------------------------------------------------------

export const defectSchema = z
  .object({
    id: z.string(),
    machine: machineRefSchema,
    title: z.string(),
    description: z.string(),
    severity: z.enum(DEFECT_SEVERITIES),
    status: z.enum(DEFECT_STATUSES),
    walkaroundId: z.string().nullable(),
    itemId: z.string().nullable(),
    photoUrl: z.string().nullable(),
    thumbnailUrl: z.string().nullable(),
    /** the same defect found again on later walkarounds adds to this */
    reportCount: z.number(),
    lastReportedAt: z.string(),
    reportedBy: personRefSchema.nullable(),
    assignedTo: personRefSchema.nullable(),
    fixedAt: z.string().nullable(),
    fixedBy: personRefSchema.nullable(),
    fixedByRecordId: z.string().nullable(),
    fixNote: z.string(),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .meta({ id: 'Defect' });
export type Defect = z.infer<typeof defectSchema>;

export const defectAbilitiesSchema = z.object({
  update: z.boolean(),
  close: z.boolean(),
  /** the caller may return tagged-out machines to service (the farm's technicians, managers) */
  returnToService: z.boolean(),
});
export type DefectAbilities = z.infer<typeof defectAbilitiesSchema>;

export const defectListResponseSchema = z.object({
  data: z.array(defectSchema),
  meta: pageMetaSchema.extend({
    activeBySeverity: z.object({ critical: z.number(), major: z.number(), minor: z.number() }),
  }),
  abilities: defectAbilitiesSchema,
});
export type DefectList = z.infer<typeof defectListResponseSchema>;

export const defectResponseSchema = z.object({
  data: defectSchema,
  abilities: defectAbilitiesSchema,
});
export type DefectResponse = z.infer<typeof defectResponseSchema>;

/** Reporting answers the machine as it is now (a critical defect tags it out). */
export const reportedDefectResponseSchema = defectResponseSchema.extend({
  machine: machineRefSchema,
  taggedOut: z.boolean(),
  message: z.string().nullable(),
});
export type ReportedDefect = z.infer<typeof reportedDefectResponseSchema>;

/** Closing answers the machine (its status unchanged) and its open critical count. */
export const closedDefectResponseSchema = defectResponseSchema.extend({
  machine: machineRefSchema,
  openCriticalDefects: z.number(),
});
export type ClosedDefect = z.infer<typeof closedDefectResponseSchema>;
