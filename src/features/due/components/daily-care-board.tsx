import { Link } from 'react-router-dom';
import { careSinceText } from '../../../../shared/domain/daily-care';
import type { DailyCareBoard as Board } from '../../../../shared/schemas/daily-care';
import { Badge } from '../../../components/ui/badge';
import { Section } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { useDailyCare } from '../api/get-daily-care';

// The dashboard's daily care (issue 11): grease rounds and daily items per machine, as operators
// signed them off in their walkarounds. Kept off the due list, so a 10 h round never floods it;
// here one line of totals, the machines a tap away.

type Row = Board['data'][number];

/** Tasks named per machine: the overdue ones, then those not done yet today. */
const FIRST_TASKS = 3;

/** Daily care across the farm; nothing at all on a farm whose tasks have none. */
export function DailyCareBoard({
  orgId,
  machineHref,
}: {
  orgId: string;
  machineHref: (machineId: string) => string;
}) {
  const care = useDailyCare(orgId);
  // most farms have no daily care: no placeholder that would only vanish again
  if (care.isPending) return null;
  if (care.isError)
    return (
      <div className="mb-8">
        <ErrorState
          title="Daily care didn't load"
          message={care.error.message}
          onRetry={() => care.refetch()}
          retrying={care.isRefetching}
        />
      </div>
    );
  const { data: rows, meta } = care.data;
  if (!rows.length) return null;
  const total = { overdue: 0, not_today: 0, done_today: 0 };
  for (const row of rows)
    for (const key of ['overdue', 'not_today', 'done_today'] as const)
      total[key] += row.counts[key];
  const overdue = rows.filter((r) => r.counts.overdue > 0).map((r) => r.machine.fleetNumber);
  return (
    <div className="mb-8">
      <Section
        title="Daily care"
        description="Grease rounds and daily items: operators tick them off in the walkaround. They stay off the due list and send no e-mails."
      >
        <p className="flex flex-wrap items-center gap-1.5">
          {total.overdue ? <Badge tone="overdue">{total.overdue} overdue</Badge> : null}
          {total.not_today ? <Badge tone="due-soon">{total.not_today} not yet today</Badge> : null}
          {total.done_today ? <Badge tone="ok">{total.done_today} done today</Badge> : null}
          <span className="text-sm text-field-700">
            on {rows.length} {rows.length === 1 ? 'machine' : 'machines'}
            {overdue.length ? ` — overdue on ${overdue.join(', ')}` : ''}
          </span>
        </p>
        <details className="group">
          <summary className="flex min-h-touch cursor-pointer list-none items-center gap-1.5 font-bold text-field-800 [&::-webkit-details-marker]:hidden">
            Daily care by machine ({rows.length})
            <span className="font-normal underline underline-offset-2 group-open:hidden">show</span>
            <span className="hidden font-normal underline underline-offset-2 group-open:inline">
              hide
            </span>
          </summary>
          <ul
            aria-label="Daily care by machine"
            className="mt-2 grid gap-3 sm:grid-cols-2 xl:grid-cols-3"
          >
            {rows.map((row) => (
              <MachineCare
                key={row.machine.id}
                row={row}
                today={meta.asOf}
                href={machineHref(row.machine.id)}
              />
            ))}
          </ul>
        </details>
      </Section>
    </div>
  );
}

function MachineCare({ row, today, href }: { row: Row; today: string; href: string }) {
  const { machine, counts } = row;
  const pressing = [
    ...row.tasks.filter((t) => t.state === 'overdue'),
    ...row.tasks.filter((t) => t.state === 'not_today'),
  ];
  return (
    <li className="flex flex-col gap-2 rounded-xl border border-field-200 bg-white p-3 shadow-card">
      <Link
        to={href}
        className="inline-flex min-h-touch items-center font-black text-field-950 underline-offset-2 hover:underline"
      >
        {machine.fleetNumber} · {machine.name}
      </Link>
      <p className="flex flex-wrap gap-1.5">
        {counts.overdue ? <Badge tone="overdue">{counts.overdue} overdue</Badge> : null}
        {counts.not_today ? <Badge tone="due-soon">{counts.not_today} not yet today</Badge> : null}
        {counts.done_today ? <Badge tone="ok">{counts.done_today} done today</Badge> : null}
      </p>
      {pressing.length ? (
        <ul className="flex flex-col gap-1 text-sm text-field-700">
          {pressing.slice(0, FIRST_TASKS).map((t) => (
            <li key={t.taskId}>
              <span className="font-bold text-field-900">{t.name}</span>:{' '}
              {careSinceText(t, machine.meterUnit, today, {
                meter: formatMeter,
                date: formatLocalDate,
              })}
            </li>
          ))}
          {pressing.length > FIRST_TASKS ? (
            <li>and {pressing.length - FIRST_TASKS} more on the machine page</li>
          ) : null}
        </ul>
      ) : (
        <p className="text-sm text-clover-800">All done today.</p>
      )}
    </li>
  );
}
