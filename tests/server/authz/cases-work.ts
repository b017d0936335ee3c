// How the matrix calls each route of the farm's work: service records, walkarounds and defects.
import { onFarm, onMachine, type Case, type Ctx } from './cases-fleet';
import {
  freshAttachment,
  freshChecklistTemplate,
  freshDefect,
  freshMachine,
  freshPlan,
} from './fresh';
import { LAST_METER, PNG, inDays, today, walkaroundBody } from './seed-kit';

const onRecord = (c: Ctx, recordId: string) => ({ ...onFarm(c), recordId });
const completed = (c: Ctx) => ({
  status: 'completed',
  performedOn: today(),
  meterValue: LAST_METER,
  taskIds: [c.rec.task.id],
});
/** A defect of the record's machine to close: one of the cell's own when it is to succeed. */
const defectToClose = async (c: Ctx) => (c.succeeds ? await freshDefect(c.rec) : c.rec.defectId);
const photo = { field: 'photo', name: 'photo.png', type: 'image/png', content: PNG };

export const WORK_CASES: Record<string, Case> = {
  'GET /organizations/{orgId}/machines/{machineId}/service-records': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/service-records/prefill': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), query: { taskIds: c.rec.task.id } }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/service-records': {
    ids: 'path',
    build: (c) => ({
      params: onMachine(c),
      body: { status: 'planned', plannedFor: inDays(4), taskIds: [c.rec.task.id] },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/service-records · completed': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), body: completed(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/service-records · closing a defect': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c),
      body: { ...completed(c), closesDefectIds: [await defectToClose(c)] },
    }),
  },
  'GET /organizations/{orgId}/service-records/{recordId}': {
    ids: 'path',
    build: (c) => ({ params: onRecord(c, c.rec.completedId) }),
  },
  'PATCH /organizations/{orgId}/service-records/{recordId}': {
    ids: 'path',
    build: (c) => ({
      params: onRecord(c, c.rec.planId),
      body: { notes: 'Bring the long grease gun' },
    }),
  },
  'POST /organizations/{orgId}/service-records/{recordId}/complete': {
    ids: 'path',
    build: async (c) => ({
      params: onRecord(c, c.succeeds ? await freshPlan(c.rec) : c.rec.planId),
      body: { performedOn: today(), meterValue: LAST_METER },
    }),
  },
  'POST /organizations/{orgId}/service-records/{recordId}/complete · closing a defect': {
    ids: 'path',
    build: async (c) => ({
      params: onRecord(c, c.succeeds ? await freshPlan(c.rec) : c.rec.planId),
      body: {
        performedOn: today(),
        meterValue: LAST_METER,
        closesDefectIds: [await defectToClose(c)],
      },
    }),
  },
  'POST /organizations/{orgId}/service-records/{recordId}/cancel': {
    ids: 'path',
    build: async (c) => ({
      params: onRecord(c, c.succeeds ? await freshPlan(c.rec) : c.rec.planId),
    }),
  },
  'POST /organizations/{orgId}/service-records/{recordId}/attachments': {
    ids: 'path',
    build: (c) => ({
      params: onRecord(c, c.rec.completedId),
      file: { ...photo, field: 'file', name: 'parts-receipt.png' },
    }),
  },
  'GET /organizations/{orgId}/service-records/{recordId}/attachments/{attachmentId}': {
    ids: 'path',
    build: (c) => ({
      params: { ...onRecord(c, c.rec.completedId), attachmentId: c.rec.attachmentId },
    }),
  },
  'DELETE /organizations/{orgId}/service-records/{recordId}/attachments/{attachmentId}': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onRecord(c, c.rec.completedId),
        attachmentId: c.succeeds ? await freshAttachment(c.rec) : c.rec.attachmentId,
      },
    }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/measurements': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/measurements/series': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), query: { name: 'Brake lining' } }),
  },
  'GET /organizations/{orgId}/shop-week': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /organizations/{orgId}/shop-outlook': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c), query: { weeks: '4' } }),
  },
  // walkarounds
  'GET /organizations/{orgId}/checklist-templates': {
    ids: 'none',
    build: (c) => ({ params: onFarm(c) }),
  },
  'GET /organizations/{orgId}/checklist-templates/built-in/{category}': {
    ids: 'none',
    build: (c) => ({ params: { ...onFarm(c), category: 'baler' } }),
  },
  'POST /organizations/{orgId}/checklist-templates': {
    ids: 'none',
    build: (c) => ({
      params: onFarm(c),
      body: { category: 'combine', name: 'Combine daily check', items: [{ label: 'Header' }] },
    }),
  },
  'GET /organizations/{orgId}/checklist-templates/{templateId}': {
    ids: 'path',
    build: (c) => ({ params: { ...onFarm(c), templateId: c.rec.checklistTemplateId } }),
  },
  'PATCH /organizations/{orgId}/checklist-templates/{templateId}': {
    ids: 'path',
    build: (c) => ({
      params: { ...onFarm(c), templateId: c.rec.checklistTemplateId },
      body: { description: 'Before the first start of the day' },
    }),
  },
  'DELETE /organizations/{orgId}/checklist-templates/{templateId}': {
    ids: 'path',
    build: async (c) => ({
      params: {
        ...onFarm(c),
        templateId: c.succeeds
          ? await freshChecklistTemplate(c.rec, 'sprayer')
          : c.rec.checklistTemplateId,
      },
    }),
  },
  'GET /organizations/{orgId}/machines/{machineId}/checklist': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/walkarounds': {
    ids: 'field',
    build: (c) => ({ params: onFarm(c), body: walkaroundBody(c.rec.machine) }),
  },
  'POST /organizations/{orgId}/walkarounds · assigned to another operator': {
    ids: 'field',
    build: (c) => ({ params: onFarm(c), body: walkaroundBody(c.rec.othersMachine) }),
  },
  'GET /organizations/{orgId}/walkarounds': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /organizations/{orgId}/walkarounds/{walkaroundId}': {
    ids: 'path',
    build: (c) => ({ params: { ...onFarm(c), walkaroundId: c.rec.walkaroundId } }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/walkaround-photos': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c), file: photo }),
  },
  'GET /organizations/{orgId}/walkaround-photos/{photoId}': {
    ids: 'path',
    build: (c) => ({ params: { ...onFarm(c), photoId: c.rec.walkaroundPhotoId } }),
  },
  // defects
  'GET /organizations/{orgId}/defects': { ids: 'none', build: (c) => ({ params: onFarm(c) }) },
  'GET /organizations/{orgId}/machines/{machineId}/defects': {
    ids: 'path',
    build: (c) => ({ params: onMachine(c) }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/defects': {
    ids: 'path',
    build: (c) => ({
      params: onMachine(c),
      body: { title: 'Worn seat cushion', severity: 'minor' },
    }),
  },
  'POST /organizations/{orgId}/machines/{machineId}/defects · critical (tags out)': {
    ids: 'path',
    build: async (c) => ({
      params: onMachine(c, c.succeeds ? await freshMachine(c.rec) : c.rec.machine),
      body: { title: 'Brake pedal goes to the floor', severity: 'critical' },
    }),
  },
  'GET /organizations/{orgId}/defects/{defectId}': {
    ids: 'path',
    build: (c) => ({ params: { ...onFarm(c), defectId: c.rec.defectId } }),
  },
  'PATCH /organizations/{orgId}/defects/{defectId}': {
    ids: 'path',
    build: (c) => ({
      params: { ...onFarm(c), defectId: c.rec.defectId },
      body: { description: 'Left-hand mirror, lower glass' },
    }),
  },
  'POST /organizations/{orgId}/defects/{defectId}/close': {
    ids: 'path',
    build: async (c) => ({
      params: { ...onFarm(c), defectId: await defectToClose(c) },
      body: { note: 'Replaced the glass' },
    }),
  },
};
