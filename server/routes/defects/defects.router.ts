import { Router } from 'express';
import { Op } from 'sequelize';
import { z } from 'zod';
import { route } from '../route';
import {
  clearTagOutSchema,
  defectCloseSchema,
  defectCreateSchema,
  defectListQuerySchema,
  defectUpdateSchema,
} from '../../../shared/schemas/defects';
import { authorize } from '../../policies/access';
import {
  canClearTagOut,
  canHandleDefects,
  canReportDefect,
  defectAbilities,
} from '../../policies/defect';
import { loadMachine } from '../../services/machines';
import {
  activeDefectCounts,
  clearTagOut,
  closeDefect,
  listDefects,
  loadDefect,
  raiseDefect,
  taggedOutMessage,
  updateDefect,
} from '../../services/defects';
import { sequelize } from '../../db';
import { Defect, Machine } from '../../models';
import {
  defectSchema,
  machineRefSchema,
  presentDefect,
  presentMachineRef,
} from '../../presenters/defect';
import { peopleById } from '../../presenters/people';
import type { OrgAccess } from '../../policies/access';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });
const defectParams = orgParams.extend({ defectId: z.uuid() });
const shopOnly = 'Only a technician or manager handles defects';

const abilitiesSchema = z.object({
  update: z.boolean(),
  close: z.boolean(),
  clearTagOut: z.boolean(),
});
const listResponse = z.object({
  data: z.array(defectSchema),
  meta: z.object({
    total: z.number(),
    page: z.number(),
    pageSize: z.number(),
    activeBySeverity: z.object({ critical: z.number(), major: z.number(), minor: z.number() }),
  }),
  abilities: abilitiesSchema,
});
const oneResponse = z.object({ data: defectSchema, abilities: abilitiesSchema });

async function present(defects: Defect[]) {
  if (!defects.length) return [];
  const machines = await Machine.findAll({
    where: {
      organizationId: defects[0].organizationId,
      id: { [Op.in]: [...new Set(defects.map((d) => d.machineId))] },
    },
  });
  const machineOf = new Map(machines.map((m) => [m.id, m]));
  const people = await peopleById(defects.flatMap((d) => [d.reportedBy, d.assignedTo, d.fixedBy]));
  return defects.map((d) => presentDefect(d, machineOf.get(d.machineId)!, people));
}

async function presentOne(access: OrgAccess, defect: Defect) {
  return { data: (await present([defect]))[0], abilities: defectAbilities(access) };
}

/** Defects: the shop's list, reporting, assignment, repair, closing, and clearing a tag-out. */
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
      'Report a defect on a machine (any farm role); severity critical tags the machine out until a technician or manager clears it',
    tags: ['defects'],
    params: machineParams,
    body: defectCreateSchema,
    status: 201,
    response: oneResponse.extend({
      machine: machineRefSchema,
      taggedOut: z.boolean(),
      message: z.string().nullable(),
    }),
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canReportDefect(access, machine), `${machine.fleetNumber} is sold`);
      const { defect } = await sequelize.transaction((transaction) =>
        raiseDefect(access, machine, body, {}, transaction),
      );
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
      'Close a defect as fixed, with a note or by a completed service record of the machine; a tagged-out machine returns to service when no critical defect remains open',
    tags: ['defects'],
    params: defectParams,
    body: defectCloseSchema,
    response: oneResponse.extend({ machine: machineRefSchema }),
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadDefect(access, params.defectId);
      authorize(canHandleDefects(access), shopOnly);
      const { defect, machine } = await closeDefect(access, params.defectId, body);
      await machine.reload();
      return { ...(await presentOne(access, defect)), machine: presentMachineRef(machine) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/clear-tag-out',
    summary:
      'Return a tagged-out machine to service (technician, manager); refused (409) while a critical defect is open or in repair',
    tags: ['defects'],
    params: machineParams,
    body: clearTagOutSchema,
    response: z.object({ data: machineRefSchema }),
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      await loadMachine(access, params.machineId);
      authorize(canClearTagOut(access), 'Only a technician or manager may clear a tag-out');
      const machine = await clearTagOut(access, params.machineId, body.note);
      return { data: presentMachineRef(machine) };
    },
  });

  return router;
}
