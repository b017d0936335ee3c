import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { isApiError } from '../../../lib/api-client';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { useDeleteTask } from '../api/delete-task';
import { useUpdateTask } from '../api/update-task';
import type { Task } from '../api/types';
import { describeInterval, describeWarning } from '../lib/task-text';
import { DuePointDetails } from './due-point-details';
import { HazardCaution } from './hazard-caution';
import { LastDoneForm } from './last-done-form';
import { TaskForm, taskToInput } from './task-form';

interface TaskCardProps {
  orgId: string;
  task: Task;
  unit: string;
  timeZone: string;
  canEdit: boolean;
  canSetLastDone: boolean;
}

const STATUS_BORDER = {
  overdue: 'border-l-poppy-600',
  due_soon: 'border-l-straw-500',
  ok: 'border-l-clover-500',
  no_forecast: 'border-l-field-300',
} as const;

/** One task of the schedule: its due point, its caution, what it takes, and its actions. */
export function TaskCard({ orgId, task, unit, timeZone, canEdit, canSetLastDone }: TaskCardProps) {
  const [mode, setMode] = useState<'view' | 'edit' | 'last-done'>('view');
  const [confirmingRemoval, setConfirmingRemoval] = useState(false);
  const update = useUpdateTask(orgId, task.machineId);
  const remove = useDeleteTask(orgId, task.machineId);
  const warning = describeWarning(task, unit);
  const hasHazard = task.hazards.length > 0;

  if (mode === 'edit') {
    return (
      <li className="rounded-xl border border-field-300 bg-white p-4 shadow-card">
        <h3 className="mb-4 text-lg font-black text-field-950">Edit {task.name}</h3>
        <TaskForm
          unit={unit}
          label={`Edit ${task.name}`}
          initial={taskToInput(task)}
          submitLabel="Save task"
          onSubmit={async (values) => {
            await update.mutateAsync({ taskId: task.id, ...values });
            setMode('view');
          }}
          onCancel={() => setMode('view')}
        />
      </li>
    );
  }

  return (
    <li
      className={`flex flex-col gap-3 rounded-xl border border-l-8 border-field-200 bg-white p-4 shadow-card ${
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
          : 'not recorded'}
      </p>

      {hasHazard ? <HazardCaution hazards={task.hazards} safetyNotes={task.safetyNotes} /> : null}

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
