import { Caution } from '../../../components/ui/caution';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { hazardNames } from '../../../lib/caution-text';
import type { TaskChoice } from '../api/types';
import type { ServiceFormMode } from '../lib/form-values';
import { formatHours } from '../lib/record-format';
import { ChoiceList } from './choice-list';

const HINT: Record<ServiceFormMode, string> = {
  record:
    'Each task ticked here is reset from this visit: its next due point counts from the date and meter below.',
  complete:
    'Each task ticked here is reset from this visit: its next due point counts from the date and meter below.',
  plan: 'The tasks this visit will cover; the shop week shows them as booked.',
};

/** The machine's tasks as checkboxes, with the cautions of the ones chosen right below. */
export function TaskChoiceList({
  tasks,
  value,
  onChange,
  error,
  prefillState,
  mode,
}: {
  tasks: readonly TaskChoice[];
  value: readonly string[];
  onChange: (next: string[]) => void;
  error?: string;
  prefillState: 'idle' | 'loading' | 'error';
  mode: ServiceFormMode;
}) {
  const chosen = tasks.filter((t) => value.includes(t.id));
  return (
    <div className="flex flex-col gap-3">
      <ChoiceList
        legend={mode === 'plan' ? 'Tasks to do' : 'Tasks done'}
        hint={HINT[mode]}
        error={error}
        value={value}
        onChange={onChange}
        emptyText="This machine has no service schedule yet: the visit can still be recorded with its parts and notes."
        options={tasks.map((t) => ({
          value: t.id,
          label: t.name,
          detail: (
            <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
              {t.dueStatus ? <DueStatusBadge status={t.dueStatus} /> : null}
              {t.labourHours !== null ? <span>About {formatHours(t.labourHours)}</span> : null}
              {t.hazards.length ? (
                <Caution
                  variant="line"
                  inline
                  heading={`Caution: ${hazardNames(t.hazards)}.`}
                  defer
                />
              ) : null}
            </span>
          ),
        }))}
      />
      <p role="status" className="text-sm text-field-600">
        {prefillState === 'loading'
          ? 'Filling in the parts and fluids of the chosen tasks…'
          : prefillState === 'error'
            ? "Couldn't load the parts lists of these tasks: add the lines by hand below."
            : ''}
      </p>
      <SafetyCautions tasks={chosen} />
    </div>
  );
}

/**
 * The cautions of the chosen tasks in full: what to do about each hazard they involve (once each),
 * each task's hazards and safety notes, ending with the deferral to the manual, regulations and
 * qualified practice. Nothing when no chosen task has a hazard.
 */
function SafetyCautions({ tasks }: { tasks: readonly TaskChoice[] }) {
  const risky = tasks.filter((t) => t.hazards.length > 0 || t.safetyNotes.trim());
  if (risky.length === 0) return null;
  const hazards = [...new Set(risky.flatMap((t) => t.hazards))];
  return (
    <Caution label="Safety cautions" heading="Caution" hazards={hazards} defer>
      <ul className="flex flex-col gap-1.5">
        {risky.map((t) => (
          <li key={t.id}>
            <span className="font-bold">{t.name}</span>
            {t.hazards.length ? `: ${hazardNames(t.hazards)}.` : ':'}
            {t.safetyNotes ? <span className="block">{t.safetyNotes}</span> : null}
          </li>
        ))}
      </ul>
    </Caution>
  );
}
