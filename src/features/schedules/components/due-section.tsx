import { useState } from 'react';
import {
  DUE_STATUSES,
  DUE_STATUS_LABELS,
  type MachineCategory,
} from '../../../../shared/constants';
import { MACHINE_CLASS_LABELS, type MachineClass } from '../../../../shared/domain/service-library';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { boundMeterName, useMachineMeters } from '../../../lib/meters';
import { useCreateTask } from '../api/create-task';
import { useTasks } from '../api/get-tasks';
import type { Task } from '../api/types';
import { emptyTask } from '../lib/task-form-values';
import { ApplyClassPanel } from './apply-class-panel';
import { ApplyTemplatePanel } from './apply-template-panel';
import { HistoryUnknownSummary } from './history-unknown-panel';
import { TaskCard } from './task-card';
import { TaskForm } from './task-form';

interface DueSectionProps {
  orgId: string;
  machine: {
    id: string;
    category: MachineCategory;
    meterUnit: string;
    machineClass?: MachineClass | null;
    /** the last reading, to say due meters on the meter fitted now after a replacement */
    lastReading?: { value: number; lifetimeValue: number } | null;
  };
  timeZone: string;
  /** the service form with one task chosen; given to those who may record services */
  recordServiceHref?: (taskId: string) => string;
}

const RANK = { overdue: 0, due_soon: 1, history_unknown: 2, ok: 3, no_forecast: 4 } as const;

// Most urgent first: overdue, then due soon, then by the date the task falls due.
function byUrgency(a: Task, b: Task): number {
  const rank = RANK[a.due?.status ?? 'no_forecast'] - RANK[b.due?.status ?? 'no_forecast'];
  if (rank !== 0) return rank;
  const da = a.due?.effectiveDate ?? '9999-12-31';
  const db = b.due?.effectiveDate ?? '9999-12-31';
  return da.localeCompare(db);
}

/** The machine's schedule with every task's due point, and (for those who may) its editing. */
export function DueSection({ orgId, machine, timeZone, recordServiceHref }: DueSectionProps) {
  const tasks = useTasks(orgId, machine.id);
  const create = useCreateTask(orgId, machine.id);
  const meters = useMachineMeters(orgId, machine.id);
  const meterList = meters.data?.data ?? [];
  const [panel, setPanel] = useState<'none' | 'add' | 'template' | 'class'>('none');
  const [notice, setNotice] = useState<string | null>(null);
  const open = (next: 'add' | 'template' | 'class') => {
    setNotice(null);
    setPanel(next);
  };

  if (tasks.isPending) return <ListSkeleton rows={3} label="Loading the schedule" />;
  if (tasks.isError)
    return (
      <ErrorState
        title="The schedule didn't load"
        message={tasks.error.message}
        onRetry={() => tasks.refetch()}
        retrying={tasks.isRefetching}
      />
    );

  const { edit: canEdit, setLastDone: canSetLastDone } = tasks.data.abilities;
  const list = [...tasks.data.data].sort(byUrgency);
  const counts = DUE_STATUSES.map((status) => ({
    status,
    n: list.filter((t) => t.due?.status === status).length,
  })).filter((c) => c.n > 0);

  return (
    <div className="flex flex-col gap-4">
      {counts.length > 0 ? (
        <p className="font-bold text-field-800">
          {list.length} {list.length === 1 ? 'task' : 'tasks'}:{' '}
          {counts.map((c) => `${c.n} ${DUE_STATUS_LABELS[c.status].toLowerCase()}`).join(' · ')}
        </p>
      ) : null}
      {machine.machineClass ? (
        <p className="text-field-800">
          Machine class:{' '}
          <span className="font-bold">{MACHINE_CLASS_LABELS[machine.machineClass]}</span> (service
          library; intervals of common practice — the operator's manual wins)
        </p>
      ) : null}
      {notice ? <Alert tone="success">{notice}</Alert> : null}
      <HistoryUnknownSummary
        orgId={orgId}
        machineId={machine.id}
        count={list.filter((t) => t.due?.status === 'history_unknown').length}
        canAnswer={canSetLastDone}
      />
      {canEdit && panel === 'none' ? (
        <div className="flex flex-wrap gap-2">
          <Button icon="plus" onClick={() => open('add')}>
            Add task
          </Button>
          <Button variant="secondary" onClick={() => open('class')}>
            Apply machine class
          </Button>
          <Button variant="secondary" onClick={() => open('template')}>
            Apply template
          </Button>
        </div>
      ) : null}

      {panel === 'add' ? (
        <section
          aria-label="Add task"
          className="rounded-xl border border-field-300 bg-white p-4 shadow-card"
        >
          <h3 className="mb-4 text-lg font-black text-field-950">Add a task</h3>
          <TaskForm
            unit={machine.meterUnit}
            label="Add task"
            initial={emptyTask()}
            submitLabel="Add task"
            meters={meters.data?.data}
            onSubmit={async (values, meterId) => {
              const task = await create.mutateAsync({ ...values, meterId });
              setPanel('none');
              setNotice(`${task.name} is on the schedule.`);
            }}
            onCancel={() => setPanel('none')}
          />
        </section>
      ) : null}

      {panel === 'class' ? (
        <ApplyClassPanel
          orgId={orgId}
          machineId={machine.id}
          category={machine.category}
          meterUnit={machine.meterUnit}
          machineClass={machine.machineClass ?? null}
          onDone={(result) => {
            setPanel('none');
            if (result)
              setNotice(
                `${MACHINE_CLASS_LABELS[result.machineClass]}: ${result.added.length} ${result.added.length === 1 ? 'task' : 'tasks'} added${result.kept.length ? `, ${result.kept.length} already on the schedule kept` : ''}. Edit each to match the operator's manual.`,
              );
          }}
        />
      ) : null}

      {panel === 'template' ? (
        <ApplyTemplatePanel
          orgId={orgId}
          machineId={machine.id}
          category={machine.category}
          unit={machine.meterUnit}
          existingTaskNames={list.map((t) => t.name)}
          onDone={() => setPanel('none')}
        />
      ) : null}

      {list.length === 0 ? (
        <EmptyState icon="clock" title="No service schedule yet">
          <p>
            {canEdit
              ? "Apply a machine class of the service library, start from a template, or add the tasks of this machine's operator's manual — then make each interval match the manual."
              : 'A manager or technician sets up the service schedule.'}
          </p>
        </EmptyState>
      ) : (
        <ul className="grid items-start gap-3 lg:grid-cols-2" aria-label="Service tasks">
          {list.map((task) => {
            // each task in its own meter's unit and offset (a separator task in separator hours)
            const meter = meterList.find((m) => m.id === task.meterId);
            const last = meter ? meter.lastReading : machine.lastReading;
            return (
              <TaskCard
                key={task.id}
                orgId={orgId}
                task={task}
                unit={meter?.unit ?? machine.meterUnit}
                meterName={meter ? boundMeterName(meter) : null}
                meterOffset={last ? last.lifetimeValue - last.value : 0}
                timeZone={timeZone}
                canEdit={canEdit}
                canSetLastDone={canSetLastDone}
                recordServiceHref={recordServiceHref}
              />
            );
          })}
        </ul>
      )}
    </div>
  );
}
