import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { authorize } from '../../policies/access';
import { canEditSchedule } from '../../policies/machine';
import { presentTask } from '../../presenters/schedule';
import {
  applyMachineClassSchema,
  machineClassAppliedResponseSchema,
} from '../../../shared/schemas/service-library';
import { applyMachineClass } from '../../services/machine-class';
import { loadMachine } from '../../services/machines';
import { dueOfTasks } from '../../services/schedules';

const machineParams = z.object({ orgId: z.uuid(), machineId: z.uuid() });

/** The service library: a machine class's set of tasks put on a machine in one step. */
export function machineClassRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/apply-class',
    summary:
      "Give a machine a class of the service library and add that class's tasks it does not have yet (by name); applying the same class again adds nothing",
    tags: ['schedule'],
    params: machineParams,
    body: applyMachineClassSchema,
    response: machineClassAppliedResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      // the same people who may apply a template or edit the schedule: managers and technicians
      authorize(canEditSchedule(access), 'Only a manager or technician may edit the schedule');
      const { added, kept } = await applyMachineClass(access, machine, body.machineClass);
      const dueOf = await dueOfTasks(
        access.organization.id,
        added.map((t) => t.id),
      );
      return {
        data: {
          machineId: machine.id,
          machineClass: body.machineClass,
          added: added.map((t) => presentTask(t, dueOf.get(t.id) ?? null)),
          kept,
        },
      };
    },
  });

  return router;
}
