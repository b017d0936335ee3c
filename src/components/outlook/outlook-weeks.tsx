import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import type {
  OutlookPlan,
  OutlookService,
  OutlookWeek,
  ShopOutlook,
} from '../../../shared/schemas/shop-outlook';
import { formatLocalDate } from '../../lib/format';
import { Badge } from '../ui/badge';
import { OutlookChart } from './outlook-chart';
import { countOf, formatOutlookHours, weekTitle } from './outlook-format';

export interface OutlookLinks {
  /** where a service's or plan's machine opens (null: no link) */
  machineHref?: (machine: { id: string }, customer: { id: string } | null) => string | null;
}

/**
 * The next weeks at a glance: bars of forecast against planned labour, then one row per week
 * (services, forecast hours, planned hours) that opens the week's list of services, planned
 * visits, parts and fluids. Rows are cards that wrap, so a phone never scrolls sideways.
 */
export function OutlookWeeks({
  outlook,
  links = {},
}: {
  outlook: ShopOutlook;
  links?: OutlookLinks;
}) {
  const total = outlook.weeks.reduce(
    (t, w) => ({
      services: t.services + w.services.length,
      forecast: t.forecast + w.labourHours,
      planned: t.planned + w.plannedLabourHours,
    }),
    { services: 0, forecast: 0, planned: 0 },
  );
  return (
    <div className="flex flex-col gap-4">
      <p className="text-field-700">
        {countOf(total.services, 'service')} coming due over {countOf(outlook.weeks.length, 'week')}
        : {formatOutlookHours(total.forecast)} of forecast labour,{' '}
        {formatOutlookHours(total.planned)} already planned.
        {outlook.undated > 0
          ? ` ${countOf(outlook.undated, 'service')} cannot be dated yet (no forecast or history unknown) and sit in no week.`
          : ''}
      </p>
      {total.services + total.planned > 0 ? <OutlookChart weeks={outlook.weeks} /> : null}
      <ol aria-label="Weeks ahead" className="flex flex-col gap-2">
        {outlook.weeks.map((w, i) => (
          <WeekRow key={w.start} week={w} first={i === 0} links={links} />
        ))}
      </ol>
    </div>
  );
}

function WeekRow({
  week,
  first,
  links,
}: {
  week: OutlookWeek;
  first: boolean;
  links: OutlookLinks;
}) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const empty = week.services.length + week.planned.length + week.proposed.length === 0;
  const unknown = week.labourUnknown
    ? ` (${countOf(week.labourUnknown, 'service')} without an estimate)`
    : '';
  return (
    <li className="rounded-xl border border-field-200 bg-white shadow-card">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        disabled={empty}
        onClick={() => setOpen((o) => !o)}
        className="flex w-full flex-wrap items-baseline justify-between gap-x-4 gap-y-1 rounded-xl p-3 text-left enabled:hover:bg-oat-50 disabled:cursor-default"
      >
        <span className="font-black text-field-950">{weekTitle(week)}</span>
        <span className="text-sm text-field-700 tabular-nums">
          {countOf(week.services.length, 'service')} · forecast{' '}
          {formatOutlookHours(week.labourHours)}
          {unknown} · planned {formatOutlookHours(week.plannedLabourHours)}
          {week.proposed.length
            ? ` · proposed ${formatOutlookHours(week.proposedLabourHours)}`
            : ''}
        </span>
      </button>
      {open ? (
        <div id={panelId} className="flex flex-col gap-4 border-t border-field-100 p-3">
          {week.services.length > 0 ? (
            <ServiceList week={week} first={first} links={links} />
          ) : null}
          {week.planned.length > 0 ? (
            <PlanList title="Already planned" plans={week.planned} links={links} />
          ) : null}
          {week.proposed.length > 0 ? (
            <PlanList
              title="Proposed by a dealer, not decided yet"
              plans={week.proposed}
              links={links}
            />
          ) : null}
          <PartsList week={week} />
        </div>
      ) : null}
    </li>
  );
}

function MachineName({
  machine,
  customer,
  links,
}: {
  machine: OutlookService['machine'];
  customer: OutlookService['customer'];
  links: OutlookLinks;
}) {
  const href = links.machineHref?.(machine, customer) ?? null;
  const text = `${machine.fleetNumber} ${machine.name}`;
  return (
    <>
      {customer ? <span className="text-field-600">{customer.name} · </span> : null}
      {href ? (
        <Link to={href} className="font-bold text-field-800 underline">
          {text}
        </Link>
      ) : (
        <span className="font-bold">{text}</span>
      )}
    </>
  );
}

function ServiceList({
  week,
  first,
  links,
}: {
  week: OutlookWeek;
  first: boolean;
  links: OutlookLinks;
}) {
  return (
    <div className="flex flex-col gap-2">
      <h4 className="font-black text-field-900">
        Coming due{first ? ' (overdue ones included)' : ''}
      </h4>
      <ul aria-label={`Services coming due, ${weekTitle(week)}`} className="flex flex-col gap-2">
        {week.services.map((s) => (
          <li key={s.taskId} className="flex flex-col gap-1 rounded-lg bg-oat-50 p-2 text-sm">
            <span>
              <MachineName machine={s.machine} customer={s.customer} links={links} />
            </span>
            <span className="flex flex-wrap items-center gap-2">
              {s.taskName}
              {s.status === 'overdue' ? (
                <Badge tone="overdue">Overdue</Badge>
              ) : s.dueOn ? (
                <span className="text-field-700">due {formatLocalDate(s.dueOn)}</span>
              ) : null}
            </span>
            <span className="text-field-700">
              {s.labourHours === null ? 'No labour estimate' : formatOutlookHours(s.labourHours)}
              {s.plannedOn ? ` · planned for ${formatLocalDate(s.plannedOn)}` : ' · not planned'}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}

function PlanList({
  title,
  plans,
  links,
}: {
  title: string;
  plans: OutlookPlan[];
  links: OutlookLinks;
}) {
  return (
    <div className="flex flex-col gap-2">
      <h4 className="font-black text-field-900">{title}</h4>
      <ul aria-label={title} className="flex flex-col gap-2">
        {plans.map((p) => (
          <li
            key={`${p.id}-${p.machine.id}`}
            className="flex flex-col gap-1 rounded-lg bg-oat-50 p-2 text-sm"
          >
            <span>
              <MachineName machine={p.machine} customer={p.customer} links={links} />
            </span>
            <span className="text-field-700">
              {formatLocalDate(p.plannedFor)} · {countOf(p.tasks, 'task')} ·{' '}
              {formatOutlookHours(p.labourHours)}
              {p.labourUnknown ? ` (${countOf(p.labourUnknown, 'task')} without an estimate)` : ''}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}

function PartsList({ week }: { week: OutlookWeek }) {
  if (!week.parts.length && !week.fluids.length && !week.wearParts.length)
    return <p className="text-sm text-field-600">No parts or fluids on these services.</p>;
  return (
    <div className="flex flex-col gap-2">
      <h4 className="font-black text-field-900">Parts and fluids they call for</h4>
      <ul
        aria-label={`Parts and fluids, ${weekTitle(week)}`}
        className="flex flex-col gap-1 text-sm"
      >
        {week.parts.map((p) => (
          <li key={`p-${p.partNumber}`} className="break-words">
            <span className="font-bold">{p.partNumber}</span> {p.description} × {p.quantity}
          </li>
        ))}
        {week.fluids.map((f) => (
          <li key={`f-${f.kind}-${f.unit}`}>
            {f.kind}: {f.volume} {f.unit}
          </li>
        ))}
        {week.wearParts.map((p) => (
          <li key={`w-${p.partNumber || p.description}`} className="text-field-700">
            Inspect {p.description || p.partNumber} (replaced when worn) on{' '}
            {p.machines.map((m) => m.fleetNumber).join(', ')}
          </li>
        ))}
      </ul>
    </div>
  );
}
