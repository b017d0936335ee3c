import type { Hazard } from '../../../../shared/schemas/schedule';
import { Icon } from '../../../components/ui/icons';
import { HAZARD_LABELS, SAFETY_DEFERRAL } from '../lib/hazards';

/**
 * The caution beside a task that can hurt someone: which hazards, the task's own safety notes,
 * and the deferral to the manual, regulations and qualified practice.
 */
export function HazardCaution({
  hazards,
  safetyNotes,
}: {
  hazards: Hazard[];
  safetyNotes: string;
}) {
  return (
    <aside
      aria-label="Caution"
      className="flex gap-3 rounded-lg border-2 border-l-8 border-straw-500 bg-straw-50 p-3 text-straw-900"
    >
      <Icon name="alert" className="mt-0.5 size-6 text-straw-700" />
      <div className="flex min-w-0 flex-col gap-1">
        <p className="font-black">
          Caution{hazards.length ? `: ${hazards.map((h) => HAZARD_LABELS[h]).join(', ')}` : ''}
        </p>
        {safetyNotes ? <p>{safetyNotes}</p> : null}
        <p className="font-bold">{SAFETY_DEFERRAL}</p>
      </div>
    </aside>
  );
}

/** The one-line caution of a folded task: which hazards, and the deferral. */
export function HazardCautionLine({ hazards }: { hazards: Hazard[] }) {
  return (
    <p className="flex items-start gap-1.5 text-sm text-straw-900">
      <Icon name="alert" className="mt-0.5 size-4 shrink-0 text-straw-700" />
      <span>
        <span className="font-bold">
          Caution: {hazards.map((h) => HAZARD_LABELS[h]).join(', ')}.
        </span>{' '}
        {SAFETY_DEFERRAL}
      </span>
    </p>
  );
}
