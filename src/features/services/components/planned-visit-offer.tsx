import { useId } from 'react';
import type { PlannedVisit } from '../../../../shared/schemas/service-record-responses';
import { Alert } from '../../../components/ui/alert';
import { cx } from '../../../components/ui/cx';
import { formatLocalDate } from '../../../lib/fleet-format';

const visitText = (v: PlannedVisit) =>
  `${formatLocalDate(v.plannedFor)}: ${v.tasks.map((t) => t.name).join(', ') || 'no tasks'}`;

/**
 * The machine's open plans that cover a chosen task. Recording: offers to complete one of them
 * with this visit, so the plan leaves the shop week with its parts to pull. Planning: says the
 * work is booked already.
 */
export function PlannedVisitOffer({
  mode,
  visits,
  value,
  onChange,
}: {
  mode: 'record' | 'plan';
  visits: readonly PlannedVisit[];
  /** the plan this visit completes; null: a visit of its own */
  value: string | null;
  onChange: (planId: string | null) => void;
}) {
  const name = useId();
  if (!visits.length) return null;
  if (mode === 'plan')
    return (
      <Alert tone="warning" title="Already planned">
        <p>
          {visits.length === 1
            ? 'A visit in the shop week covers'
            : 'Visits in the shop week cover'}{' '}
          some of these tasks already. Planning them again books the same work twice.
        </p>
        <ul className="mt-1 list-disc pl-5">
          {visits.map((v) => (
            <li key={v.id}>{visitText(v)}</li>
          ))}
        </ul>
      </Alert>
    );
  const options = [
    ...visits.map((v) => ({
      id: v.id as string | null,
      title: `Complete the plan of ${formatLocalDate(v.plannedFor)}`,
      text: `${v.tasks.map((t) => t.name).join(', ') || 'No tasks'}. It leaves the shop week with its parts to pull; its tasks become the ones ticked above.`,
    })),
    {
      id: null,
      title: 'Record a separate visit',
      text: 'The plan stays in the shop week.',
    },
  ];
  return (
    <Alert tone="warning" title="This work is planned already">
      <fieldset className="mt-2 flex flex-col gap-2">
        <legend className="mb-1">
          {visits.length === 1
            ? 'A visit in the shop week covers'
            : 'Visits in the shop week cover'}{' '}
          tasks of this service. Is this that visit?
        </legend>
        {options.map((o) => (
          <label
            key={o.id ?? 'separate'}
            className={cx(
              'flex min-h-touch cursor-pointer items-start gap-3 rounded-lg border bg-white p-3 text-field-900',
              value === o.id ? 'border-field-600 bg-field-50' : 'border-field-200',
            )}
          >
            <input
              type="radio"
              name={name}
              className="mt-1 size-5 accent-field-800"
              checked={value === o.id}
              onChange={() => onChange(o.id)}
            />
            <span>
              <span className="block font-bold">{o.title}</span>
              <span className="block text-sm text-field-700">{o.text}</span>
            </span>
          </label>
        ))}
      </fieldset>
    </Alert>
  );
}
