import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Caution } from '../../../components/ui/caution';
import { Icon } from '../../../components/ui/icons';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { isApiError } from '../../../lib/api-client';
import { hazardNames } from '../../../lib/caution-text';
import { changedFields } from '../../../lib/changed-fields';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { useDeleteTask } from '../api/delete-task';
import { useUpdateTask } from '../api/update-task';
import type { Task } from '../api/types';
import { describeInterval, describeRemaining, describeWarning } from '../lib/task-text';
import type { DuePoint } from '../../../../shared/domain/types';
import { DuePointDetails } from './due-point-details';
import { HistoryUnknownPanel } from './history-unknown-panel';
import { LastDoneForm } from './last-done-form';
import { TaskForm, taskToInput } from './task-form';

interface TaskCardProps {
  orgId: string;
  task: Task;
  unit: string;
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
  timeZone,
  canEdit,
  canSetLastDone,
  recordServiceHref,
}: TaskCardProps) {
  const [mode, setMode] = useState<'view' | 'edit' | 'last-done'>('view');
  const [confirmingRemoval, setConfirmingRemoval] = useState(false);
  const update = useUpdateTask(orgId, task.machineId);
  const remove = useDeleteTask(orgId, task.machineId);
  const warning = describeWarning(task, unit);
  const hasHazard = task.hazards.length > 0;

  if (mode === 'edit') {
    const initial = taskToInput(task);
    return (
      <li className="rounded-xl border border-field-300 bg-white p-4 shadow-card lg:col-span-2">
        <h3 className="mb-4 text-lg font-black text-field-950">Edit {task.name}</h3>
        <TaskForm
          unit={unit}
          label={`Edit ${task.name}`}
          initial={initial}
          submitLabel="Save task"
          onSubmit={async (values) => {
            const changed = changedFields(initial, values);
            if (Object.keys(changed).length)
              await update.mutateAsync({ taskId: task.id, ...changed });
            setMode('view');
          }}
          onCancel={() => setMode('view')}
        />
      </li>
    );
  }

  return (
    <li
      className={`flex flex-col gap-2 rounded-xl border border-l-8 border-field-200 bg-white p-4 shadow-card ${
        STATUS_BORDER[task.due?.status ?? 'no_forecast']
      }`}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 className="text-lg font-black text-field-950">{task.name}</h3>
          <p className="text-sm text-field-700">
            {describeInterval(task, unit)}
            {task.firstServiceMeter !== null
              ? ` · first at ${formatMeter(task.firstServiceMeter, unit)}`
              : ''}
            {warning ? ` · due soon ${warning}` : ''}
          </p>
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
      {hasHazard ? (
        <Caution variant="line" heading={`Caution: ${hazardNames(task.hazards)}.`} defer />
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

      {/* The full due point, last done, caution, contents and editing fold away: a machine has
          many tasks, and the summary above is what a glance at the page needs. */}
      <details className="group">
        <summary className="flex min-h-touch cursor-pointer items-center gap-1 font-bold text-field-800">
          Details{canEdit || canSetLastDone ? ' and editing' : ''}
        </summary>
        <div className="mt-2 flex flex-col gap-3">
          {task.due ? (
            <DuePointDetails due={task.due} unit={unit} />
          ) : (
            <p className="text-field-600">No due point yet.</p>
          )}

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

          {hasHazard ? (
            <Caution heading={`Caution: ${hazardNames(task.hazards)}`} defer>
              {task.safetyNotes ? <p>{task.safetyNotes}</p> : null}
            </Caution>
          ) : null}

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

      <ConfirmDialog
        open={confirmingRemoval}
        title={`Remove ${task.name}?`}
        confirmLabel="Remove task"
        pending={remove.isPending}
        error={
          remove.error
            ? isApiError(remove.error)
              ? remove.error.message
              : 'Could not remove the task. Try again.'
            : null
        }
        onCancel={() => {
          setConfirmingRemoval(false);
          remove.reset();
        }}
        onConfirm={() => remove.mutate(task.id, { onSuccess: () => setConfirmingRemoval(false) })}
      >
        The task leaves this machine's schedule and the due list. Service records that mention it
        stay.
      </ConfirmDialog>
    </li>
  );
}

/** Parts, fluids, labour and instructions, folded away until asked for. */
function TaskContents({ task, showSafetyNotes }: { task: Task; showSafetyNotes: boolean }) {
  const hasContents =
    task.parts.length > 0 ||
    task.fluids.length > 0 ||
    task.labourHours !== null ||
    task.instructions ||
    (showSafetyNotes && task.safetyNotes);
  if (!hasContents) return null;
  return (
    <details className="group rounded-lg border border-field-200">
      <summary className="flex min-h-touch cursor-pointer items-center px-3 font-bold text-field-800">
        Parts, fluids and instructions
      </summary>
      <div className="flex flex-col gap-3 border-t border-field-200 p-3">
        {task.parts.length > 0 ? (
          <div>
            <h4 className="font-bold text-field-900">Parts</h4>
            <ul className="list-disc pl-5">
              {task.parts.map((part, i) => (
                <li key={i}>
                  {part.quantity} × {part.partNumber}
                  {part.description ? ` — ${part.description}` : ''}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {task.fluids.length > 0 ? (
          <div>
            <h4 className="font-bold text-field-900">Fluids</h4>
            <ul className="list-disc pl-5">
              {task.fluids.map((fluid, i) => (
                <li key={i}>
                  {fluid.volume} {fluid.unit} {fluid.kind}
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        {task.labourHours !== null ? (
          <p>
            <span className="font-bold">Estimated labour:</span> {task.labourHours} h
          </p>
        ) : null}
        {task.instructions ? (
          <div>
            <h4 className="font-bold text-field-900">Instructions</h4>
            <p className="whitespace-pre-line">{task.instructions}</p>
          </div>
        ) : null}
        {showSafetyNotes && task.safetyNotes ? (
          <div>
            <h4 className="font-bold text-field-900">Safety notes</h4>
            <p className="whitespace-pre-line">{task.safetyNotes}</p>
          </div>
        ) : null}
      </div>
    </details>
  );
}

/** One line of the due point: where and when it falls due, and what is left (the server's figures). */
function DueSummary({ due, unit }: { due: DuePoint; unit: string }) {
  const at = [
    due.dueMeter !== null ? formatMeter(due.dueMeter, unit) : null,
    due.effectiveDate ? formatLocalDate(due.effectiveDate) : null,
  ].filter(Boolean);
  const remaining = describeRemaining(due.remainingMeter, due.remainingDays, unit);
  if (!at.length && !remaining) return null;
  return (
    <p className="font-bold text-field-900 tabular-nums">
      {at.length ? `Due ${at.join(' · ')}` : ''}
      {at.length && remaining ? ' — ' : ''}
      {remaining ?? ''}
    </p>
  );
}
