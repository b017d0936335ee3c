import type { MachineCategory } from '../../../../shared/constants';
import type { DuePoint } from '../../../../shared/domain/types';
import type { TaskFluid, TaskPart, Hazard } from '../../../../shared/schemas/schedule';

/** One line of a machine's schedule, with the due point the server computed for it. */
export interface Task {
  id: string;
  machineId: string;
  name: string;
  intervalMeter: number | null;
  intervalDays: number | null;
  firstServiceMeter: number | null;
  warnMeter: number | null;
  warnDays: number | null;
  parts: TaskPart[];
  fluids: TaskFluid[];
  labourHours: number | null;
  instructions: string;
  safetyNotes: string;
  hazards: Hazard[];
  /** lifetime meter value */
  lastDoneMeter: number | null;
  /** ISO local date (yyyy-mm-dd) */
  lastDoneOn: string | null;
  /** "start counting from now" in place of an unknown last service: lifetime meter, ISO date */
  countFromMeter: number | null;
  countFromOn: string | null;
  due: DuePoint | null;
}

export interface TaskList {
  data: Task[];
  abilities: { edit: boolean; setLastDone: boolean };
}

export interface ScheduleTemplate {
  id: string;
  category: MachineCategory;
  name: string;
  description: string;
  tasks: Array<Partial<Omit<Task, 'id' | 'machineId' | 'due'>> & { name: string }>;
}
