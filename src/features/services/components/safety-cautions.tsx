import { Icon } from '../../../components/ui/icons';
import type { TaskChoice } from '../api/types';
import { hazardLabel, SAFETY_DEFERRAL } from '../lib/hazards';

/**
 * The cautions of the chosen tasks: each task's hazards and safety notes, ending with the deferral
 * to the manual, regulations and qualified practice. Nothing when no chosen task has a hazard.
 */
export function SafetyCautions({ tasks }: { tasks: readonly TaskChoice[] }) {
  const risky = tasks.filter((t) => t.hazards.length > 0 || t.safetyNotes.trim());
  if (risky.length === 0) return null;
  return (
    <aside
      aria-label="Safety cautions"
      className="flex gap-3 rounded-lg border-2 border-l-8 border-straw-500 bg-straw-50 p-3 text-straw-900"
    >
      <Icon name="alert" className="mt-0.5 size-6 shrink-0 text-straw-700" />
      <div className="flex min-w-0 flex-col gap-2">
        <p className="font-black">Caution</p>
        <ul className="flex flex-col gap-1.5">
          {risky.map((t) => (
            <li key={t.id}>
              <span className="font-bold">{t.name}</span>
              {t.hazards.length ? `: ${t.hazards.map(hazardLabel).join(', ')}.` : ':'}
              {t.safetyNotes ? <span className="block">{t.safetyNotes}</span> : null}
            </li>
          ))}
        </ul>
        <p className="font-bold">{SAFETY_DEFERRAL}</p>
      </div>
    </aside>
  );
}

/** The short caution of the reassembly section: stored energy, and the chosen tasks' hazards. */
export function ReassemblyCaution({ tasks }: { tasks: readonly TaskChoice[] }) {
  const hazards = [...new Set(tasks.flatMap((t) => t.hazards))];
  return (
    <p className="flex items-start gap-2 rounded-lg border border-straw-400 bg-straw-50 p-3 text-sm text-straw-900">
      <Icon name="alert" className="mt-0.5 size-4 shrink-0 text-straw-700" />
      <span>
        <span className="font-bold">
          Caution{hazards.length ? `: ${hazards.map(hazardLabel).join(', ')}` : ''}.
        </span>{' '}
        Parts held by springs or snap rings store energy: release them with the proper tool.{' '}
        {SAFETY_DEFERRAL}
      </span>
    </p>
  );
}
