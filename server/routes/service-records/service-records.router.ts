import type { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  serviceHistoryQuerySchema,
  serviceRecordCompleteSchema,
  serviceRecordCreateSchema,
  serviceRecordUpdateSchema,
} from '../../../shared/schemas/service-records';
import { uuid } from '../../../shared/schemas/common';
import { authorize } from '../../policies/access';
import { canRecordService, isShop, serviceRecordAbilities } from '../../policies/service-record';
import {
  prefillResponseSchema,
  serviceHistoryResponseSchema,
  serviceRecordResponseSchema,
  serviceRecordWithResetsSchema,
} from '../../../shared/schemas/service-record-responses';
import { presentRecord, presentRecords } from '../../presenters/service-record';
import { loadMachine } from '../../services/machines';
import { createRecord, loadRecord, prefillRecord } from '../../services/service-records';
import { completeRecord } from '../../services/service-record-completion';
import { cancelRecord, updateRecord } from '../../services/service-record-edits';
import { machineHistory } from '../../services/service-history';
import { invalid } from '../../errors';
import type { OrgAccess } from '../../policies/access';
import type { ServiceRecord } from '../../models';

export const orgParams = z.object({ orgId: z.uuid() });
export const machineParams = orgParams.extend({ machineId: z.uuid() });
const recordParams = orgParams.extend({ recordId: z.uuid() });

const recordResponse = serviceRecordResponseSchema;
const recordWithResets = serviceRecordWithResetsSchema;

const shopOnly = 'Only a technician or manager records services';

/** Which defects a record closes is the farm's own: a dealer's answers carry none. */
const viewOf = (access: OrgAccess) => ({
  withDefects: access.via === 'member',
  currency: access.organization.currency,
});

async function respond(access: OrgAccess, record: ServiceRecord) {
  return {
    data: await presentRecord(record, viewOf(access)),
    abilities: serviceRecordAbilities(access, record),
  };
}

/** Service records: history, plans, completion (one transaction), prefill from the tasks. */
export function registerServiceRecordRoutes(router: Router): void {
  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/service-records',
    summary:
      "A machine's service history, newest first (done date, or booked date for plans); q searches notes, task names and part numbers",
    tags: ['services'],
    params: machineParams,
    query: serviceHistoryQuerySchema,
    response: serviceHistoryResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const { total, records } = await machineHistory(access, machine, query);
      return {
        data: await presentRecords(records, viewOf(access)),
        meta: { total, page: query.page, pageSize: query.pageSize },
        abilities: { create: canRecordService(access, machine) },
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/service-records/prefill',
    summary:
      'Parts and fluid lines the given tasks call for (summed by part number), their estimated labour, and the open plans of the machine that cover one of them, to prefill the form',
    tags: ['services'],
    params: machineParams,
    query: z.object({
      taskIds: z
        .string()
        .max(3000)
        .optional()
        .openapi({ description: 'task ids, comma-separated' }),
    }),
    response: prefillResponseSchema,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const ids = (query.taskIds ?? '')
        .split(',')
        .map((s) => s.trim())
        .filter(Boolean);
      const bad = ids.findIndex((id) => !uuid.safeParse(id).success);
      if (bad >= 0) throw invalid({ [`taskIds.${bad}`]: 'Must be an id (uuid)' });
      const { tasks, estimatedLabourHours, parts, fluids, plannedVisits } = await prefillRecord(
        access,
        machine,
        ids,
      );
      return {
        data: {
          tasks: tasks.map((t) => ({ taskId: t.id, name: t.name, labourHours: t.labourHours })),
          estimatedLabourHours,
          parts,
          fluids,
          plannedVisits,
        },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/service-records',
    summary:
      'Record a service (status completed: the meter reading, task resets, parts and defect closes in one transaction) or book a plan (status planned)',
    tags: ['services'],
    params: machineParams,
    body: serviceRecordCreateSchema,
    status: 201,
    response: recordWithResets,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(
        canRecordService(access, machine),
        machine.status === 'sold' ? `${machine.fleetNumber} is sold` : shopOnly,
      );
      const { record, resets } = await createRecord(access, machine, body);
      return { ...(await respond(access, record)), resets };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/service-records/:recordId',
    summary: 'One service record with its measurements, settings, attachments and abilities',
    tags: ['services'],
    params: recordParams,
    response: recordResponse,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { record } = await loadRecord(access, params.recordId);
      return respond(access, record);
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/service-records/:recordId',
    summary:
      "Edit a record: a plan freely; a completed record's costs, notes, measurements and settings (not its tasks or defects)",
    tags: ['services'],
    params: recordParams,
    body: serviceRecordUpdateSchema,
    response: recordResponse,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadRecord(access, params.recordId);
      authorize(isShop(access), shopOnly);
      const { record } = await updateRecord(access, params.recordId, body);
      return respond(access, record);
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/service-records/:recordId/complete',
    summary:
      'Complete a plan in one transaction: meter reading, task resets, parts, measurements, defect closes; refused while a reassembly setting is unticked without unrestoredReason',
    tags: ['services'],
    params: recordParams,
    body: serviceRecordCompleteSchema,
    response: recordWithResets,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadRecord(access, params.recordId);
      authorize(isShop(access), shopOnly);
      const { record, resets } = await completeRecord(access, params.recordId, body);
      return { ...(await respond(access, record)), resets };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/service-records/:recordId/cancel',
    summary: 'Cancel a plan',
    tags: ['services'],
    params: recordParams,
    response: recordResponse,
    handler: async ({ req, params }) => {
      const access = req.access!;
      await loadRecord(access, params.recordId);
      authorize(isShop(access), shopOnly);
      const { record } = await cancelRecord(access, params.recordId);
      return respond(access, record);
    },
  });
}
