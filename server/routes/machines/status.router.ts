import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { returnToServiceSchema } from '../../../shared/schemas/defects';
import { authorize } from '../../policies/access';
import { canReturnToService } from '../../policies/machine';
import { presentMachineRef } from '../../presenters/defect';
import { machineRefResponseSchema } from '../../../shared/schemas/machines';
import { loadMachine } from '../../services/machines';
import { returnToService } from '../../services/machine-status';

const machineParams = z.object({ orgId: z.uuid(), machineId: z.uuid() });

/** A machine's safety state: returning a tagged-out machine to service is its own noted step. */
export function machineStatusRouter(): Router {
  const router = Router();

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/return-to-service',
    summary:
      'Return a tagged-out machine to service with a note of what was checked (technician, manager; audited). Refused (409) while a critical defect is open or in repair, or when it is not tagged out. Closing defects never does this by itself.',
    tags: ['machines'],
    params: machineParams,
    body: returnToServiceSchema,
    response: machineRefResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine: loaded } = await loadMachine(access, params.machineId);
      authorize(
        canReturnToService(access),
        'Only a technician or manager of the farm returns a machine to service',
      );
      const machine = await returnToService(access, loaded, body.note);
      return { data: presentMachineRef(machine) };
    },
  });

  return router;
}
