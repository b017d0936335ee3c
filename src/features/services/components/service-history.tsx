import { useId, useState } from 'react';
import { Link } from 'react-router-dom';
import { buttonClasses, Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Icon } from '../../../components/ui/icons';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { formatLocalDate, formatMeter } from '../../../lib/fleet-format';
import { HISTORY_PAGE_SIZE, useServiceHistory } from '../api/get-service-history';
import type { ServiceRecord } from '../api/types';
import { formatMoney } from '../../../lib/format';
import { useDebouncedValue } from '../lib/use-debounced-value';
import { RecordStatusBadge } from './record-badges';

interface ServiceHistoryProps {
  orgId: string;
  machineId: string;
  recordHref: (recordId: string) => string;
}

/** A machine's visits and plans, newest first, searchable by notes, task names and part numbers. */
export function ServiceHistory({ orgId, machineId, recordHref }: ServiceHistoryProps) {
  const searchId = useId();
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const query = useDebouncedValue(q.trim());
  const history = useServiceHistory(orgId, machineId, { q: query, page });

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-col gap-1.5 sm:max-w-sm">
        <label htmlFor={searchId} className="font-bold text-field-900">
          Search history
        </label>
        <input
          id={searchId}
          type="search"
          value={q}
          placeholder="Task, part number or note"
          onChange={(event) => {
            setQ(event.target.value);
            setPage(1);
          }}
          className="min-h-touch w-full rounded-lg border border-field-300 bg-white px-3 py-2 text-base hover:border-field-500"
        />
      </div>
      {history.isPending ? (
        <ListSkeleton rows={3} label="Loading the service history" />
      ) : history.isError ? (
        <ErrorState
          title="The service history didn't load"
          message={history.error.message}
          onRetry={() => history.refetch()}
          retrying={history.isRefetching}
        />
      ) : history.data.data.length === 0 ? (
        <EmptyState icon="clock" title={query ? 'Nothing matches' : 'No services recorded yet'}>
          <p>
            {query
              ? `No visit mentions "${query}" in its tasks, parts or notes.`
              : 'Recorded visits and booked plans show here, newest first.'}
          </p>
        </EmptyState>
      ) : (
        <>
          <ul
            aria-label="Service history"
            aria-busy={history.isPlaceholderData || undefined}
            className="divide-y divide-field-100 rounded-xl border border-field-200 bg-white"
          >
            {history.data.data.map((record) => (
              <HistoryRow key={record.id} record={record} href={recordHref(record.id)} />
            ))}
          </ul>
          <HistoryPager page={page} total={history.data.meta.total} onPage={setPage} />
        </>
      )}
    </div>
  );
}

function HistoryRow({ record, href }: { record: ServiceRecord; href: string }) {
  const date = record.performedOn ?? record.plannedFor;
  const tasks = record.tasks.map((t) => t.name).join(', ') || 'Visit without a scheduled task';
  return (
    <li>
      <Link
        to={href}
        className="flex min-h-touch flex-col gap-1 p-3 hover:bg-field-50 sm:flex-row sm:items-center sm:justify-between sm:gap-4"
      >
        <span className="flex min-w-0 flex-col gap-0.5">
          <span className="flex flex-wrap items-center gap-2">
            <span className="font-black text-field-950">{date ? formatLocalDate(date) : '—'}</span>
            <RecordStatusBadge status={record.status} />
          </span>
          <span className="font-bold text-field-800">{tasks}</span>
        </span>
        <span className="flex shrink-0 flex-wrap gap-x-3 text-sm text-field-700 tabular-nums sm:justify-end">
          {record.meterValue !== null ? (
            <span>{formatMeter(record.meterValue, record.machine.meterUnit)}</span>
          ) : null}
          {record.status === 'completed' ? (
            <span>Cost {formatMoney(record.costs.totalMinor, record.currency)}</span>
          ) : null}
          <Icon name="back" className="hidden size-4 rotate-180 sm:block" />
        </span>
      </Link>
    </li>
  );
}

function HistoryPager({
  page,
  total,
  onPage,
}: {
  page: number;
  total: number;
  onPage: (page: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / HISTORY_PAGE_SIZE));
  if (pages === 1) return <p className="text-sm text-field-600">{total} in all.</p>;
  return (
    <nav aria-label="History pages" className="flex flex-wrap items-center gap-2">
      <Button variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Newer
      </Button>
      <span className="text-field-700">
        Page {page} of {pages} ({total} in all)
      </span>
      <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Older
      </Button>
    </nav>
  );
}

/** "Record service" and "Plan a service", for those who may (the history's abilities.create). */
export function ServiceActions({
  canCreate,
  recordHref,
  planHref,
}: {
  canCreate: boolean;
  recordHref: string;
  planHref: string;
}) {
  if (!canCreate) return null;
  return (
    <div className="flex flex-wrap gap-2">
      <Link to={recordHref} className={buttonClasses()}>
        <Icon name="check" />
        Record service
      </Link>
      <Link to={planHref} className={buttonClasses('secondary')}>
        <Icon name="clock" />
        Plan a service
      </Link>
    </div>
  );
}
