import { formatMeter } from '../../../lib/fleet-format';

export interface SeasonFigure {
  label: string;
  /** meter units; null: not known (a plan without one in the meter's unit) */
  value: number | null;
  tone: 'now' | 'past' | 'plan';
}

const BAR_TONE: Record<SeasonFigure['tone'], string> = {
  now: 'bg-field-700',
  past: 'bg-oat-400',
  plan: 'bg-loam-500',
};

/**
 * A machine's season figures as a list, each with a bar on one scale (the largest figure), so
 * this season so far reads against last season and the plan at a glance. The bars are drawn
 * only: the numbers beside them are what a screen reader reads.
 */
export function SeasonBars({ figures, unit }: { figures: SeasonFigure[]; unit: string }) {
  const top = Math.max(0, ...figures.map((f) => f.value ?? 0));
  return (
    <dl className="flex flex-col gap-2">
      {figures.map((figure) => (
        <div key={figure.label} className="flex flex-col gap-1">
          <div className="flex flex-wrap items-baseline justify-between gap-x-3">
            <dt className="text-sm text-field-700">{figure.label}</dt>
            <dd className="font-bold text-field-950 tabular-nums">
              {figure.value === null ? '—' : formatMeter(figure.value, unit)}
            </dd>
          </div>
          <div aria-hidden="true" className="h-2 w-full overflow-hidden rounded-full bg-field-100">
            <div
              className={`h-full rounded-full ${BAR_TONE[figure.tone]}`}
              style={{ width: `${top > 0 ? ((figure.value ?? 0) / top) * 100 : 0}%` }}
            />
          </div>
        </div>
      ))}
    </dl>
  );
}
