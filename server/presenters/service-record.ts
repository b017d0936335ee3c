import { Op } from 'sequelize';
import { z } from 'zod';
import {
  Machine,
  ServiceAttachment,
  ServiceMeasurement,
  ServiceRecord,
  ServiceTask,
} from '../models';
import { FLUID_UNITS } from '../../shared/schemas/schedule';
import { SERVICE_STATUSES } from '../../shared/schemas/services';
import { machineRefSchema, presentMachineRef } from './defect';
import { peopleById, personSchema } from './people';

const money = (n: number) => Math.round(n * 100) / 100;

export const SPEC_STATUSES = ['in', 'low', 'high'] as const;

/** In or out of spec: below the minimum is low, above the maximum high; no spec given, null. */
export function specStatus(
  value: number,
  specMin: number | null,
  specMax: number | null,
): (typeof SPEC_STATUSES)[number] | null {
  if (specMin === null && specMax === null) return null;
  if (specMin !== null && value < specMin) return 'low';
  if (specMax !== null && value > specMax) return 'high';
  return 'in';
}

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
  .openapi('Measurement');

export const presentMeasurement = (m: ServiceMeasurement) => {
  const status = specStatus(m.value, m.specMin, m.specMax);
  return {
    id: m.id,
    name: m.name,
    value: m.value,
    unit: m.unit,
    specMin: m.specMin,
    specMax: m.specMax,
    inSpec: status === null ? null : status === 'in',
    specStatus: status,
  };
};

export const attachmentSchema = z
  .object({
    id: z.string(),
    kind: z.enum(['image', 'pdf']),
    contentType: z.string(),
    fileName: z.string(),
    sizeBytes: z.number(),
    url: z.string(),
    thumbnailUrl: z.string().nullable(),
    uploadedBy: personSchema.nullable(),
    createdAt: z.string(),
  })
  .openapi('ServiceAttachment');

export const attachmentUrl = (a: ServiceAttachment) =>
  `/api/v1/organizations/${a.organizationId}/service-records/${a.serviceRecordId}/attachments/${a.id}`;

const lineCost = (qty: number, unitCost: number | null) =>
  unitCost === null ? null : money(qty * unitCost);

export const serviceRecordSchema = z
  .object({
    id: z.string(),
    machine: machineRefSchema,
    status: z.enum(SERVICE_STATUSES),
    plannedFor: z.string().nullable(),
    performedOn: z.string().nullable(),
    meterValue: z.number().nullable(),
    meterLifetime: z.number().nullable(),
    readingId: z.string().nullable(),
    tasks: z.array(
      z.object({
        taskId: z.string(),
        name: z.string(),
        onSchedule: z.boolean(),
        labourHours: z.number().nullable(),
      }),
    ),
    technicians: z.array(personSchema),
    labourHours: z.number().nullable(),
    estimatedLabourHours: z.number(),
    parts: z.array(
      z.object({
        partNumber: z.string(),
        description: z.string(),
        quantity: z.number(),
        unitCost: z.number().nullable(),
        lineCost: z.number().nullable(),
      }),
    ),
    fluids: z.array(
      z.object({
        kind: z.string(),
        volume: z.number(),
        unit: z.enum(FLUID_UNITS),
        unitCost: z.number().nullable(),
        lineCost: z.number().nullable(),
      }),
    ),
    otherCosts: z.array(z.object({ description: z.string(), amount: z.number() })),
    costs: z.object({
      parts: z.number(),
      fluids: z.number(),
      other: z.number(),
      total: z.number(),
      linesWithoutCost: z.number(),
    }),
    notes: z.string(),
    measurements: z.array(measurementOutSchema),
    reassemblySettings: z.array(
      z.object({ what: z.string(), value: z.string(), restored: z.boolean() }),
    ),
    unrestoredReason: z.string(),
    defectIds: z.array(z.string()),
    attachments: z.array(attachmentSchema),
    createdBy: personSchema.nullable(),
    completedBy: personSchema.nullable(),
    completedAt: z.string().nullable(),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .openapi('ServiceRecord');
export type PresentedRecord = z.infer<typeof serviceRecordSchema>;

/** Whether the reader may see which defects a record closes: a farm's members, never a dealer. */
export interface RecordView {
  withDefects: boolean;
}

/**
 * Presents records with their machine, measurements, attachments, people and task labour
 * (batched). `defectIds` is empty unless the view allows defects (the caller says; hidden by default).
 */
export async function presentRecords(
  records: ServiceRecord[],
  view: RecordView = { withDefects: false },
): Promise<PresentedRecord[]> {
  if (!records.length) return [];
  const ids = records.map((r) => r.id);
  const orgId = records[0].organizationId;
  const [machines, measurements, attachments, tasks] = await Promise.all([
    Machine.findAll({
      where: {
        organizationId: orgId,
        id: { [Op.in]: [...new Set(records.map((r) => r.machineId))] },
      },
    }),
    ServiceMeasurement.findAll({
      where: { organizationId: orgId, serviceRecordId: { [Op.in]: ids } },
      order: [['position', 'ASC']],
    }),
    ServiceAttachment.findAll({
      where: { organizationId: orgId, serviceRecordId: { [Op.in]: ids } },
      order: [['createdAt', 'ASC']],
    }),
    ServiceTask.findAll({
      where: {
        organizationId: orgId,
        id: { [Op.in]: [...new Set(records.flatMap((r) => r.tasks.map((t) => t.taskId)))] },
      },
      attributes: ['id', 'labourHours'],
    }),
  ]);
  const people = await peopleById([
    ...records.flatMap((r) => [...r.technicianIds, r.createdBy, r.completedBy]),
    ...attachments.map((a) => a.uploadedBy),
  ]);
  const machineOf = new Map(machines.map((m) => [m.id, m]));
  const labourOf = new Map(tasks.map((t) => [t.id, t.labourHours]));
  const group = <T extends { serviceRecordId: string }>(rows: T[]) => {
    const map = new Map<string, T[]>();
    for (const row of rows)
      map.set(row.serviceRecordId, [...(map.get(row.serviceRecordId) ?? []), row]);
    return map;
  };
  const measurementsOf = group(measurements);
  const attachmentsOf = group(attachments);

  return records.map((r) => {
    const parts = r.parts.map((p) => ({ ...p, lineCost: lineCost(p.quantity, p.unitCost) }));
    const fluids = r.fluids.map((f) => ({ ...f, lineCost: lineCost(f.volume, f.unitCost) }));
    const partsCost = money(parts.reduce((s, p) => s + (p.lineCost ?? 0), 0));
    const fluidsCost = money(fluids.reduce((s, f) => s + (f.lineCost ?? 0), 0));
    const otherCost = money(r.otherCosts.reduce((s, c) => s + c.amount, 0));
    const taskRows = r.tasks.map((t) => ({
      taskId: t.taskId,
      name: t.name,
      onSchedule: labourOf.has(t.taskId),
      labourHours: labourOf.get(t.taskId) ?? null,
    }));
    return {
      id: r.id,
      machine: presentMachineRef(machineOf.get(r.machineId)!),
      status: r.status,
      plannedFor: r.plannedFor,
      performedOn: r.performedOn,
      meterValue: r.meterValue,
      meterLifetime: r.meterLifetime,
      readingId: r.readingId,
      tasks: taskRows,
      technicians: r.technicianIds.map((id) => people(id) ?? { id, name: 'Former member' }),
      labourHours: r.labourHours,
      estimatedLabourHours: money(taskRows.reduce((s, t) => s + (t.labourHours ?? 0), 0)),
      parts,
      fluids,
      otherCosts: r.otherCosts,
      costs: {
        parts: partsCost,
        fluids: fluidsCost,
        other: otherCost,
        total: money(partsCost + fluidsCost + otherCost),
        linesWithoutCost: [...parts, ...fluids].filter((l) => l.lineCost === null).length,
      },
      notes: r.notes,
      measurements: (measurementsOf.get(r.id) ?? []).map(presentMeasurement),
      reassemblySettings: r.reassemblySettings,
      unrestoredReason: r.unrestoredReason,
      defectIds: view.withDefects ? r.defectIds : [],
      attachments: (attachmentsOf.get(r.id) ?? []).map((a) => ({
        id: a.id,
        kind: a.kind,
        contentType: a.contentType,
        fileName: a.fileName,
        sizeBytes: a.sizeBytes,
        url: attachmentUrl(a),
        thumbnailUrl: a.kind === 'image' ? `${attachmentUrl(a)}?size=thumb` : null,
        uploadedBy: people(a.uploadedBy),
        createdAt: a.createdAt.toISOString(),
      })),
      createdBy: people(r.createdBy),
      completedBy: people(r.completedBy),
      completedAt: r.completedAt ? r.completedAt.toISOString() : null,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    };
  });
}

export async function presentRecord(record: ServiceRecord, view?: RecordView) {
  return (await presentRecords([record], view))[0];
}
