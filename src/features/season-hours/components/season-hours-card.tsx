import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { formatMeter } from '../../../lib/fleet-format';
import type { SeasonHoursRow, SeasonPlanJson } from '../api/get-season-hours';
import { useChangeSeasonPlan } from '../api/set-season-plan';
import { planStartNote } from '../lib/plan-start';
import { seasonLabel } from '../lib/season-label';
import { SeasonBars, type SeasonFigure } from './season-bars';
import { SeasonPlanForm } from './season-plan-form';

/** How a plan was entered: "120 h", or "300 ha at 4 ha/h". */
function planText(plan: SeasonPlanJson): string {
  if (plan.value !== null) return `planned as ${formatMeter(plan.value, plan.unit)}`;
  return `planned as ${formatMeter(plan.area ?? 0, plan.areaUnit ?? '')} at ${formatMeter(plan.areaPerHour ?? 0, `${plan.areaUnit}/h`)}`;
}

/** One machine's season: this season so far against last season and its plan; a manager plans. */
export function SeasonHoursCard({
  orgId,
  row,
  year,
  asOf,
  canPlan,
  machineHref,
}: {
  orgId: string;
  row: SeasonHoursRow;
  year: number;
  /** the farm's local date the figures are to */
  asOf: string;
  canPlan: boolean;
  machineHref: string;
}) {
  const titleId = useId();
  const [editing, setEditing] = useState(false);
  const [removing, setRemoving] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const change = useChangeSeasonPlan(orgId);
  const { machine, plan } = row;
  const figures: SeasonFigure[] = [
    { label: 'This season so far', value: row.thisSeason, tone: 'now' },
    { label: 'Last season to the same date', value: row.lastSeasonToDate, tone: 'past' },
    { label: 'Last season in full', value: row.lastSeason, tone: 'past' },
  ];
  if (plan) figures.push({ label: `Plan for ${year}`, value: plan.plannedUse, tone: 'plan' });

  const remove = async () => {
    await change.mutateAsync({ kind: 'remove', machineId: machine.id, year });
    setRemoving(false);
    setNotice(`The ${year} plan of ${machine.fleetNumber} is removed.`);
  };

  return (
    <li
      aria-labelledby={titleId}
      className="flex min-w-0 flex-col gap-3 rounded-xl border border-field-200 bg-white p-4 shadow-card"
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-3">
        <h3 id={titleId} className="min-w-0 text-lg font-black break-words text-field-950">
          <Link
            to={machineHref}
            className="inline-flex min-h-touch items-center underline-offset-2 hover:underline"
          >
            {machine.fleetNumber} · {machine.name}
          </Link>
        </h3>
        <span className="text-sm font-bold text-field-600">
          Season: {seasonLabel(row.seasonMonths)}
        </span>
      </div>
      <SeasonBars figures={figures} unit={row.unit} />
      {plan ? (
        <p className="text-sm text-field-700">
          {plan.plannedUse === null
            ? `The plan (${planText(plan)}) cannot be said in ${row.unit}, so the forecast does not use it.`
            : `The ${year} plan, ${planText(plan)}, comes to ${formatMeter(plan.plannedUse, plan.unit)}.`}
        </p>
      ) : (
        <p className="text-sm text-field-600">No plan for {year}.</p>
      )}
      {plan && !editing ? (
        <p className="text-sm text-field-700">{planStartNote(year, row.seasonMonths, asOf)}</p>
      ) : null}
      {notice ? (
        <Alert tone="success" className="text-sm">
          {notice}
        </Alert>
      ) : null}
      {canPlan && editing ? (
        <SeasonPlanForm
          orgId={orgId}
          row={row}
          year={year}
          asOf={asOf}
          onDone={() => setEditing(false)}
        />
      ) : null}
      {canPlan && !editing ? (
        <div className="flex flex-wrap gap-2">
          <Button
            variant="secondary"
            icon="calendar"
            onClick={() => {
              setNotice(null);
              setEditing(true);
            }}
          >
            {plan ? 'Change plan' : 'Plan season'}
          </Button>
          {plan ? (
            <Button variant="ghost" icon="trash" onClick={() => setRemoving(true)}>
              Remove plan
            </Button>
          ) : null}
        </div>
      ) : null}
      <ConfirmDialog
        open={removing}
        title={`Remove the ${year} plan of ${machine.fleetNumber}?`}
        confirmLabel="Remove plan"
        pending={change.isPending}
        error={change.isError ? 'The plan was not removed. Try again.' : null}
        onConfirm={() => void remove().catch(() => undefined)}
        onCancel={() => setRemoving(false)}
      >
        Its forecast goes back to what its past seasons show.
      </ConfirmDialog>
    </li>
  );
}
