import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  lastDoneSchema,
  scheduleTemplateCreateSchema,
  scheduleTemplateListResponseSchema,
  scheduleTemplateResponseSchema,
  machineTaskInputSchema,
  taskListResponseSchema,
  taskResponseSchema,
  tasksResponseSchema,
  taskUpdateSchema,
} from '../../../shared/schemas/schedule';
import { MACHINE_CATEGORIES } from '../../../shared/constants';
import { authorize, hasRole } from '../../policies/access';
import { canEditSchedule, canSetLastDone } from '../../policies/machine';
import { presentTask, presentTemplate } from '../../presenters/schedule';
import { loadMachine } from '../../services/machines';
import {
  addTasks,
  deleteTask,
  dueOfTask,
  loadTask,
  machineTasksWithDue,
  setLastDone,
  updateTask,
} from '../../services/schedules';
import {
  applyTemplate,
  createTemplate,
  listTemplates,
  loadTemplate,
} from '../../services/schedule-templates';
import { ensureDuePointsCurrent } from '../../services/forecast';
import type { OrgAccess } from '../../policies/access';
import { invalid } from '../../errors';

const orgParams = z.object({ orgId: z.uuid() });
const machineParams = orgParams.extend({ machineId: z.uuid() });
const taskParams = orgParams.extend({ taskId: z.uuid() });

async function presentMachineTasks(access: OrgAccess, machineId: string) {
  const rows = await machineTasksWithDue(access, machineId);
  return rows.map(({ task, due }) => presentTask(task, due));
}

export function tasksRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/tasks',
    summary: "A machine's service schedule with each task's due point",
    tags: ['schedule'],
    params: machineParams,
    response: taskListResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      await ensureDuePointsCurrent(access.organization.id, access.organization.timeZone);
      const { machine } = await loadMachine(access, params.machineId);
      return {
        data: await presentMachineTasks(access, machine.id),
        abilities: { edit: canEditSchedule(access), setLastDone: canSetLastDone(access) },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/tasks',
    summary: 'Add a service task to a machine',
    tags: ['schedule'],
    params: machineParams,
    body: machineTaskInputSchema,
    status: 201,
    response: taskResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canEditSchedule(access), 'Only a manager or technician may edit the schedule');
      const [task] = await addTasks(access, machine, [body]);
      return { data: presentTask(task, await dueOfTask(task)) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/tasks/:taskId',
    summary: 'Edit a service task',
    tags: ['schedule'],
    params: taskParams,
    body: taskUpdateSchema,
    response: taskResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const task = await loadTask(access, params.taskId);
      await loadMachine(access, task.machineId);
      authorize(canEditSchedule(access), 'Only a manager or technician may edit the schedule');
      await updateTask(access, task, body);
      return { data: presentTask(task, await dueOfTask(task)) };
    },
  });

  route(router, {
    method: 'delete',
    path: '/organizations/:orgId/tasks/:taskId',
    summary: 'Remove a service task',
    tags: ['schedule'],
    params: taskParams,
    status: 204,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const task = await loadTask(access, params.taskId);
      await loadMachine(access, task.machineId);
      authorize(canEditSchedule(access), 'Only a manager or technician may edit the schedule');
      await deleteTask(access, task);
    },
  });

  route(router, {
    method: 'put',
    path: '/organizations/:orgId/tasks/:taskId/last-done',
    summary:
      'Set when a task was last done (meter value and date), e.g. before the machine came into the system',
    tags: ['schedule'],
    params: taskParams,
    body: lastDoneSchema,
    response: taskResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const task = await loadTask(access, params.taskId);
      await loadMachine(access, task.machineId);
      authorize(
        canSetLastDone(access),
        'Only a manager or technician may set when a task was last done',
      );
      await setLastDone(access, task, body);
      return { data: presentTask(task, await dueOfTask(task)) };
    },
  });

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/schedule-templates',
    summary: 'Schedule templates per machine category',
    tags: ['schedule'],
    params: orgParams,
    query: z.object({ category: z.enum(MACHINE_CATEGORIES).optional() }),
    response: scheduleTemplateListResponseSchema,
    handler: async ({ req, query }) => {
      const access = req.access!;
      const rows = await listTemplates(access, query.category);
      return {
        data: rows.map(presentTemplate),
        abilities: { edit: hasRole(access, 'manager') },
      };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/schedule-templates',
    summary: 'Create a schedule template',
    tags: ['schedule'],
    params: orgParams,
    body: scheduleTemplateCreateSchema,
    status: 201,
    response: scheduleTemplateResponseSchema,
    handler: async ({ req, body }) => {
      const access = req.access!;
      authorize(hasRole(access, 'manager'), 'Only a manager may edit schedule templates');
      const t = await createTemplate(access, body);
      return { data: presentTemplate(t) };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/apply-template',
    summary: 'Apply a schedule template: creates all its tasks on the machine in one step',
    tags: ['schedule'],
    params: machineParams,
    body: z.object({ templateId: z.uuid({ error: 'Choose a template' }) }),
    status: 201,
    response: tasksResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canEditSchedule(access), 'Only a manager or technician may edit the schedule');
      const template = await loadTemplate(access, body.templateId).catch(() => {
        throw invalid({ templateId: 'No such schedule template in this farm' });
      });
      await applyTemplate(access, machine, template);
      return { data: await presentMachineTasks(access, machine.id) };
    },
  });

  return router;
}
