import { Badge } from '../../../components/ui/badge';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import type { Task } from '../api/types';
import type { TaskFormApi } from '../lib/task-form-values';

// Daily care on the schedule (issue 11): the task form's tick and the task card's badge. A daily-
// care task (grease round, daily item) is signed off by the operator in the walkaround.

/** The task form's daily-care tick. */
export function TaskDailyCareField({ form }: { form: TaskFormApi }) {
  return (
    <label className="flex min-h-12 cursor-pointer items-center gap-3 rounded-lg border border-field-200 px-3 py-2 has-[:checked]:border-clover-600 has-[:checked]:bg-clover-50">
      <input type="checkbox" className="size-5 accent-clover-700" {...form.register('dailyCare')} />
      <span>
        <span className="font-bold">Daily care</span> — a grease round or daily item the operator
        ticks off in the walkaround: no service record, not on the due list, no overdue e-mails
      </span>
    </label>
  );
}

/**
 * The badge of a daily-care task on its card, with when it was last ticked off: outside the
 * card's fold, as a walkaround moves it every day.
 */
export function DailyCareBadge({ task, unit }: { task: Task; unit: string }) {
  const last = [
    task.lastDoneMeter !== null ? formatMeter(task.lastDoneMeter, unit) : null,
    task.lastDoneOn ? formatLocalDate(task.lastDoneOn) : null,
  ].filter(Boolean);
  return (
    <p className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-sm text-field-700">
      <Badge tone="info" icon="check">
        Daily care
      </Badge>
      <span>
        ticked off in the walkaround
        {last.length ? ` — last done ${last.join(' on ')}` : ' — not yet'}
      </span>
    </p>
  );
}
