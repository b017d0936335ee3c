import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import { returnToServiceSchema } from '../../../shared/schemas/defects';
import { authorize } from '../../policies/access';
import { canRestrict, canReturnToService, restrictRefusal } from '../../policies/machine';
import { presentMachineRef } from '../../presenters/defect';
import { presentRestriction } from '../../presenters/machine';
import { machineRefResponseSchema } from '../../../shared/schemas/machines';
import {
  restrictionLiftSchema,
  restrictionResponseSchema,
  restrictionSetSchema,
} from '../../../shared/schemas/machine-restrictions';
import type { OrgAccess } from '../../policies/access';
import type { Machine } from '../../models';
import { loadMachine } from '../../services/machines';
import { returnToService } from '../../services/machine-status';
import { liftRestriction, setRestriction } from '../../services/machine-restriction';

const machineParams = z.object({ orgId: z.uuid(), machineId: z.uuid() });

const restrictionBody = (access: OrgAccess, machine: Machine) => ({
  data: {
    machine: presentMachineRef(machine),
    restriction: presentRestriction(machine, access.via),
  },
});

/**
 * A machine's safety state: returning a tagged-out machine to service is its own noted step, and
 * restricted use ("field only, no road") is set and lifted on its own too.
 */
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

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/restriction',
    summary:
      'Restrict a machine in service to limited use, or change the reason (technician, manager; audited). The reason (3–300 characters) is shown to operators before the walkaround, on the machine page, the fleet list and the due list. The machine can still be walked round and used within it. Refused (409) on a sold machine; a dealer is refused (403).',
    tags: ['machines'],
    params: machineParams,
    body: restrictionSetSchema,
    response: restrictionResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine: loaded } = await loadMachine(access, params.machineId);
      authorize(canRestrict(access), restrictRefusal(access));
      return restrictionBody(access, await setRestriction(access, loaded, body.reason));
    },
  });

  route(router, {
    method: 'post',
    path: '/organizations/:orgId/machines/:machineId/restriction/lift',
    summary:
      "Lift a machine's restriction, with an optional note of what was done (technician, manager; audited). Refused (409) when it has none; a dealer is refused (403).",
    tags: ['machines'],
    params: machineParams,
    body: restrictionLiftSchema,
    response: restrictionResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine: loaded } = await loadMachine(access, params.machineId);
      authorize(canRestrict(access), restrictRefusal(access));
      return restrictionBody(access, await liftRestriction(access, loaded, body.note));
    },
  });

  return router;
}
