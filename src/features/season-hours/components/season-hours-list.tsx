import { EmptyState } from '../../../components/ui/empty-state';
import type { SeasonHoursRow } from '../api/get-season-hours';
import { SeasonHoursCard } from './season-hours-card';

/** The farm's machines as cards (one column on a phone), each with its season figures. */
export function SeasonHoursList({
  orgId,
  rows,
  year,
  asOf,
  canPlan,
  machineHref,
}: {
  orgId: string;
  rows: SeasonHoursRow[];
  year: number;
  /** the farm's local date the figures are to */
  asOf: string;
  canPlan: boolean;
  machineHref: (machineId: string) => string;
}) {
  if (rows.length === 0)
    return (
      <EmptyState icon="clock" title="No machines to show">
        Season hours list the farm&apos;s machines once they are in the fleet; an operator sees the
        machines assigned to them.
      </EmptyState>
    );
  return (
    <ul aria-label="Season hours by machine" className="grid gap-4 lg:grid-cols-2">
      {rows.map((row) => (
        <SeasonHoursCard
          key={row.machine.id}
          orgId={orgId}
          row={row}
          year={year}
          asOf={asOf}
          canPlan={canPlan}
          machineHref={machineHref(row.machine.id)}
        />
      ))}
    </ul>
  );
}
