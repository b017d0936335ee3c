import type { DuePoint } from '../../../../shared/domain/types';
import { seasonDueText } from '../../../lib/due-format';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import type { Task } from '../api/types';
import { describeRemaining } from '../lib/task-text';

// The lines of a task card that sum up where the task stands: its due point and its last service.

/** One line of the due point: where and when it falls due, and what is left (the server's figures). */
export function DueSummary({ due, unit }: { due: DuePoint; unit: string }) {
  const at = [
    due.dueMeter !== null ? formatMeter(due.dueMeter, unit) : null,
    // overdue: the limit that passed, not the date the projection was clamped to (today)
    due.status === 'overdue'
      ? due.dueDate && (due.remainingDays ?? 0) < 0
        ? formatLocalDate(due.dueDate)
        : null
      : due.effectiveDate
        ? formatLocalDate(due.effectiveDate)
        : null,
  ].filter(Boolean);
  const remaining = describeRemaining(due.remainingMeter, due.remainingDays, unit);
  // a season service says what its date hangs on, or what it waits for
  const season = due.season ? seasonDueText(due.season) : null;
  if (!at.length && !remaining && !season) return null;
  return (
    <div>
      {at.length || remaining ? (
        <p className="font-bold text-field-900 tabular-nums">
          {at.length ? `Due ${at.join(' · ')}` : ''}
          {at.length && remaining ? ' — ' : ''}
          {remaining ?? ''}
        </p>
      ) : null}
      {season ? (
        <p className="text-sm text-field-700">{`${season[0].toUpperCase()}${season.slice(1)}`}</p>
      ) : null}
    </div>
  );
}

/** When the task was last done, or what its count starts from when that is not known. */
export function LastDoneText({ task, unit }: { task: Task; unit: string }) {
  return (
    <p className="text-sm text-field-600">
      Last done:{' '}
      {task.lastDoneOn || task.lastDoneMeter !== null
        ? [
            task.lastDoneMeter !== null ? formatMeter(task.lastDoneMeter, unit) : null,
            task.lastDoneOn ? formatLocalDate(task.lastDoneOn) : null,
          ]
            .filter(Boolean)
            .join(' on ')
        : task.countFromOn
          ? `not known; counting from ${[
              task.countFromMeter !== null ? formatMeter(task.countFromMeter, unit) : null,
              formatLocalDate(task.countFromOn),
            ]
              .filter(Boolean)
              .join(' on ')}`
          : 'not recorded'}
    </p>
  );
}
