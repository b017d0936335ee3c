import { z } from 'zod';
import { MACHINE_CLASSES } from '../domain/service-library/classes';
import { taskSchema } from './schedule';

/** Apply the service library's set of a class to a machine (and give the machine that class). */
export const applyMachineClassSchema = z
  .object({
    machineClass: z.enum(MACHINE_CLASSES, {
      error: `Choose a machine class: one of ${MACHINE_CLASSES.join(', ')}`,
    }),
  })
  .strict();
export type ApplyMachineClassInput = z.infer<typeof applyMachineClassSchema>;

/**
 * What applying a class did: the tasks it added (with their due points — "history unknown" on a
 * machine that came with hours) and, by name, the class's tasks the machine already had and kept.
 */
export const machineClassAppliedResponseSchema = z.object({
  data: z
    .object({
      machineId: z.string(),
      machineClass: z.enum(MACHINE_CLASSES),
      added: z.array(taskSchema),
      /** names of the class's tasks already on the machine: left as they were */
      kept: z.array(z.string()),
    })
    .meta({ id: 'MachineClassApplied' }),
});
export type MachineClassApplied = z.infer<typeof machineClassAppliedResponseSchema>['data'];
