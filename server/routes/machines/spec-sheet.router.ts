import { Router } from 'express';
import { z } from 'zod';
import { route } from '../route';
import {
  specSheetResponseSchema,
  specSheetSavedResponseSchema,
  specSheetUpdateSchema,
} from '../../../shared/schemas/spec-sheet';
import { authorize } from '../../policies/access';
import { canEditSpecSheet, specSheetAbilities } from '../../policies/spec-sheet';
import { presentSpecSheet } from '../../presenters/spec-sheet';
import { loadMachine } from '../../services/machines';
import { findSpecSheet, saveSpecSheet } from '../../services/spec-sheets';

const machineParams = z.object({ orgId: z.uuid(), machineId: z.uuid() });

/** A machine's spec sheet: capacities, fluids, filter numbers, tyre pressures, torques, tests. */
export function specSheetRouter(): Router {
  const router = Router();

  route(router, {
    method: 'get',
    path: '/organizations/:orgId/machines/:machineId/spec-sheet',
    summary:
      "A machine's spec sheet (every section, empty ones too): whoever may see the machine, a linked dealer included",
    tags: ['machines'],
    params: machineParams,
    response: specSheetResponseSchema,
    handler: async ({ req, params }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      const row = await findSpecSheet(access.organization.id, machine.id);
      return { data: presentSpecSheet(machine.id, row), abilities: specSheetAbilities(access) };
    },
  });

  route(router, {
    method: 'patch',
    path: '/organizations/:orgId/machines/:machineId/spec-sheet',
    summary:
      "Change the sections sent (keyed sections: only the keys sent, null clears one; lists replaced whole); the machine's tasks linked to a capacity or filter role take the new figures in the same step (managers and technicians; audited)",
    tags: ['machines'],
    params: machineParams,
    body: specSheetUpdateSchema,
    response: specSheetSavedResponseSchema,
    handler: async ({ req, params, body }) => {
      const access = req.access!;
      const { machine } = await loadMachine(access, params.machineId);
      authorize(
        canEditSpecSheet(access),
        "Only the farm's managers and technicians edit a machine's spec sheet",
      );
      const { row, tasksUpdated } = await saveSpecSheet(access, machine, body);
      return {
        data: presentSpecSheet(machine.id, row),
        abilities: specSheetAbilities(access),
        tasksUpdated,
      };
    },
  });

  return router;
}
