import { useRef } from 'react';
import { Link } from 'react-router-dom';
import { CATEGORY_LABELS, DUE_STATUS_LABELS } from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { Section } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Icon } from '../../../components/ui/icons';
import { LoadingRegion, Skeleton } from '../../../components/ui/skeleton';
import { formatLocalDate } from '../../../lib/fleet-format';
import { useDue } from '../api/get-due';
import type { DueFilters } from '../api/types';
import { DueFiltersBar } from './due-filters-bar';
import { DueList } from './due-list';
import { Pager } from '../../../components/ui/pager';
import { StaleMeters } from './stale-meters';
import { StatusCounts } from '../../../components/ui/status-counts';

type FilterChange = Partial<Omit<DueFilters, 'pageSize'>>;

interface DueBoardProps {
  orgId: string;
  filters: DueFilters;
  onFiltersChange: (change: FilterChange) => void;
  machineHref: (machineId: string) => string;
  logHoursHref?: (fleetNumber: string) => string;
  /** where to add or import machines; given to those who may (an empty farm points there) */
  emptyFleetLinks?: EmptyFleetLinks;
}

interface EmptyFleetLinks {
  addMachine: string;
  importFleet: string;
}

/** A farm's due board: counts by status, filters, the due list and the stale meters. */
export function DueBoard({
  orgId,
  filters,
  onFiltersChange,
  machineHref,
  logHoursHref,
  emptyFleetLinks,
}: DueBoardProps) {
  const due = useDue(orgId, filters);
  const listTop = useRef<HTMLDivElement>(null);

  if (due.isPending) return <DueBoardSkeleton />;
  if (due.isError && !due.data) {
    return (
      <ErrorState
        title="The due list didn't load"
        message={due.error.message}
        onRetry={() => due.refetch()}
        retrying={due.isRefetching}
      />
    );
  }

  const { data: rows, meta } = due.data;
  const filtered = filters.category !== null || filters.status !== null;
  if (meta.machines === 0 && !filtered) return <EmptyFleet links={emptyFleetLinks} />;
  const category = filters.category ? CATEGORY_LABELS[filters.category].toLowerCase() : null;

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="due-counts-heading" className="flex flex-col gap-2">
        <h2 id="due-counts-heading" className="text-lg font-bold text-field-900">
          {category ? `Every ${category} task by status` : 'Every task of the fleet by status'}
        </h2>
        <p className="text-sm text-field-700">
          Counted at any horizon, whatever the list below shows. Choose one to list only those.
        </p>
        <StatusCounts
          label="Task counts across the fleet"
          counts={meta.counts}
          active={filters.status}
          onSelect={(status) => onFiltersChange({ status })}
        />
      </section>
      <Section
        title="Due list"
        description={`${dueListScope(filters.status, filters.horizon)} As of ${formatLocalDate(meta.asOf)}.`}
      >
        <DueFiltersBar filters={filters} onChange={onFiltersChange} />
        {due.isError ? <Alert>Couldn't refresh the due list: {due.error.message}</Alert> : null}
        <div
          ref={listTop}
          aria-busy={due.isPlaceholderData || undefined}
          className="flex scroll-mt-20 flex-col gap-3"
        >
          {due.isPlaceholderData ? (
            <p role="status" className="text-sm text-field-600">
              Updating…
            </p>
          ) : null}
          {rows.length === 0 && meta.total > 0 ? (
            <EmptyState
              icon="info"
              title="This page is past the end of the list"
              action={
                <Button variant="secondary" onClick={() => onFiltersChange({ page: 1 })}>
                  Go to the first page
                </Button>
              }
            >
              <p>The list is shorter now than when this page was opened.</p>
            </EmptyState>
          ) : rows.length === 0 ? (
            <EmptyState
              icon="check"
              title={
                filtered ? 'No tasks match these filters' : `Nothing due in ${filters.horizon} days`
              }
            >
              <p>
                {filtered
                  ? 'Choose another category or status, or look further ahead.'
                  : 'Choose a longer horizon to see what comes after.'}
              </p>
            </EmptyState>
          ) : (
            <DueList rows={rows} machineHref={machineHref} />
          )}
          {meta.total > 0 && rows.length > 0 ? (
            <Pager
              label="Pages of the due list"
              noun={['task', 'tasks']}
              page={meta.page}
              pageSize={meta.pageSize}
              total={meta.total}
              onPage={(page) => {
                onFiltersChange({ page });
                listTop.current?.scrollIntoView({ block: 'start' });
              }}
            />
          ) : null}
        </div>
        <DueNotes />
      </Section>
      <StaleMeters stale={meta.stale} machineHref={machineHref} logHoursHref={logHoursHref} />
    </div>
  );
}

/**
 * What the list holds, in the order it holds it: the horizon's rule (overdue and history unknown,
 * then what falls due inside it) and, for undated statuses, that no horizon applies.
 */
export function dueListScope(status: DueStatus | null, horizon: number): string {
  const within = `within the next ${horizon} days, by date.`;
  if (status === null)
    return `Everything overdue and every task whose last service is not known, then what falls due ${within} Tasks without a forecast yet come last.`;
  if (status === 'overdue') return 'Every overdue task, by date.';
  if (status === 'history_unknown')
    return 'Tasks whose last service is not known yet: no date until last done is set.';
  if (status === 'no_forecast') return 'Tasks without enough readings to date them.';
  return `${DUE_STATUS_LABELS[status]} tasks that fall due ${within}`;
}

/** An empty farm: nothing can be due until there are machines, so say how to add them. */
function EmptyFleet({ links }: { links?: EmptyFleetLinks }) {
  return (
    <EmptyState icon="info" title="No machines yet">
      <p>
        {links
          ? 'The due list fills in once the fleet is here: add machines one by one, or import them from a spreadsheet, then log their hour meters.'
          : 'The due list fills in once the farm manager adds or imports the machines.'}
      </p>
      {links ? (
        <div className="mt-3 flex flex-wrap gap-3">
          <Link to={links.addMachine} className={buttonClasses('primary')}>
            Add a machine
          </Link>
          <Link to={links.importFleet} className={buttonClasses('secondary')}>
            Import machines
          </Link>
        </div>
      ) : null}
    </EmptyState>
  );
}

function DueNotes() {
  return (
    <div className="flex flex-col gap-1 text-sm text-field-700">
      <p className="flex items-start gap-1.5">
        <Icon name="info" className="mt-0.5 size-4" />
        <span>
          Projected dates are projected from the meter trend; the range shows a slower and faster
          pace of use.
        </span>
      </p>
      <p className="flex items-start gap-1.5">
        <Icon name="alert" className="mt-0.5 size-4" />
        <span>
          Intervals and forecasts are guides: follow the operator&apos;s manual and qualified
          service practice.
        </span>
      </p>
    </div>
  );
}

function DueBoardSkeleton() {
  return (
    <LoadingRegion label="Loading the due list">
      <div className="flex flex-col gap-6">
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {Array.from({ length: 4 }, (_, index) => (
            <Skeleton key={index} className="h-24 rounded-xl" />
          ))}
        </div>
        <Skeleton className="h-12 w-full rounded-lg" />
        {Array.from({ length: 5 }, (_, index) => (
          <Skeleton key={index} className="h-16 w-full rounded-xl" />
        ))}
      </div>
    </LoadingRegion>
  );
}
