import { useId } from 'react';
import { todayIso } from '../../../../shared/domain/calendar';
import {
  CARE_STATE_LABELS,
  careSinceText,
  isGreaseRound,
  type CareState,
} from '../../../../shared/domain/daily-care';
import type { CareSignedOff, DailyCareItem } from '../../../../shared/schemas/daily-care';
import { Badge, type BadgeTone } from '../../../components/ui/badge';
import { Caution } from '../../../components/ui/caution';
import { Icon } from '../../../components/ui/icons';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';

// Daily care inside the walkaround (issue 11): the machine's grease rounds and daily items, each
// with a tick the operator sets once it is done. The ticks travel in the walkaround, so a
// walkaround queued offline signs them off when it is sent, once.

const STATE_TONE: Record<CareState, BadgeTone> = {
  overdue: 'overdue',
  not_today: 'due-soon',
  done_today: 'ok',
};

/** The daily-care ticks of one walkaround; nothing when the machine has no daily care. */
export function DailyCareChecks({
  items,
  unit,
  timeZone,
  done,
  onChange,
}: {
  items: readonly DailyCareItem[];
  unit: string;
  timeZone: string;
  /** ids of the tasks ticked done */
  done: readonly string[];
  onChange: (done: string[]) => void;
}) {
  const headingId = useId();
  if (!items.length) return null;
  const today = todayIso(timeZone);
  const toggle = (taskId: string, on: boolean) =>
    onChange(
      on ? [...done.filter((id) => id !== taskId), taskId] : done.filter((id) => id !== taskId),
    );
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <div className="flex flex-col gap-1">
        <h2 id={headingId} className="text-xl font-black text-field-950">
          Daily care
        </h2>
        <p className="text-field-700">
          Tick each one you have done. It counts again from the meter reading above; no service
          record is needed.
        </p>
      </div>
      <ul className="flex flex-col gap-3">
        {items.map((item) => (
          <CareCheck
            key={item.taskId}
            item={item}
            unit={unit}
            today={today}
            checked={done.includes(item.taskId)}
            onToggle={(on) => toggle(item.taskId, on)}
          />
        ))}
      </ul>
    </section>
  );
}

function CareCheck({
  item,
  unit,
  today,
  checked,
  onToggle,
}: {
  item: DailyCareItem;
  unit: string;
  today: string;
  checked: boolean;
  onToggle: (on: boolean) => void;
}) {
  const id = useId();
  const since = careSinceText(item, unit, today, { meter: formatMeter, date: formatLocalDate });
  return (
    <li
      className={`flex flex-col gap-2 rounded-xl border bg-white p-3 shadow-card ${
        checked ? 'border-clover-500' : 'border-field-200'
      }`}
    >
      {/* the whole row is the target: a gloved thumb need not find a small box */}
      <label
        htmlFor={id}
        className="flex min-h-14 cursor-pointer items-center gap-3 rounded-lg p-1 hover:bg-oat-50"
      >
        <input
          id={id}
          type="checkbox"
          checked={checked}
          onChange={(event) => onToggle(event.target.checked)}
          aria-describedby={`${id}-since`}
          className="size-7 shrink-0 accent-clover-700"
        />
        <span className="text-lg leading-snug font-black text-field-950">
          {isGreaseRound(item) ? 'Greased' : 'Done'}: {item.name}
        </span>
      </label>
      <div id={`${id}-since`} className="flex flex-wrap items-center gap-2 pl-1 text-sm">
        <Badge tone={STATE_TONE[item.state]}>{CARE_STATE_LABELS[item.state]}</Badge>
        <span className="text-field-700">{since}</span>
      </div>
      {item.hazards.length > 0 ? (
        <Caution
          compact
          heading="Caution"
          label={`Safety: ${item.name}`}
          hazards={item.hazards}
          defer
        />
      ) : null}
    </li>
  );
}

/** What the walkaround signed off, on its outcome screen. */
export function CareSignedOffNote({ care }: { care: readonly CareSignedOff[] }) {
  if (!care.length) return null;
  return (
    <section aria-label="Daily care signed off" className="flex flex-col gap-1">
      <h2 className="text-lg font-black text-field-900">Daily care signed off</h2>
      <ul className="flex flex-col gap-1">
        {care.map((c) => (
          <li key={c.taskId} className="flex items-start gap-2 text-field-800">
            <Icon name="check" className="mt-0.5 size-5 shrink-0 text-clover-700" />
            <span>
              {c.name}
              {c.reset ? '' : ' — already done since; left as it was'}
            </span>
          </li>
        ))}
      </ul>
    </section>
  );
}
