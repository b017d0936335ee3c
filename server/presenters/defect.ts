import type { Defect, Machine } from '../models';
import type { Defect as DefectJson } from '../../shared/schemas/defects';
import { machineRefSchema, type MachineRef } from '../../shared/schemas/refs';
import type { PeopleLookup } from './people';

// machineRefSchema moved to shared/schemas/refs.ts; re-exported while routes of other resources
// still import it from here.
export { machineRefSchema };

export const presentMachineRef = (m: Machine): MachineRef => ({
  id: m.id,
  fleetNumber: m.fleetNumber,
  name: m.name,
  category: m.category,
  status: m.status,
  restricted: m.restrictionReason != null,
  meterUnit: m.meterUnit,
});

export const walkaroundPhotoUrls = (organizationId: string, photoId: string | null) => {
  if (!photoId) return { photoUrl: null, thumbnailUrl: null };
  const base = `/api/v1/organizations/${organizationId}/walkaround-photos/${photoId}`;
  return { photoUrl: base, thumbnailUrl: `${base}?size=thumb` };
};

export const presentDefect = (d: Defect, machine: Machine, people: PeopleLookup): DefectJson => ({
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
