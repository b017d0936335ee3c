import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canSetLastDone } from '../../policies/machine';
import { presentTask } from '../../presenters/schedule';
import { taskResponseSchema, tasksResponseSchema } from '../../../shared/schemas/schedule';
import { TaskDuePoint } from '../../models';
import { invalid } from '../../errors';
import { loadMachine } from '../../services/machines';
import { loadTask } from '../../services/schedules';
import { countFromNow, unknownHistoryTasks } from '../../services/task-history';

const orgParams = z.object({ orgId: z.uuid() });
const NOT_ALLOWED = 'Only a manager or technician may answer when a task was last done';

async function presented(organizationId: string, tasks: Awaited<ReturnType<typeof loadTask>>[]) {
  const due = await TaskDuePoint.findAll({
    where: { organizationId, taskId: tasks.map((t) => t.id) },
  });
  const dueOf = new Map(due.map((d) => [d.taskId, d.due]));
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
      if (task.lastDoneMeter !== null || task.lastDoneOn !== null)
        throw invalid({
          task: `${task.name} has a recorded last service; counting starts from it`,
        });
      await countFromNow(access, machine, [task]);
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
      const tasks = await unknownHistoryTasks(access, machine.id);
      if (!tasks.length)
        throw invalid({ task: `No task of ${machine.fleetNumber} is waiting for its history` });
      await countFromNow(access, machine, tasks);
      return { data: await presented(access.organization.id, tasks) };
    },
  });

  return router;
}
