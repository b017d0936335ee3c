import type { ScheduleTemplate, ServiceTask } from '../models';
import type { DuePoint } from '../../shared/domain';
import type {
  Hazard,
  StoredTaskPart,
  ScheduleTemplate as ScheduleTemplateJson,
  Task,
} from '../../shared/schemas/schedule';

/** A task's parts, each saying whether it is a wear part (older rows do not say: not one). */
export const presentParts = (parts: StoredTaskPart[]): Task['parts'] =>
  parts.map((p) => ({
    partNumber: p.partNumber,
    description: p.description,
    quantity: p.quantity,
    wearPart: p.wearPart === true,
    // a line the machine's spec sheet fills says which filter it is
    ...(p.filterRole && { filterRole: p.filterRole }),
  }));

export const presentTask = (t: ServiceTask, due: DuePoint | null): Task => ({
  id: t.id,
  machineId: t.machineId,
  meterId: t.meterId,
  name: t.name,
  intervalMeter: t.intervalMeter,
  intervalDays: t.intervalDays,
  firstServiceMeter: t.firstServiceMeter,
  warnMeter: t.warnMeter,
  warnDays: t.warnDays,
  parts: presentParts(t.parts),
  fluids: t.fluids,
  labourHours: t.labourHours,
  instructions: t.instructions,
  safetyNotes: t.safetyNotes,
  // The column holds only what the task schema let in.
  hazards: t.hazards as Hazard[],
  seasonAnchor: t.seasonAnchor ?? null,
  seasonOffsetDays: t.seasonOffsetDays ?? null,
  dailyCare: t.dailyCare,
  lastDoneMeter: t.lastDoneMeter,
  lastDoneOn: t.lastDoneOn,
  countFromMeter: t.countFromMeter ?? null,
  countFromOn: t.countFromOn ?? null,
  due,
});

export const presentTemplate = (t: ScheduleTemplate): ScheduleTemplateJson => ({
  id: t.id,
  category: t.category,
  name: t.name,
  description: t.description,
  tasks: t.tasks.map((task) => ({
    ...task,
    parts: presentParts(task.parts),
    // templates stored before season services have neither key
    seasonAnchor: task.seasonAnchor ?? null,
    seasonOffsetDays: task.seasonOffsetDays ?? null,
    dailyCare: task.dailyCare === true,
  })),
});
