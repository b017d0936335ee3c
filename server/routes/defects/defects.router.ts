import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  closedDefectResponseSchema,
  defectCloseSchema,
  defectCreateSchema,
  defectListQuerySchema,
  defectListResponseSchema,
  defectResponseSchema,
  defectUpdateSchema,
  reportedDefectResponseSchema,
} from '../../../shared/schemas/defects';
import { authorize } from '../../policies/access';
import { canHandleDefects, canReportDefect, defectAbilities } from '../../policies/defect';
import { loadMachine } from '../../services/machines';
import { activeDefectCounts, listDefects, machinesOfDefects } from '../../services/defect-list';
import {
  closeDefect,
  loadDefect,
  reportDefect,
  taggedOutMessage,
  updateDefect,
} from '../../services/defects';
import type { Defect } from '../../models';
import { presentDefect, presentMachineRef } from '../../presenters/defect';
import { peopleById } from '../../presenters/people';
import type { OrgAccess } from '../../policies/access';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });
const defectParams = orgParams.extend({ defectId: z.uuid() });
const shopOnly = 'Only a technician or manager handles defects';

const listResponse = defectListResponseSchema;
const oneResponse = defectResponseSchema;

async function present(defects: Defect[]) {
  if (!defects.length) return [];
  const machineOf = await machinesOfDefects(defects);
  const people = await peopleById(defects.flatMap((d) => [d.reportedBy, d.assignedTo, d.fixedBy]));
  return defects.map((d) => presentDefect(d, machineOf.get(d.machineId)!, people));
}

async function presentOne(access: OrgAccess, defect: Defect) {
  return { data: (await present([defect]))[0], abilities: defectAbilities(access) };
}

/** Defects: the shop's list, reporting, assignment, repair and closing (farm members only). */
export function defectsRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/defects',
    summary:
      'Defects across the farm, worst first (status=active by default: open and in repair); filters: severity, machineId, assignedTo (id, me, none)',
    tags: ['defects'],
    params: orgParams,
    query: defectListQuerySchema,
    response: listResponse,
    handler: async ({ req, query }) => {
      const access = req.access!;
      if (query.machineId) await loadMachine(access, query.machineId);
      const { total, defects } = await listDefects(access, query);
      return {
        data: await present(defects),
        meta: {
          total,
          page: query.page,
          pageSize: query.pageSize,
          activeBySeverity: await activeDefectCounts(access, query.machineId),
        },
        abilities: defectAbilities(access),
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/defects',
    summary: "A machine's defects, worst first (same filters as the farm list)",
    tags: ['defects'],
    params: machineParams,
    query: defectListQuerySchema.omit({ machineId: true }),
    response: listResponse,
    handler: async ({ req, params, query }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const { total, defects } = await listDefects(access, { ...query, machineId: machine.id });
      return {
        data: await present(defects),
        meta: {
          total,
          page: query.page,
          pageSize: query.pageSize,
          activeBySeverity: await activeDefectCounts(access, machine.id),
        },
        abilities: defectAbilities(access),
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/defects',
    summary:
      "Report a defect on a machine (any farm role); severity critical tags the machine out (and e-mails the farm's managers and technicians) until a technician or manager returns it to service",
    tags: ['defects'],
    params: machineParams,
    body: defectCreateSchema,
    status: 201,
    response: reportedDefectResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canReportDefect(access, machine), `${machine.fleetNumber} is sold`);
      const { defect } = await reportDefect(access, machine, body);
      const taggedOut = machine.status === 'tagged_out';
      return {
        ...(await presentOne(access, defect)),
        machine: presentMachineRef(machine),
        taggedOut,
        message: taggedOut ? taggedOutMessage(machine) : null,
      };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/defects/:defectId',
    summary: 'One defect',
    tags: ['defects'],
    params: defectParams,
    response: oneResponse,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { defect } = await loadDefect(access, params.defectId);
      return presentOne(access, defect);
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/defects/:defectId',
    summary:
      'Assign (assignedTo: a technician or manager, or null), move between open and in_repair, re-grade or re-word a defect; the machine status follows',
    tags: ['defects'],
    params: defectParams,
    body: defectUpdateSchema,
    response: oneResponse,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadDefect(access, params.defectId);
      authorize(canHandleDefects(access), shopOnly);
      const { defect } = await updateDefect(access, params.defectId, body);
      return presentOne(access, defect);
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/defects/:defectId/close',
    summary:
      'Close a defect as fixed, with a note or by a completed service record of the machine. The machine status does not change: a tagged-out machine stays tagged out until someone returns it to service (…/machines/:machineId/return-to-service); openCriticalDefects says how many critical defects it still has open',
    tags: ['defects'],
    params: defectParams,
    body: defectCloseSchema,
    response: closedDefectResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadDefect(access, params.defectId);
      authorize(canHandleDefects(access), shopOnly);
      const { defect, machine, openCritical } = await closeDefect(access, params.defectId, body);
      return {
        ...(await presentOne(access, defect)),
        machine: presentMachineRef(machine),
        openCriticalDefects: openCritical,
      };
    },
  });

  return router;
}
