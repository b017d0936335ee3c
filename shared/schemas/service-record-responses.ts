import { z } from 'zod';
import { FLUID_UNITS, HAZARDS } from './schedule';
import { SERVICE_STATUSES } from './service-records';
import { currencyCodeSchema } from './money';
import { machineRefSchema, pageMetaSchema, personRefSchema } from './refs';
import { dueRowSchema } from './due';

// What the service-record endpoints answer (server/routes/service-records): the presenters return these
// types and the client reads them. Money is integer minor units of `currency`.

export const SPEC_STATUSES = ['in', 'low', 'high'] as const;
export type SpecStatus = (typeof SPEC_STATUSES)[number];

export const measurementOutSchema = z
  .object({
    id: z.string(),
    name: z.string(),
    value: z.number(),
    unit: z.string(),
    specMin: z.number().nullable(),
    specMax: z.number().nullable(),
    inSpec: z.boolean().nullable(),
    specStatus: z.enum(SPEC_STATUSES).nullable(),
  })
  .meta({ id: 'Measurement' });
export type Measurement = z.infer<typeof measurementOutSchema>;

export const attachmentSchema = z
  .object({
    id: z.string(),
    kind: z.enum(['image', 'pdf']),
    contentType: z.string(),
    fileName: z.string(),
    sizeBytes: z.number(),
    /** served through the API only (cookie session) */
    url: z.string(),
    thumbnailUrl: z.string().nullable(),
    uploadedBy: personRefSchema.nullable(),
    createdAt: z.string(),
  })
  .meta({ id: 'ServiceAttachment' });
export type Attachment = z.infer<typeof attachmentSchema>;

const partLine = z.object({
  partNumber: z.string(),
  description: z.string(),
  quantity: z.number(),
  unitCostMinor: z.number().nullable(),
  /** quantity × unit cost, rounded once to a whole minor unit; null without a unit cost */
  lineCostMinor: z.number().nullable(),
});
const fluidLine = z.object({
  kind: z.string(),
  volume: z.number(),
  unit: z.enum(FLUID_UNITS),
  /** per unit of volume */
  unitCostMinor: z.number().nullable(),
  lineCostMinor: z.number().nullable(),
});

/** A record's costs, summed by the server (shared/domain/record-costs.ts). */
export const recordCostsSchema = z.object({
  partsMinor: z.number(),
  fluidsMinor: z.number(),
  otherMinor: z.number(),
  totalMinor: z.number(),
  /** part and fluid lines without a unit cost (not counted) */
  linesWithoutCost: z.number(),
});
export type RecordCosts = z.infer<typeof recordCostsSchema>;

export const recordTaskSchema = z.object({
  taskId: z.string(),
  name: z.string(),
  /** the task is still on the machine's schedule */
  onSchedule: z.boolean(),
  labourHours: z.number().nullable(),
});

export const serviceRecordSchema = z
  .object({
    id: z.string(),
    machine: machineRefSchema,
    status: z.enum(SERVICE_STATUSES),
    /** ISO local dates (yyyy-mm-dd) */
    plannedFor: z.string().nullable(),
    performedOn: z.string().nullable(),
    /** as the meter fitted then showed it */
    meterValue: z.number().nullable(),
    /** the same value on the machine's lifetime scale */
    meterLifetime: z.number().nullable(),
    readingId: z.string().nullable(),
    tasks: z.array(recordTaskSchema),
    technicians: z.array(personRefSchema),
    labourHours: z.number().nullable(),
    estimatedLabourHours: z.number(),
    currency: currencyCodeSchema,
    parts: z.array(partLine),
    fluids: z.array(fluidLine),
    otherCosts: z.array(z.object({ description: z.string(), amountMinor: z.number() })),
    costs: recordCostsSchema,
    notes: z.string(),
    measurements: z.array(measurementOutSchema),
    reassemblySettings: z.array(
      z.object({ what: z.string(), value: z.string(), restored: z.boolean() }),
    ),
    unrestoredReason: z.string(),
    defectIds: z.array(z.string()),
    attachments: z.array(attachmentSchema),
    createdBy: personRefSchema.nullable(),
    completedBy: personRefSchema.nullable(),
    completedAt: z.string().nullable(),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .meta({ id: 'ServiceRecord' });
export type ServiceRecord = z.infer<typeof serviceRecordSchema>;

export const recordAbilitiesSchema = z.object({
  update: z.boolean(),
  complete: z.boolean(),
  cancel: z.boolean(),
  attach: z.boolean(),
});
export type RecordAbilities = z.infer<typeof recordAbilitiesSchema>;

export const serviceRecordResponseSchema = z.object({
  data: serviceRecordSchema,
  abilities: recordAbilitiesSchema,
});
export type RecordResponse = z.infer<typeof serviceRecordResponseSchema>;

/** What completing did to each task the visit covered. */
export const taskResetSchema = z.object({
  taskId: z.string(),
  name: z.string(),
  reset: z.boolean(),
  lastDoneMeter: z.number().nullable(),
  lastDoneOn: z.string().nullable(),
  note: z.string(),
});
export type TaskReset = z.infer<typeof taskResetSchema>;

export const serviceRecordWithResetsSchema = serviceRecordResponseSchema.extend({
  resets: z.array(taskResetSchema),
});
export type RecordWithResets = z.infer<typeof serviceRecordWithResetsSchema>;

export const serviceHistoryResponseSchema = z.object({
  data: z.array(serviceRecordSchema),
  meta: pageMetaSchema,
  abilities: z.object({ create: z.boolean() }),
});
export type ServiceHistory = z.infer<typeof serviceHistoryResponseSchema>;

/** An open plan (a visit booked in the shop week) of the machine, with the tasks it covers. */
export const plannedVisitSchema = z
  .object({
    id: z.string(),
    plannedFor: z.string(),
    tasks: z.array(z.object({ taskId: z.string(), name: z.string() })),
  })
  .meta({ id: 'PlannedVisit' });
export type PlannedVisit = z.infer<typeof plannedVisitSchema>;

/** The lines and labour the chosen tasks call for, to prefill the form. */
export const prefillSchema = z.object({
  tasks: z.array(
    z.object({ taskId: z.string(), name: z.string(), labourHours: z.number().nullable() }),
  ),
  estimatedLabourHours: z.number(),
  parts: z.array(partLine.omit({ lineCostMinor: true })),
  fluids: z.array(fluidLine.omit({ lineCostMinor: true })),
  /** open plans of the machine that cover one of the chosen tasks, soonest first */
  plannedVisits: z.array(plannedVisitSchema),
});
export type Prefill = z.infer<typeof prefillSchema>;
export const prefillResponseSchema = z.object({ data: prefillSchema });

export const measurementNameSchema = z.object({
  name: z.string(),
  unit: z.string(),
  count: z.number(),
  lastOn: z.string(),
  lastValue: z.number(),
});
export type MeasurementName = z.infer<typeof measurementNameSchema>;
export const measurementNamesResponseSchema = z.object({ data: z.array(measurementNameSchema) });

export const measurementPointSchema = z.object({
  recordId: z.string(),
  performedOn: z.string(),
  meterValue: z.number().nullable(),
  value: z.number(),
  unit: z.string(),
  specMin: z.number().nullable(),
  specMax: z.number().nullable(),
  inSpec: z.boolean().nullable(),
});
export type MeasurementPoint = z.infer<typeof measurementPointSchema>;
export const measurementSeriesResponseSchema = z.object({
  data: z.array(measurementPointSchema),
  meta: z.object({ name: z.string() }),
});

export const attachmentResponseSchema = z.object({ data: attachmentSchema });
export type AttachmentResponse = z.infer<typeof attachmentResponseSchema>;

const pullPart = z.object({
  partNumber: z.string(),
  description: z.string(),
  quantity: z.number(),
});
const pullFluid = z.object({ kind: z.string(), unit: z.string(), volume: z.number() });
export type PullPart = z.infer<typeof pullPart>;
export type PullFluid = z.infer<typeof pullFluid>;

/** A due-list row with the plan that covers the task, if any. */
export const shopDueRowSchema = dueRowSchema.extend({
  booked: z.object({ recordId: z.string(), plannedFor: z.string() }).nullable(),
});
export type ShopDueRow = z.infer<typeof shopDueRowSchema>;

export const shopPlannedSchema = z.object({
  id: z.string(),
  plannedFor: z.string(),
  machine: machineRefSchema,
  tasks: z.array(
    z.object({
      taskId: z.string(),
      name: z.string(),
      labourHours: z.number().nullable(),
      /** the task's hazards and safety notes, for the card's caution (empty: none) */
      hazards: z.array(z.enum(HAZARDS)),
      safetyNotes: z.string(),
    }),
  ),
  technicians: z.array(personRefSchema),
  notes: z.string(),
  defectIds: z.array(z.string()),
  estimatedLabourHours: z.number(),
  partsToPull: z.array(pullPart),
  fluidsToPull: z.array(pullFluid),
});
export type ShopPlanned = z.infer<typeof shopPlannedSchema>;

export const shopDaySchema = z.object({
  date: z.string(),
  weekday: z.string(),
  planned: z.array(shopPlannedSchema),
  due: z.array(shopDueRowSchema),
  plannedLabourHours: z.number(),
  unbookedDueLabourHours: z.number(),
  partsToPull: z.array(pullPart),
  fluidsToPull: z.array(pullFluid),
});
export type ShopDay = z.infer<typeof shopDaySchema>;

export const shopWeekSchema = z
  .object({
    start: z.string(),
    end: z.string(),
    asOf: z.string(),
    days: z.array(shopDaySchema),
    overdue: z.array(shopDueRowSchema),
    totals: z.object({
      plannedRecords: z.number(),
      dueTasks: z.number(),
      overdueTasks: z.number(),
      plannedLabourHours: z.number(),
      unbookedDueLabourHours: z.number(),
      partsToPull: z.array(pullPart),
      fluidsToPull: z.array(pullFluid),
    }),
  })
  .meta({ id: 'ShopWeek' });
export type ShopWeek = z.infer<typeof shopWeekSchema>;
export const shopWeekResponseSchema = z.object({ data: shopWeekSchema });
