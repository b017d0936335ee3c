import { Op } from 'sequelize';
import {
  Machine,
  ServiceAttachment,
  ServiceMeasurement,
  ServiceRecord,
  ServiceTask,
} from '../models';
import {
  SPEC_STATUSES,
  type Attachment,
  type Measurement,
  type ServiceRecord as PresentedRecord,
} from '../../shared/schemas/service-record-responses';
import { recordCosts } from '../../shared/domain/record-costs';
import { specStatus } from '../../shared/domain/measurement-spec';
import { presentMachineRef } from './defect';
import { peopleById } from './people';

export { SPEC_STATUSES };

// in or out of spec, the limits themselves in: one rule with the client's one-tap defect
export { specStatus };

export const presentMeasurement = (m: ServiceMeasurement): Measurement => {
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

export const attachmentUrl = (a: ServiceAttachment) =>
  `/api/v1/organizations/${a.organizationId}/service-records/${a.serviceRecordId}/attachments/${a.id}`;

const hours2 = (n: number) => Math.round(n * 100) / 100;

/**
 * How the reader sees records: `withDefects`, whether they may see which defects a record closes
 * (a farm's members, never a dealer); `currency`, the farm's (its costs are minor units of it).
 */
export interface RecordView {
  withDefects: boolean;
  currency: string;
}

/**
 * Presents records with their machine, measurements, attachments, people and task labour
 * (batched). `defectIds` is empty unless the view allows defects (the caller says; hidden by default).
 */
export async function presentRecords(
  records: ServiceRecord[],
  view: RecordView,
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
    const costs = recordCosts(r);
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
      estimatedLabourHours: hours2(taskRows.reduce((s, t) => s + (t.labourHours ?? 0), 0)),
      currency: view.currency,
      parts: r.parts.map((p, i) => ({
        partNumber: p.partNumber,
        description: p.description,
        quantity: p.quantity,
        unitCostMinor: p.unitCostMinor,
        lineCostMinor: costs.partLines[i],
      })),
      fluids: r.fluids.map((f, i) => ({
        kind: f.kind,
        volume: f.volume,
        unit: f.unit,
        unitCostMinor: f.unitCostMinor,
        lineCostMinor: costs.fluidLines[i],
      })),
      otherCosts: r.otherCosts.map((c) => ({
        description: c.description,
        amountMinor: c.amountMinor,
      })),
      costs: {
        partsMinor: costs.partsMinor,
        fluidsMinor: costs.fluidsMinor,
        otherMinor: costs.otherMinor,
        totalMinor: costs.totalMinor,
        linesWithoutCost: costs.linesWithoutCost,
      },
      notes: r.notes,
      measurements: (measurementsOf.get(r.id) ?? []).map(presentMeasurement),
      reassemblySettings: r.reassemblySettings.map((x) => ({
        what: x.what,
        value: x.value,
        restored: x.restored,
      })),
      unrestoredReason: r.unrestoredReason,
      defectIds: view.withDefects ? r.defectIds : [],
      attachments: (attachmentsOf.get(r.id) ?? []).map((a): Attachment => ({
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

export async function presentRecord(record: ServiceRecord, view: RecordView) {
  return (await presentRecords([record], view))[0];
}
