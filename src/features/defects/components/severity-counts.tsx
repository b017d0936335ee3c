import { DEFECT_SEVERITIES, type DefectSeverity } from '../../../../shared/schemas/defects';
import { SeverityBadge } from './severity-badge';

/** How many defects are active (open or in repair) per severity, for the filtered machines. */
export function SeverityCounts({ counts }: { counts: Record<DefectSeverity, number> }) {
  const total = DEFECT_SEVERITIES.reduce((sum, s) => sum + counts[s], 0);
  return (
    <div
      role="group"
      aria-label="Active defects by severity"
      className="flex flex-wrap items-center gap-2"
    >
      <span className="font-bold text-field-800">
        {total === 0 ? 'No active defects' : `${total} active:`}
      </span>
      {DEFECT_SEVERITIES.filter((s) => counts[s] > 0).map((s) => (
        <span key={s} className="inline-flex items-center gap-1">
          <span className="font-black">{counts[s]}</span>
          <SeverityBadge severity={s} />
        </span>
      ))}
    </div>
  );
}
