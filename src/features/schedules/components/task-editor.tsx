import { changedFields } from '../../../lib/changed-fields';
import { useUpdateTask } from '../api/update-task';
import type { Task } from '../api/types';
import { taskToInput } from '../lib/task-form-values';
import { TaskForm } from './task-form';

/** A task card turned into its form: saving sends only the fields that changed. */
export function TaskEditor({
  orgId,
  task,
  unit,
  onDone,
}: {
  orgId: string;
  task: Task;
  unit: string;
  onDone: () => void;
}) {
  const update = useUpdateTask(orgId, task.machineId);
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
          onDone();
        }}
        onCancel={onDone}
      />
    </li>
  );
}
