import { useId } from 'react';
import type { UseFormRegisterReturn } from 'react-hook-form';
import { cx } from '../../../components/ui/cx';
import { TextField } from '../../../components/ui/field';
import { Icon } from '../../../components/ui/icons';
import { MachineStatusBadge } from '../../../components/ui/status-badges';
import { fromDateTimeLocalValue, meterUnitLabel } from '../../../lib/fleet-format';
import { formatDayTime, formatTimeZoneName } from '../../../lib/format';
import type { LatestReading } from '../api/types';
import { LastReading } from './last-reading';

interface LogHoursRowProps {
  item: LatestReading;
  timeZone: string;
  valueField: UseFormRegisterReturn;
  timeField: UseFormRegisterReturn;
  /** the typed time, for the collapsed summary */
  timeValue: string;
  maxTime: string;
  valueError?: string;
  timeError?: string;
  hidden: boolean;
}

/** One machine on the log-hours screen: what it read last, and the new reading to enter. */
export function LogHoursRow({
  item,
  timeZone,
  valueField,
  timeField,
  timeValue,
  maxTime,
  valueError,
  timeError,
  hidden,
}: LogHoursRowProps) {
  const id = useId();
  const { machine } = item;
  const unitLabel = meterUnitLabel(machine.meterUnit);
  const instant = timeValue ? fromDateTimeLocalValue(timeValue, timeZone) : null;
  const timeSummary = instant ? formatDayTime(instant, timeZone) : 'now';

  return (
    <li
      hidden={hidden}
      className={cx(
        'grid gap-3 p-4 sm:grid-cols-[minmax(0,1fr)_15rem] sm:items-start lg:grid-cols-[minmax(0,1fr)_20rem]',
        machine.status === 'tagged_out' && 'bg-poppy-50/50',
      )}
    >
      <div className="flex min-w-0 flex-col gap-1">
        <p className="flex flex-wrap items-center gap-2">
          <span className="font-black text-field-950">{machine.fleetNumber}</span>
          <span className="text-field-800">{machine.name}</span>
          {machine.status === 'tagged_out' ? <MachineStatusBadge status="tagged_out" /> : null}
        </p>
        <p className="text-field-700">
          <span className="text-field-600">Last: </span>
          <LastReading reading={item.lastReading} unit={machine.meterUnit} timeZone={timeZone} />
        </p>
        <details className="group mt-1" open={Boolean(timeError) || undefined}>
          <summary className="inline-flex min-h-touch cursor-pointer items-center gap-1.5 rounded-lg text-field-700 hover:text-field-950">
            <Icon name="clock" className="size-4" />
            <span>
              Time taken: <span className="font-bold">{timeSummary}</span>
            </span>
          </summary>
          <div className="mt-2 max-w-xs">
            <TextField
              label={`${machine.fleetNumber} time taken`}
              type="datetime-local"
              max={maxTime}
              hint={`Farm time (${formatTimeZoneName(timeZone)}). Leave empty for now.`}
              error={timeError}
              {...timeField}
            />
          </div>
        </details>
      </div>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={`${id}-value`} className="font-bold text-field-900">
          {machine.fleetNumber} reading
        </label>
        <div className="flex max-w-64 items-center gap-2">
          <input
            id={`${id}-value`}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            enterKeyHint="next"
            data-reading-input=""
            aria-invalid={valueError ? true : undefined}
            aria-describedby={cx(`${id}-unit`, valueError ? `${id}-error` : null)}
            className={cx(
              'min-h-touch w-full rounded-lg border bg-white px-3 py-2 text-lg text-field-950 tabular-nums',
              valueError ? 'border-2 border-poppy-600' : 'border-field-300 hover:border-field-500',
            )}
            {...valueField}
          />
          <span id={`${id}-unit`} className="min-w-12 text-field-700">
            {unitLabel}
          </span>
        </div>
        {valueError ? (
          <p
            id={`${id}-error`}
            className="flex items-start gap-1.5 text-sm font-bold text-poppy-700"
          >
            <Icon name="error" className="mt-0.5 size-4" />
            <span>{valueError}</span>
          </p>
        ) : null}
      </div>
    </li>
  );
}
