import { z } from 'zod';
import type { Defect, Machine } from '../models';
import { MACHINE_STATUSES } from '../../shared/constants';
import { DEFECT_SEVERITIES, DEFECT_STATUSES } from '../../shared/schemas/defects';
import { personSchema, type PeopleLookup } from './people';

export const machineRefSchema = z
  .object({
    id: z.string(),
    fleetNumber: z.string(),
    name: z.string(),
    category: z.string(),
    status: z.enum(MACHINE_STATUSES),
    meterUnit: z.string(),
  })
  .openapi('MachineRef');

export const presentMachineRef = (m: Machine) => ({
  id: m.id,
  fleetNumber: m.fleetNumber,
  name: m.name,
  category: m.category,
  status: m.status,
  meterUnit: m.meterUnit,
});

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
    reportCount: z.number(),
    lastReportedAt: z.string(),
    reportedBy: personSchema.nullable(),
    assignedTo: personSchema.nullable(),
    fixedAt: z.string().nullable(),
    fixedBy: personSchema.nullable(),
    fixedByRecordId: z.string().nullable(),
    fixNote: z.string(),
    createdAt: z.string(),
    updatedAt: z.string(),
  })
  .openapi('Defect');

export const walkaroundPhotoUrls = (organizationId: string, photoId: string | null) => {
  if (!photoId) return { photoUrl: null, thumbnailUrl: null };
  const base = `/api/v1/organizations/${organizationId}/walkaround-photos/${photoId}`;
  return { photoUrl: base, thumbnailUrl: `${base}?size=thumb` };
};

export const presentDefect = (d: Defect, machine: Machine, people: PeopleLookup) => ({
  id: d.id,
  machine: presentMachineRef(machine),
  title: d.title,
  description: d.description,
  severity: d.severity,
  status: d.status,
  walkaroundId: d.walkaroundId,
  itemId: d.itemId,
  ...walkaroundPhotoUrls(d.organizationId, d.photoId),
  reportCount: d.reportCount,
  lastReportedAt: d.lastReportedAt.toISOString(),
  reportedBy: people(d.reportedBy),
  assignedTo: people(d.assignedTo),
  fixedAt: d.fixedAt ? d.fixedAt.toISOString() : null,
  fixedBy: people(d.fixedBy),
  fixedByRecordId: d.fixedByRecordId,
  fixNote: d.fixNote,
  createdAt: d.createdAt.toISOString(),
  updatedAt: d.updatedAt.toISOString(),
});
