import { z } from 'zod';
import type { ChecklistTemplate, Machine, Walkaround } from '../models';
import type { ChecklistItem } from '../models/walkaround';
import { MACHINE_CATEGORIES } from '../../shared/constants';
import { HAZARDS } from '../../shared/schemas/schedule';
import { WALKAROUND_PURPOSES, WALKAROUND_RESULTS } from '../../shared/schemas/walkarounds';
import { machineRefSchema, presentMachineRef, walkaroundPhotoUrls } from './defect';
import { personSchema, type PeopleLookup } from './people';

export const checklistItemOutSchema = z
  .object({
    id: z.string(),
    label: z.string(),
    guidance: z.string(),
    critical: z.boolean(),
    hazards: z.array(z.enum(HAZARDS)),
    caution: z.string(),
  })
  .openapi('ChecklistItem');

export const presentChecklistItem = (i: ChecklistItem) => ({
  id: i.id,
  label: i.label,
  guidance: i.guidance,
  critical: i.critical,
  hazards: i.hazards,
  caution: i.caution,
});

export const checklistTemplateSchema = z
  .object({
    id: z.string(),
    category: z.enum(MACHINE_CATEGORIES),
    name: z.string(),
    description: z.string(),
    items: z.array(checklistItemOutSchema),
    updatedAt: z.string(),
  })
  .openapi('ChecklistTemplate');

export const presentChecklistTemplate = (t: ChecklistTemplate) => ({
  id: t.id,
  category: t.category,
  name: t.name,
  description: t.description,
  items: t.items.map(presentChecklistItem),
  updatedAt: t.updatedAt.toISOString(),
});

export const walkaroundSchema = z
  .object({
    id: z.string(),
    clientId: z.string(),
    machine: machineRefSchema,
    operator: personSchema.nullable(),
    purpose: z.enum(WALKAROUND_PURPOSES),
    performedAt: z.string(),
    meterValue: z.number(),
    readingId: z.string().nullable(),
    templateId: z.string().nullable(),
    templateName: z.string(),
    result: z.enum(WALKAROUND_RESULTS),
    taggedOut: z.boolean(),
    notes: z.string(),
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
  .openapi('Walkaround');

export const presentWalkaround = (w: Walkaround, machine: Machine, people: PeopleLookup) => ({
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
  counts: {
    ok: w.items.filter((i) => i.result === 'ok').length,
    attention: w.items.filter((i) => i.result === 'attention').length,
    fail: w.items.filter((i) => i.result === 'fail').length,
  },
  items: w.items.map((i) => ({
    ...i,
    ...walkaroundPhotoUrls(w.organizationId, i.photoId),
  })),
  createdAt: w.createdAt.toISOString(),
});
