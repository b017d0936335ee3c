import { useId } from 'react';
import { Badge } from '../../../components/ui/badge';
import { Section } from '../../../components/ui/card';
import { formatLocalDate } from '../../../lib/fleet-format';
import type { ShopDay, ShopWeek } from '../api/types';
import { formatHours } from '../lib/record-format';
import { DueItem, PlannedItem, PullList, type ShopLinks } from './shop-week-lines';

/** The shop's week: what fell due before it, then each day's booked and due work, then the parts. */
export function ShopWeekView({ week, links }: { week: ShopWeek; links: ShopLinks }) {
  const { totals } = week;
  return (
    <div className="flex flex-col gap-8">
      <dl className="grid grid-cols-2 gap-4 rounded-xl border border-field-200 bg-white p-4 shadow-card sm:grid-cols-4">
        <Figure term="Planned visits" detail={String(totals.plannedRecords)} />
        <Figure term="Planned labour" detail={formatHours(totals.plannedLabourHours)} />
        <Figure term="Tasks falling due" detail={String(totals.dueTasks)} />
        <Figure term="Unbooked due labour" detail={formatHours(totals.unbookedDueLabourHours)} />
      </dl>

      <Section
        title="Overdue"
        description="Tasks that fell due before this week, with their plan if one is booked."
      >
        {week.overdue.length === 0 ? (
          <p className="text-field-700">Nothing overdue from before this week.</p>
        ) : (
          <ul aria-label="Overdue tasks" className="grid gap-2 md:grid-cols-2">
            {week.overdue.map((row) => (
              <DueItem key={row.taskId} row={row} links={links} planDate={null} />
            ))}
          </ul>
        )}
      </Section>

      <Section title="Days">
        <ol aria-label="Days of the week" className="flex flex-col gap-3">
          {week.days.map((day) => (
            <DayCard key={day.date} day={day} isToday={day.date === week.asOf} links={links} />
          ))}
        </ol>
      </Section>

      <Section
        title="Parts to pull this week"
        description="Summed by part number over every planned visit."
      >
        <div className="rounded-xl border border-field-200 bg-white p-4 shadow-card">
          <PullList
            parts={totals.partsToPull}
            fluids={totals.fluidsToPull}
            label="Parts to pull this week"
          />
        </div>
      </Section>
    </div>
  );
}

function Figure({ term, detail }: { term: string; detail: string }) {
  return (
    <div className="flex flex-col gap-1">
      <dt className="text-sm font-bold text-field-600">{term}</dt>
      <dd className="text-xl font-black text-field-950 tabular-nums">{detail}</dd>
    </div>
  );
}

function DayCard({ day, isToday, links }: { day: ShopDay; isToday: boolean; links: ShopLinks }) {
  const headingId = useId();
  const empty = day.planned.length === 0 && day.due.length === 0;
  const dateText = `${day.weekday} ${formatLocalDate(day.date)}`;
  return (
    <li
      aria-labelledby={headingId}
      className={`grid gap-3 rounded-xl border bg-white p-4 shadow-card lg:grid-cols-[12rem_1fr_16rem] ${
        isToday ? 'border-2 border-field-600' : 'border-field-200'
      }`}
    >
      <div className="flex flex-col gap-1">
        <h3 id={headingId} className="text-lg font-black text-field-950">
          {dateText}
        </h3>
        {isToday ? (
          <Badge tone="accent" className="self-start">
            Today
          </Badge>
        ) : null}
        {!empty ? (
          <p className="text-sm text-field-700">
            {day.planned.length
              ? `Planned labour ${formatHours(day.plannedLabourHours)}`
              : 'No visit booked'}
            {day.unbookedDueLabourHours > 0
              ? ` · unbooked due ${formatHours(day.unbookedDueLabourHours)}`
              : ''}
          </p>
        ) : null}
      </div>
      {empty ? (
        <p className="text-field-600 lg:col-span-2">Nothing planned or falling due.</p>
      ) : (
        <>
          <div className="flex flex-col gap-3">
            {day.planned.length > 0 ? (
              <ul aria-label={`Planned on ${dateText}`} className="flex flex-col gap-2">
                {day.planned.map((item) => (
                  <PlannedItem key={item.id} item={item} links={links} />
                ))}
              </ul>
            ) : null}
            {day.due.length > 0 ? (
              <ul aria-label={`Falling due on ${dateText}`} className="flex flex-col gap-2">
                {day.due.map((row) => (
                  <DueItem key={row.taskId} row={row} links={links} planDate={day.date} />
                ))}
              </ul>
            ) : null}
          </div>
          <div className="flex flex-col gap-1 rounded-lg bg-oat-50 p-3">
            <h4 className="font-black text-field-900">Parts to pull</h4>
            <PullList
              parts={day.partsToPull}
              fluids={day.fluidsToPull}
              label={`Parts to pull on ${dateText}`}
            />
          </div>
        </>
      )}
    </li>
  );
}
