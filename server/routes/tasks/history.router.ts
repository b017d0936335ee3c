import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canSetLastDone } from '../../policies/machine';
import { presentTask } from '../../presenters/schedule';
import { taskResponseSchema, tasksResponseSchema } from '../../../shared/schemas/schedule';
import { loadMachine } from '../../services/machines';
import { dueOfTasks, loadTask } from '../../services/schedules';
import { countMachineFromNow, countTaskFromNow } from '../../services/task-history';

const orgParams = z.object({ orgId: z.uuid() });
const NOT_ALLOWED = 'Only a manager or technician may answer when a task was last done';

async function presented(organizationId: string, tasks: Awaited<ReturnType<typeof loadTask>>[]) {
  const dueOf = await dueOfTasks(
    organizationId,
    tasks.map((t) => t.id),
  );
  return tasks.map((t) => presentTask(t, dueOf.get(t.id) ?? null));
}

/** Answers to "history unknown": start counting a task (or all of a machine's) from now. */
export function taskHistoryRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/tasks/:taskId/count-from-now',
    summary:
      'Start counting a task from the latest reading and today, when its last service is not known',
    tags: ['schedule'],
    params: orgParams.extend({ taskId: z.uuid() }),
    response: taskResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const task = await loadTask(access, params.taskId);
      const { machine } = await loadMachine(access, task.machineId);
      authorize(canSetLastDone(access), NOT_ALLOWED);
      await countTaskFromNow(access, machine, task);
      const [data] = await presented(access.organization.id, [task]);
      return { data };
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/count-from-now',
    summary:
      'Start counting every task of a machine whose history is unknown from the latest reading and today',
    tags: ['schedule'],
    params: orgParams.extend({ machineId: z.uuid() }),
    response: tasksResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(canSetLastDone(access), NOT_ALLOWED);
      const tasks = await countMachineFromNow(access, machine);
      return { data: await presented(access.organization.id, tasks) };
    },
  });

  return router;
}
