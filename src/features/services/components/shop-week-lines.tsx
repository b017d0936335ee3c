import { Link } from 'react-router-dom';
import { Badge } from '../../../components/ui/badge';
import { Caution } from '../../../components/ui/caution';
import { DueStatusBadge } from '../../../components/ui/status-badges';
import { hazardNames } from '../../../lib/caution-text';
import { fittedMeterText, overText } from '../../../lib/due-format';
import { formatLocalDate } from '../../../lib/fleet-format';
import { boundMeterName } from '../../../lib/meters';
import type { PullFluid, PullPart, ShopDueRow, ShopPlanned } from '../api/types';
import { formatHours, formatQuantity } from '../lib/record-format';

export interface ShopLinks {
  machineHref: (machineId: string) => string;
  recordHref: (recordId: string) => string;
  /** the plan form with this task chosen, booked for `date` */
  planHref: (machineId: string, taskId: string, date: string | null) => string;
  /** the record form: completing a plan (`planId`), else a visit for this task */
  recordServiceHref: (machineId: string, options: { planId?: string; taskId?: string }) => string;
}

const actionLink =
  'inline-flex min-h-touch items-center rounded-lg border border-field-300 bg-white px-3 font-bold text-field-900 hover:bg-field-50';

/**
 * The cautions of a plan's tasks in full: what to do about each hazard they involve (once each),
 * which task involves which and its own safety notes, ending with the deferral.
 */
function PlanCautions({ tasks }: { tasks: ShopPlanned['tasks'] }) {
  const risky = tasks.filter((t) => t.hazards.length > 0 || t.safetyNotes.trim());
  if (risky.length === 0) return null;
  const hazards = [...new Set(risky.flatMap((t) => t.hazards))];
  return (
    <Caution compact label="Safety cautions" heading="Caution" hazards={hazards} defer>
      <ul className="flex flex-col gap-1.5">
        {risky.map((t) => (
          <li key={t.taskId}>
            <span className="font-bold">{t.name}</span>
            {t.hazards.length ? `: ${hazardNames(t.hazards)}.` : ':'}
            {t.safetyNotes ? (
              <span className="block whitespace-pre-line">{t.safetyNotes}</span>
            ) : null}
          </li>
        ))}
      </ul>
    </Caution>
  );
}

const link =
  'inline-flex min-h-touch items-center font-bold text-field-800 underline decoration-field-300 underline-offset-2 hover:text-field-950';

/** A booked visit: machine, tasks, who, the estimated labour, and a link to the plan. */
export function PlannedItem({ item, links }: { item: ShopPlanned; links: ShopLinks }) {
  return (
    <li className="flex flex-col gap-1 rounded-lg border border-sky-200 bg-sky-50/60 p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Link to={links.recordHref(item.id)} className={link}>
          {item.machine.fleetNumber} · {item.machine.name}
        </Link>
        <Badge tone="info" icon="clock">
          Planned · {formatHours(item.estimatedLabourHours)}
        </Badge>
      </div>
      <p className="text-field-900">
        {item.tasks.length ? item.tasks.map((t) => t.name).join(', ') : 'Repair visit'}
        {item.defectIds.length
          ? ` · fixes ${item.defectIds.length} ${item.defectIds.length === 1 ? 'defect' : 'defects'}`
          : ''}
      </p>
      <p className="text-sm text-field-700">
        {item.technicians.length
          ? item.technicians.map((t) => t.name).join(', ')
          : 'No technician booked'}
        {item.notes ? ` · ${item.notes}` : ''}
      </p>
      {item.machine.status === 'tagged_out' ? (
        <p className="text-sm font-bold text-poppy-800">
          Tagged out: not to be used until released.
        </p>
      ) : null}
      <PlanCautions tasks={item.tasks} />
      <div className="flex flex-wrap items-center gap-2">
        <Link
          to={links.recordServiceHref(item.machine.id, { planId: item.id })}
          className={actionLink}
          aria-label={`Record service: ${item.machine.fleetNumber}, planned ${formatLocalDate(item.plannedFor)}`}
        >
          Record service
        </Link>
      </div>
    </li>
  );
}

/** A task falling due: its due point as the server gave it, and booked or a "Plan" shortcut. */
export function DueItem({
  row,
  links,
  planDate,
}: {
  row: ShopDueRow;
  links: ShopLinks;
  planDate: string | null;
}) {
  // the unit of the task's own meter; named where it is not the primary (separator hours)
  const unit = row.machine.meterUnit;
  const meter = boundMeterName(row.meter);
  const due = row.due;
  const when = [
    due.dueMeter !== null
      ? `at ${fittedMeterText(row.dueOnMeter ?? due.dueMeter, due.dueMeter, unit)}`
      : null,
    // an overdue task says how far over, not the date its projection was clamped to
    due.status === 'overdue'
      ? `— ${overText(due, unit)}`
      : due.effectiveDate
        ? `on ${formatLocalDate(due.effectiveDate)}`
        : null,
  ]
    .filter(Boolean)
    .join(' ');
  return (
    <li className="flex flex-col gap-1 rounded-lg border border-field-200 bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Link to={links.machineHref(row.machine.id)} className={link}>
          {row.machine.fleetNumber} · {row.taskName}
        </Link>
        <DueStatusBadge status={due.status} />
      </div>
      <p className="text-sm text-field-700">
        {meter ? <span className="font-bold text-field-800">Counts on {meter} · </span> : null}
        Due {when || '—'}
        {row.labourHours !== null ? ` · about ${formatHours(row.labourHours)}` : ''}
      </p>
      {row.hazards.length ? (
        <Caution variant="summary" heading="Caution." hazards={row.hazards} defer />
      ) : null}
      <div className="flex flex-wrap items-center gap-2">
        {row.booked ? (
          <>
            <Link to={links.recordHref(row.booked.recordId)} className={link}>
              Booked for {formatLocalDate(row.booked.plannedFor)}
            </Link>
            <Link
              to={links.recordServiceHref(row.machine.id, { planId: row.booked.recordId })}
              className={actionLink}
              aria-label={`Record service: ${row.taskName} on ${row.machine.fleetNumber}`}
            >
              Record service
            </Link>
          </>
        ) : (
          <>
            <Badge tone="due-soon">Not booked</Badge>
            <Link
              to={links.planHref(row.machine.id, row.taskId, planDate)}
              className="inline-flex min-h-touch items-center rounded-lg border border-field-300 bg-white px-3 font-bold text-field-900 hover:bg-field-50"
              aria-label={`Plan ${row.taskName} on ${row.machine.fleetNumber}`}
            >
              Plan
            </Link>
            <Link
              to={links.recordServiceHref(row.machine.id, { taskId: row.taskId })}
              className={actionLink}
              aria-label={`Record service: ${row.taskName} on ${row.machine.fleetNumber}`}
            >
              Record service
            </Link>
          </>
        )}
      </div>
    </li>
  );
}

/** Parts summed by part number and fluids by kind, as the server summed them. */
export function PullList({
  parts,
  fluids,
  label,
}: {
  parts: PullPart[];
  fluids: PullFluid[];
  label: string;
}) {
  if (parts.length === 0 && fluids.length === 0)
    return <p className="text-sm text-field-600">No parts to pull.</p>;
  return (
    <ul aria-label={label} className="flex flex-col gap-0.5 text-sm">
      {parts.map((p) => (
        <li key={p.partNumber}>
          <span className="font-bold tabular-nums">{formatQuantity(p.quantity)} ×</span>{' '}
          <span className="font-bold">{p.partNumber}</span>
          {p.description ? <span className="text-field-700"> — {p.description}</span> : null}
        </li>
      ))}
      {fluids.map((f) => (
        <li key={`${f.kind}|${f.unit}`}>
          <span className="font-bold tabular-nums">
            {formatQuantity(f.volume)} {f.unit}
          </span>{' '}
          {f.kind}
        </li>
      ))}
    </ul>
  );
}
