// The JSON of the schedule endpoints, typed by the zod schemas the server checks its answers
// against (shared/schemas/schedule.ts).
export type {
  ScheduleTemplate,
  ScheduleTemplateList,
  Task,
  TaskList,
  TaskResponse,
  TasksResponse,
} from '../../../../shared/schemas/schedule';
