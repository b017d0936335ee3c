import { useState, type ReactNode } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { formatMeter, meterUnitLabel } from '../../../lib/fleet-format';
import { formatRelative } from '../../../lib/format';
import {
  meterName,
  useChangeMeter,
  useMachineMeters,
  type MachineMeterJson,
} from '../../../lib/meters';
import { AddMeterForm, RenameMeterForm } from './meter-forms';

/** The server's reason, field by field, or its message. */
const reasonOf = (error: unknown) =>
  isApiError(error)
    ? Object.values(error.fields).join(' ') || error.message
    : 'Something went wrong. Try again.';

/**
 * The form that records a new meter fitted in place of this one (the readings feature's, composed
 * by the page, as features stay apart); `done` closes it with a message (empty: cancelled).
 */
export type ReplacementForm = (
  meter: MachineMeterJson,
  done: (message: string) => void,
) => ReactNode;

/**
 * The machine's meters: kind, unit, the value shown and the lifetime, which one is primary. A
 * manager or technician adds, renames, makes primary and removes, and records a meter
 * replacement on any of them (`replacementForm`, given to those who may); others only read.
 */
export function MetersPanel({
  orgId,
  machineId,
  replacementForm,
}: {
  orgId: string;
  machineId: string;
  replacementForm?: ReplacementForm;
}) {
  const meters = useMachineMeters(orgId, machineId);
  const change = useChangeMeter(orgId, machineId);
  const [adding, setAdding] = useState(false);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [replacing, setReplacing] = useState<string | null>(null);
  const [removing, setRemoving] = useState<MachineMeterJson | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [refusal, setRefusal] = useState<string | null>(null);

  if (meters.isPending) return <ListSkeleton rows={2} label="Loading the meters" />;
  if (meters.isError)
    return (
      <ErrorState
        title="The meters didn't load"
        message={meters.error.message}
        onRetry={() => meters.refetch()}
        retrying={meters.isRefetching}
      />
    );
  const { data: list, abilities } = meters.data;
  const said = (text: string | null) => {
    setRefusal(null);
    setNotice(text);
  };

  const makePrimary = async (meter: MachineMeterJson) => {
    said(null);
    try {
      await change.mutateAsync({ kind: 'primary', meterId: meter.id });
      said(`${meterName(meter)} is now the primary meter.`);
    } catch (error) {
      setRefusal(reasonOf(error));
    }
  };
  const remove = async (meter: MachineMeterJson) => {
    try {
      await change.mutateAsync({ kind: 'remove', meterId: meter.id });
      setRemoving(null);
      said(`${meterName(meter)} was removed.`);
    } catch (error) {
      // shown in the dialog: the meter has readings or tasks
      setRefusal(reasonOf(error));
    }
  };

  return (
    <div className="flex flex-col gap-3">
      {notice ? <Alert tone="success">{notice}</Alert> : null}
      {refusal && !removing ? <Alert>{refusal}</Alert> : null}
      <ul aria-label="Meters" className="grid gap-3 sm:grid-cols-2">
        {list.map((meter) => (
          <li
            key={meter.id}
            aria-label={meterName(meter)}
            className={`flex min-w-0 flex-col gap-2 rounded-xl border border-field-200 bg-white p-4 ${replacing === meter.id ? 'sm:col-span-2' : ''}`}
          >
            <div className="flex flex-wrap items-center gap-2">
              <h4 className="min-w-0 font-black break-words text-field-950">{meterName(meter)}</h4>
              {meter.isPrimary ? <Badge tone="info">Primary</Badge> : null}
            </div>
            <MeterFigures meter={meter} />
            {replacementForm && replacing === meter.id ? (
              replacementForm(meter, (message) => {
                setReplacing(null);
                said(message || null);
              })
            ) : abilities.manage && renaming === meter.id ? (
              <RenameMeterForm
                orgId={orgId}
                machineId={machineId}
                meter={meter}
                onDone={(name) => {
                  setRenaming(null);
                  if (name) said(`Renamed: ${name}.`);
                }}
              />
            ) : abilities.manage ? (
              <div className="flex flex-wrap gap-2">
                <Button
                  variant="secondary"
                  onClick={() => {
                    said(null);
                    setRenaming(meter.id);
                  }}
                >
                  Rename
                </Button>
                {replacementForm ? (
                  <Button
                    variant="secondary"
                    icon="refresh"
                    onClick={() => {
                      said(null);
                      setRenaming(null);
                      setReplacing(meter.id);
                    }}
                  >
                    Record meter replacement
                  </Button>
                ) : null}
                {meter.isPrimary ? null : (
                  <>
                    <Button
                      variant="secondary"
                      pending={change.isPending && change.variables?.kind === 'primary'}
                      onClick={() => void makePrimary(meter)}
                    >
                      Make primary
                    </Button>
                    <Button
                      variant="ghost"
                      icon="trash"
                      onClick={() => {
                        said(null);
                        setRemoving(meter);
                      }}
                    >
                      Remove
                    </Button>
                  </>
                )}
              </div>
            ) : null}
          </li>
        ))}
      </ul>
      {abilities.manage ? (
        adding ? (
          <AddMeterForm
            orgId={orgId}
            machineId={machineId}
            onDone={(name) => {
              setAdding(false);
              if (name) said(`${name} added. Log its first reading below.`);
            }}
          />
        ) : (
          <div>
            <Button
              icon="plus"
              variant="secondary"
              onClick={() => {
                said(null);
                setAdding(true);
              }}
            >
              Add meter
            </Button>
          </div>
        )
      ) : (
        <p className="text-sm text-field-700">A manager or technician adds and changes meters.</p>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={removing ? `Remove ${meterName(removing)}?` : 'Remove meter?'}
        confirmLabel="Remove meter"
        pending={change.isPending}
        error={removing ? refusal : null}
        onConfirm={() => removing && void remove(removing)}
        onCancel={() => {
          setRemoving(null);
          setRefusal(null);
        }}
      >
        <p>Only a meter with no readings and no tasks can be removed.</p>
      </ConfirmDialog>
    </div>
  );
}

/** The value the meter shows, the lifetime when it differs, and how old the last reading is. */
function MeterFigures({ meter }: { meter: MachineMeterJson }) {
  const last = meter.lastReading;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm text-field-800">
      <dt>Unit</dt>
      <dd>{meterUnitLabel(meter.unit)}</dd>
      <dt>Shows</dt>
      <dd className="font-bold text-field-950 tabular-nums">
        {last ? formatMeter(last.value, meter.unit) : 'No readings yet'}
      </dd>
      {last && last.lifetimeValue !== last.value ? (
        <>
          <dt>Lifetime</dt>
          <dd className="tabular-nums">{formatMeter(last.lifetimeValue, meter.unit)}</dd>
        </>
      ) : null}
      {last ? (
        <>
          <dt>Read</dt>
          <dd>{formatRelative(last.takenAt)}</dd>
        </>
      ) : null}
      <dt>Recorded</dt>
      <dd>
        {meter.readingCount} {meter.readingCount === 1 ? 'reading' : 'readings'} · {meter.taskCount}{' '}
        {meter.taskCount === 1 ? 'task' : 'tasks'}
      </dd>
    </dl>
  );
}
