import type { ChecklistTemplate, Machine, Walkaround } from '../models';
import type { ChecklistItem } from '../models/walkaround';
import type {
  ChecklistItem as ChecklistItemJson,
  ChecklistTemplate as ChecklistTemplateJson,
  Walkaround as WalkaroundJson,
} from '../../shared/schemas/walkarounds';
import { presentMachineRef, walkaroundPhotoUrls } from './defect';
import type { PeopleLookup } from './people';

export const presentChecklistItem = (i: ChecklistItem): ChecklistItemJson => ({
  id: i.id,
  label: i.label,
  guidance: i.guidance,
  critical: i.critical,
  hazards: i.hazards,
  caution: i.caution,
  // items stored before phases and classes (JSONB) are walked before start, on every machine
  phase: i.phase ?? 'before_start',
  classes: i.classes ?? [],
});

export const presentChecklistTemplate = (t: ChecklistTemplate): ChecklistTemplateJson => ({
  id: t.id,
  category: t.category,
  name: t.name,
  description: t.description,
  items: t.items.map(presentChecklistItem),
  updatedAt: t.updatedAt.toISOString(),
});

export const presentWalkaround = (
  w: Walkaround,
  machine: Machine,
  people: PeopleLookup,
): WalkaroundJson => ({
  id: w.id,
  clientId: w.clientId,
  machine: presentMachineRef(machine),
  operator: people(w.operatorId),
  purpose: w.purpose,
  performedAt: w.performedAt.toISOString(),
  meterValue: w.meterValue,
  readingId: w.readingId,
  templateId: w.templateId,
  templateName: w.templateName,
  result: w.result,
  taggedOut: w.taggedOut,
  notes: w.notes,
  careDone: w.careDone ?? [],
  counts: {
    ok: w.items.filter((i) => i.result === 'ok').length,
    attention: w.items.filter((i) => i.result === 'attention').length,
    fail: w.items.filter((i) => i.result === 'fail').length,
  },
  items: w.items.map((i) => ({
    itemId: i.itemId,
    label: i.label,
    critical: i.critical,
    result: i.result,
    note: i.note,
    photoId: i.photoId,
    ...walkaroundPhotoUrls(w.organizationId, i.photoId),
  })),
  createdAt: w.createdAt.toISOString(),
});
