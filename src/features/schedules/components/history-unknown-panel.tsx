import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { useCountFromNow } from '../api/count-from-now';
import type { Task } from '../api/types';
import { LastDoneForm } from './last-done-form';

/**
 * A task whose last service nobody has given: nothing is guessed, so it asks for an answer —
 * when it was last done (date and meter), or to start counting its interval from now.
 */
export function HistoryUnknownPanel({
  orgId,
  task,
  unit,
  timeZone,
  canAnswer,
}: {
  orgId: string;
  task: Task;
  unit: string;
  timeZone: string;
  canAnswer: boolean;
}) {
  const [setting, setSetting] = useState(false);
  const countFromNow = useCountFromNow(orgId, task.machineId);
  const error = countFromNow.error
    ? isApiError(countFromNow.error)
      ? countFromNow.error.message
      : 'Could not save. Try again.'
    : null;

  return (
    <div className="flex flex-col gap-2 rounded-lg border border-loam-200 bg-loam-50 p-3">
      <p className="font-bold text-loam-900">History unknown — set last done</p>
      <p className="text-sm text-loam-800">
        Nobody has said when this was last done, so when it falls due is not guessed.
        {canAnswer ? '' : ' A manager or technician can set it.'}
      </p>
      {error ? <Alert>{error}</Alert> : null}
      {canAnswer && setting ? (
        <LastDoneForm
          orgId={orgId}
          task={task}
          unit={unit}
          timeZone={timeZone}
          onDone={() => setSetting(false)}
        />
      ) : null}
      {canAnswer && !setting ? (
        <div className="flex flex-wrap gap-2">
          <Button
            icon="check"
            aria-label={`Set last done for ${task.name}`}
            onClick={() => setSetting(true)}
          >
            Set last done
          </Button>
          <Button
            variant="secondary"
            icon="clock"
            pending={countFromNow.isPending}
            aria-label={`Start counting ${task.name} from now`}
            onClick={() => countFromNow.mutate(task.id)}
          >
            Start counting from now
          </Button>
        </div>
      ) : null}
    </div>
  );
}

/** Above the schedule: how many tasks wait for their history, and one answer for them all. */
export function HistoryUnknownSummary({
  orgId,
  machineId,
  count,
  canAnswer,
}: {
  orgId: string;
  machineId: string;
  count: number;
  canAnswer: boolean;
}) {
  const countFromNow = useCountFromNow(orgId, machineId);
  if (count === 0) return null;
  const tasks = count === 1 ? '1 task has' : `${count} tasks have`;
  return (
    <Alert tone="info" title={`${tasks} no known last service`}>
      <p>
        Set when each was last done below. If the machine is new, or nobody knows, start counting
        from the latest reading and today.
      </p>
      {countFromNow.error ? (
        <p className="font-bold">
          {isApiError(countFromNow.error) ? countFromNow.error.message : 'Could not save.'}
        </p>
      ) : null}
      {canAnswer ? (
        <Button
          variant="secondary"
          icon="clock"
          className="mt-2"
          pending={countFromNow.isPending}
          onClick={() => countFromNow.mutate(null)}
        >
          Start counting all {count === 1 ? '' : `${count} `}from now
        </Button>
      ) : null}
    </Alert>
  );
}
