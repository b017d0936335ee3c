import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Caution } from '../../../components/ui/caution';
import { Icon } from '../../../components/ui/icons';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { formatMeter } from '../../../lib/fleet-format';
import type { Task } from '../api/types';
import { describeInterval, describeWarning } from '../lib/task-text';
import { DuePointDetails } from './due-point-details';
import { HistoryUnknownPanel } from './history-unknown-panel';
import { LastDoneForm } from './last-done-form';
import { RemoveTaskDialog } from './remove-task-dialog';
import { TaskContents } from './task-contents';
import { DailyCareBadge } from './task-daily-care';
import { TaskEditor } from './task-editor';
import { DueSummary, LastDoneText } from './task-summary';

interface TaskCardProps {
  orgId: string;
  task: Task;
  unit: string;
  /** the meter the task counts on, named where it is not the machine's primary (else null) */
  meterName?: string | null;
  /** lifetime minus the fitted meter's value (non-zero after a meter replacement) */
  meterOffset?: number;
  timeZone: string;
  canEdit: boolean;
  canSetLastDone: boolean;
  /** the service form with this task chosen, for those who may record services */
  recordServiceHref?: (taskId: string) => string;
}

const STATUS_BORDER = {
  overdue: 'border-l-poppy-600',
  due_soon: 'border-l-straw-500',
  history_unknown: 'border-l-loam-500',
  ok: 'border-l-clover-500',
  no_forecast: 'border-l-field-300',
} as const;

/** One task of the schedule: its due point, its caution, what it takes, and its actions. */
export function TaskCard({
  orgId,
  task,
  unit,
  meterName,
  meterOffset,
  timeZone,
  canEdit,
  canSetLastDone,
  recordServiceHref,
}: TaskCardProps) {
  const [mode, setMode] = useState<'view' | 'edit' | 'last-done'>('view');
  const [confirmingRemoval, setConfirmingRemoval] = useState(false);
  const warning = describeWarning(task, unit);
  const hasHazard = task.hazards.length > 0;

  if (mode === 'edit')
    return <TaskEditor orgId={orgId} task={task} unit={unit} onDone={() => setMode('view')} />;

  return (
    <li
      className={`flex flex-col gap-2 rounded-xl border border-l-8 border-field-200 bg-white p-4 shadow-card ${
        STATUS_BORDER[task.due?.status ?? 'no_forecast']
      }`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 className="text-lg font-black text-field-950">{task.name}</h3>
          {meterName ? (
            <p className="text-sm font-bold text-field-800">Counts on {meterName}</p>
          ) : null}
          <p className="text-sm text-field-700">
            {describeInterval(task, unit)}
            {task.firstServiceMeter !== null
              ? ` · first at ${formatMeter(task.firstServiceMeter, unit)}`
              : ''}
            {warning ? ` · due soon ${warning}` : ''}
          </p>
          {task.dailyCare ? <DailyCareBadge task={task} unit={unit} /> : null}
        </div>
        {task.due ? <DueStatusBadge status={task.due.status} /> : null}
      </div>

      {task.due || recordServiceHref ? (
        <div className="flex flex-wrap items-center justify-between gap-2">
          {task.due ? <DueSummary due={task.due} unit={unit} /> : <span />}
          {recordServiceHref ? (
            <Link
              to={recordServiceHref(task.id)}
              className={buttonClasses('secondary', 'px-3')}
              aria-label={`Record service for ${task.name}`}
            >
              <Icon name="check" />
              Record service
            </Link>
          ) : null}
        </div>
      ) : null}
      {/* the caution in full, outside the fold: what to do about each hazard, the task's own
          notes, the deferral */}
      {hasHazard ? (
        <Caution compact heading="Caution" hazards={task.hazards} defer>
          {task.safetyNotes ? <p className="whitespace-pre-line">{task.safetyNotes}</p> : null}
        </Caution>
      ) : null}
      {task.due?.status === 'history_unknown' ? (
        <HistoryUnknownPanel
          orgId={orgId}
          task={task}
          unit={unit}
          timeZone={timeZone}
          canAnswer={canSetLastDone}
        />
      ) : null}

      {/* The full due point, last done, contents and editing fold away: a machine has
          many tasks, and the summary above is what a glance at the page needs. */}
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer items-center gap-1 font-bold text-field-800">
          Details{canEdit || canSetLastDone ? ' and editing' : ''}
        </summary>
        <div className="mt-2 flex flex-col gap-3">
          {task.due ? (
            <DuePointDetails due={task.due} unit={unit} meterOffset={meterOffset} />
          ) : (
            <p className="text-field-600">No due point yet.</p>
          )}

          <LastDoneText task={task} unit={unit} />

          <TaskContents task={task} showSafetyNotes={!hasHazard} />

          {mode === 'last-done' ? (
            <LastDoneForm
              orgId={orgId}
              task={task}
              unit={unit}
              timeZone={timeZone}
              onDone={() => setMode('view')}
            />
          ) : canEdit || canSetLastDone ? (
            <div className="flex flex-wrap gap-2">
              {canSetLastDone ? (
                <Button
                  variant="secondary"
                  icon="check"
                  aria-label={`Set last done for ${task.name}`}
                  onClick={() => setMode('last-done')}
                >
                  Set last done
                </Button>
              ) : null}
              {canEdit ? (
                <>
                  <Button
                    variant="secondary"
                    aria-label={`Edit ${task.name}`}
                    onClick={() => setMode('edit')}
                  >
                    Edit
                  </Button>
                  <Button
                    variant="ghost"
                    icon="trash"
                    aria-label={`Remove ${task.name}`}
                    onClick={() => setConfirmingRemoval(true)}
                  >
                    Remove
                  </Button>
                </>
              ) : null}
            </div>
          ) : null}
        </div>
      </details>

      <RemoveTaskDialog
        orgId={orgId}
        task={task}
        open={confirmingRemoval}
        onClose={() => setConfirmingRemoval(false)}
      />
    </li>
  );
}
