import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { isApiError } from '../../../lib/api-client';
import { useDeleteTask } from '../api/delete-task';
import type { Task } from '../api/types';

/** Asks before a task leaves the machine's schedule, and removes it. */
export function RemoveTaskDialog({
  orgId,
  task,
  open,
  onClose,
}: {
  orgId: string;
  task: Task;
  open: boolean;
  onClose: () => void;
}) {
  const remove = useDeleteTask(orgId, task.machineId);
  return (
    <ConfirmDialog
      open={open}
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
        onClose();
        remove.reset();
      }}
      onConfirm={() => remove.mutate(task.id, { onSuccess: onClose })}
    >
      The task leaves this machine's schedule and the due list. Service records that mention it
      stay.
    </ConfirmDialog>
  );
}
