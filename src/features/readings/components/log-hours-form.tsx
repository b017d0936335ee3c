import { useMemo, useState, type KeyboardEvent } from 'react';
import { useForm, useWatch, type Path } from 'react-hook-form';
import type { UnitSystem } from '../../../../shared/constants';
import { bulkReadingsSchema } from '../../../../shared/schemas/readings';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { fromDateTimeLocalValue, toDateTimeLocalValue } from '../../../lib/fleet-format';
import { useSaveReadings } from '../api/save-readings';
import { enqueueReadings } from '../lib/queued-readings';
import { useMe } from '../../../lib/auth';
import type { LatestReading } from '../api/types';
import { meterInputError, parseMeterInput } from '../../../lib/meter-input';
import { LogHoursRow } from './log-hours-row';

interface Entry {
  value: string;
  takenAt: string;
}
interface LogHoursValues {
  entries: Record<string, Entry>;
}

interface LogHoursFormProps {
  orgId: string;
  timeZone: string;
  units: UnitSystem;
  items: LatestReading[];
  initialFind?: string;
}

const blankEntries = (items: LatestReading[]) =>
  Object.fromEntries(items.map((item) => [item.machine.id, { value: '', takenAt: '' }]));

const matches = (item: LatestReading, find: string) => {
  const q = find.trim().toLowerCase();
  return (
    !q ||
    item.machine.fleetNumber.toLowerCase().includes(q) ||
    item.machine.name.toLowerCase().includes(q)
  );
};

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The phone keypad's "next" key (Enter) moves to the next machine's reading instead of
 * submitting half a round of readings; "Save readings" submits.
 */
function nextReadingOnEnter(event: KeyboardEvent<HTMLUListElement>) {
  const target = event.target as HTMLElement;
  if (event.key !== 'Enter' || !target.matches('[data-reading-input]')) return;
  event.preventDefault();
  const inputs = [
    ...event.currentTarget.querySelectorAll<HTMLInputElement>('[data-reading-input]'),
  ].filter((input) => input.offsetParent !== null);
  inputs[inputs.indexOf(target as HTMLInputElement) + 1]?.focus();
}

/**
 * One reading field per machine; "Save readings" sends only the filled rows, all or nothing.
 * The server's `readings.<i>.<field>` errors index the rows that were sent, so each is mapped back
 * to its machine and shown beside that row.
 */
export function LogHoursForm({
  orgId,
  timeZone,
  units,
  items,
  initialFind = '',
}: LogHoursFormProps) {
  const save = useSaveReadings(orgId);
  const userId = useMe().data?.user.id;
  const [find, setFind] = useState(initialFind);
  const [outcome, setOutcome] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const defaultValues = useMemo(() => ({ entries: blankEntries(items) }), [items]);
  const {
    register,
    handleSubmit,
    setError,
    clearErrors,
    reset,
    control,
    formState: { errors, isSubmitting },
  } = useForm<LogHoursValues>({ defaultValues });
  const entries = useWatch({ control, name: 'entries' }) ?? {};
  const filled = items.filter((item) => entries[item.machine.id]?.value.trim());
  const visible = items.filter((item) => matches(item, find));
  const maxTime = toDateTimeLocalValue(new Date(), timeZone);

  const onSubmit = handleSubmit(async (values) => {
    setOutcome(null);
    clearErrors();
    const sent = items.filter((item) => values.entries[item.machine.id]?.value.trim());
    if (sent.length === 0) {
      setOutcome({ tone: 'error', text: 'Enter at least one reading.' });
      return;
    }
    const fieldOf = (index: number, field: string): Path<LogHoursValues> =>
      `entries.${sent[index].machine.id}.${field === 'takenAt' ? 'takenAt' : 'value'}`;
    // Rows that fail are shown even when the search box hides them.
    const showErrors = (fields: [number, string, string][]) => {
      setFind('');
      fields.forEach(([index, field, message], n) =>
        setError(fieldOf(index, field), { type: 'server', message }, { shouldFocus: n === 0 }),
      );
      setOutcome({
        tone: 'error',
        text: `${plural(new Set(fields.map(([i]) => i)).size, 'reading needs', 'readings need')} fixing: nothing was saved.`,
      });
    };

    const input = {
      readings: sent.map((item) => {
        const entry = values.entries[item.machine.id];
        return {
          machineId: item.machine.id,
          value: parseMeterInput(entry.value, units),
          takenAt: entry.takenAt
            ? (fromDateTimeLocalValue(entry.takenAt, timeZone) ?? entry.takenAt)
            : undefined,
        };
      }),
    };
    // The same schema the server validates with, so a typo is named before the round trip; a
    // value the farm's number rule refuses says why (use a point for decimals…).
    const checked = bulkReadingsSchema.safeParse(input);
    const refused = sent.flatMap((item, index): [number, string, string][] => {
      const message = meterInputError(values.entries[item.machine.id].value, units);
      return message ? [[index, 'value', message]] : [];
    });
    if (refused.length || !checked.success) {
      const refusedRows = new Set(refused.map(([index]) => index));
      const issues = (checked.success ? [] : checked.error.issues)
        .filter((issue) => typeof issue.path[1] === 'number')
        .map((issue): [number, string, string] => [
          issue.path[1] as number,
          String(issue.path[2]),
          issue.message,
        ])
        .filter(([index, field]) => !(field === 'value' && refusedRows.has(index)));
      showErrors([...refused, ...issues].sort(([a], [b]) => a - b));
      return;
    }

    // No connection: the round waits on the phone (each reading with its time) and goes later.
    const keepOnPhone = async () => {
      if (!userId) return;
      const fleetNumbers = sent.map((item) => item.machine.fleetNumber);
      await enqueueReadings({ orgId, userId, input: checked.data, fleetNumbers });
      reset(defaultValues);
      setOutcome({
        tone: 'success',
        text: `No connection: ${plural(sent.length, 'reading', 'readings')} saved on this phone. They are sent when the connection returns.`,
      });
    };
    if (!navigator.onLine) return keepOnPhone();

    try {
      const result = await save.mutateAsync(checked.data);
      const added = result.filter((r) => r.status === 'added').length;
      const repeats = result.length - added;
      reset(defaultValues);
      setOutcome({
        tone: 'success',
        text: `Saved ${plural(added, 'reading', 'readings')}${
          repeats > 0 ? ` (${plural(repeats, 'was', 'were')} already recorded)` : ''
        }.`,
      });
    } catch (error) {
      if (isApiError(error) && error.code === 'unreachable') return keepOnPhone();
      const placed: [number, string, string][] = [];
      const unplaced: string[] = [];
      if (isApiError(error)) {
        for (const [key, message] of Object.entries(error.fields)) {
          const match = /^readings\.(\d+)\.(\w+)$/.exec(key);
          const index = match ? Number(match[1]) : -1;
          if (match && sent[index]) placed.push([index, match[2], message]);
          else unplaced.push(message);
        }
      }
      if (placed.length > 0) showErrors(placed);
      if (unplaced.length > 0 || placed.length === 0) {
        setOutcome({
          tone: 'error',
          text:
            unplaced.join(' ') ||
            (isApiError(error) ? error.message : 'Something went wrong. Try again.'),
        });
      }
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <div className="max-w-sm">
        <TextField
          label="Find machine"
          type="search"
          value={find}
          onChange={(event) => setFind(event.target.value)}
          placeholder="Fleet number or name"
          autoComplete="off"
        />
      </div>
      <ul
        aria-label="Machines"
        onKeyDown={nextReadingOnEnter}
        className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white shadow-card"
      >
        {items.map((item) => {
          const id = item.machine.id;
          return (
            <LogHoursRow
              key={id}
              item={item}
              timeZone={timeZone}
              valueField={register(`entries.${id}.value`)}
              timeField={register(`entries.${id}.takenAt`)}
              timeValue={entries[id]?.takenAt ?? ''}
              maxTime={maxTime}
              valueError={errors.entries?.[id]?.value?.message}
              timeError={errors.entries?.[id]?.takenAt?.message}
              hidden={!matches(item, find)}
            />
          );
        })}
      </ul>
      {visible.length === 0 ? (
        <p className="rounded-xl border border-dashed border-field-300 p-4 text-field-700">
          No machine matches “{find.trim()}”.
        </p>
      ) : null}
      {/* Sticky on wider screens; on phones the bottom tab bar already holds that edge. */}
      <div className="flex flex-col gap-2 rounded-xl border border-field-200 bg-oat-50/95 p-3 sm:sticky sm:bottom-0 sm:z-20 sm:backdrop-blur">
        {outcome ? <Alert tone={outcome.tone}>{outcome.text}</Alert> : null}
        <div className="flex flex-wrap items-center justify-between gap-3">
          <p className="text-field-700">
            {filled.length === 0
              ? 'Type the readings you have; leave the rest empty.'
              : `${plural(filled.length, 'reading', 'readings')} to save`}
          </p>
          <Button type="submit" icon="check" pending={isSubmitting} className="w-full sm:w-auto">
            Save readings
          </Button>
        </div>
      </div>
    </form>
  );
}
