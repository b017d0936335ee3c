import type { Path, UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { taskInputSchema, type TaskInput } from '../../../../shared/schemas/schedule';
import type { Task } from '../api/types';

// The task form's values: what it starts from (empty, or a task as it is), and the names of the
// fields a server error may point at.

export type TaskFormInput = z.input<typeof taskInputSchema>;
export type TaskFormApi = UseFormReturn<TaskFormInput, unknown, TaskInput>;

/** An empty number field is null (no limit); a typed one a number. */
export const optionalNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? null : Number(v)),
};
/** An empty required number is undefined, so the schema reports it missing. */
export const requiredNumber = {
  setValueAs: (v: unknown) => (v === '' || v == null ? undefined : Number(v)),
};

const SCALAR_FIELDS = [
  'name',
  'intervalMeter',
  'intervalDays',
  'firstServiceMeter',
  'warnMeter',
  'warnDays',
  'seasonAnchor',
  'seasonOffsetDays',
  'labourHours',
  'instructions',
  'safetyNotes',
  'hazards',
  'dailyCare',
  'parts',
  'fluids',
] as const;

/** Every field of the form as it stands, rows of parts and fluids included, for server errors. */
export function taskFieldNames(values: Partial<TaskFormInput>): Path<TaskFormInput>[] {
  const rowFields = [
    ...(values.parts ?? []).flatMap((_, i) =>
      (['partNumber', 'description', 'quantity', 'wearPart'] as const).map(
        (f) => `parts.${i}.${f}`,
      ),
    ),
    ...(values.fluids ?? []).flatMap((_, i) =>
      (['kind', 'volume', 'unit'] as const).map((f) => `fluids.${i}.${f}`),
    ),
  ] as Path<TaskFormInput>[];
  return [...SCALAR_FIELDS, ...rowFields];
}

export const emptyTask = (): TaskInput => ({
  name: '',
  intervalMeter: null,
  intervalDays: null,
  firstServiceMeter: null,
  warnMeter: null,
  warnDays: null,
  seasonAnchor: null,
  seasonOffsetDays: null,
  parts: [],
  fluids: [],
  labourHours: null,
  instructions: '',
  safetyNotes: '',
  hazards: [],
  dailyCare: false,
});

export const taskToInput = (task: Task): TaskInput => ({
  name: task.name,
  intervalMeter: task.intervalMeter,
  intervalDays: task.intervalDays,
  firstServiceMeter: task.firstServiceMeter,
  warnMeter: task.warnMeter,
  warnDays: task.warnDays,
  seasonAnchor: task.seasonAnchor,
  seasonOffsetDays: task.seasonOffsetDays,
  parts: task.parts.map((p) => ({ ...p })),
  fluids: task.fluids.map((f) => ({ ...f })),
  labourHours: task.labourHours,
  instructions: task.instructions,
  safetyNotes: task.safetyNotes,
  hazards: [...task.hazards],
  dailyCare: task.dailyCare,
});
