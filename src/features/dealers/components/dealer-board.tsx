import { useCallback, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Alert } from '../../../components/ui/alert';
import { Button, buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { Icon } from '../../../components/ui/icons';
import { LoadingRegion, Skeleton } from '../../../components/ui/skeleton';
import { StatusCounts } from '../../../components/ui/status-counts';
import { useMediaQuery } from '../../../lib/use-media-query';
import { boardCsvHref, useBoard } from '../api/get-board';
import type { BoardFilters, BoardRow } from '../api/types';
import { BoardFiltersBar, FIELDS_FIT, type BoardFilterChange } from './board-filters';
import { BoardList } from './board-list';
import { Pager } from '../../../components/ui/pager';
import { BookingDialog } from './booking-dialog';
import { dateText } from './dealer-format';
import { ReminderDialog } from './reminder-dialog';

interface DealerBoardProps {
  orgId: string;
  timeZone: string;
  filters: BoardFilters;
  onFiltersChange: (change: BoardFilterChange & { page?: number }) => void;
  customersHref: string;
  /** the advisor's page of a row's machine */
  machineHref: (row: BoardRow) => string;
}

/**
 * "Coming due": every active customer's due services in one list (the farms' own due points),
 * with filters, CSV export, and reminders and bookings for the selected services.
 */
export function DealerBoard({
  orgId,
  timeZone,
  filters,
  onFiltersChange,
  customersHref,
  machineHref,
}: DealerBoardProps) {
  const board = useBoard(orgId, filters);
  const [selected, setSelected] = useState<Map<string, BoardRow>>(new Map());
  const [dialog, setDialog] = useState<'reminder' | 'booking' | null>(null);
  const listTop = useRef<HTMLDivElement>(null);
  // where the filters fold, the CSV link sits beside their button: one row less above the list
  const folded = !useMediaQuery(FIELDS_FIT);

  const change = useCallback(
    (c: BoardFilterChange & { page?: number }) => {
      if (c.page === undefined) setSelected(new Map());
      onFiltersChange(c);
    },
    [onFiltersChange],
  );
  const toggle = (row: BoardRow, checked: boolean) =>
    setSelected((prev) => {
      const next = new Map(prev);
      if (checked) next.set(row.taskId, row);
      else next.delete(row.taskId);
      return next;
    });

  if (board.isPending) return <BoardSkeleton />;
  if (board.isError && !board.data)
    return (
      <ErrorState
        title="The board didn't load"
        message={board.error.message}
        onRetry={() => board.refetch()}
        retrying={board.isRefetching}
      />
    );

  const { data: rows, meta } = board.data;
  if (meta.customers.length === 0)
    return (
      <EmptyState
        icon="team"
        title="No customers linked yet"
        action={
          <Link className={buttonClasses('primary')} to={customersHref}>
            Invite a customer
          </Link>
        }
      >
        <p>
          When a farm links its fleet to your dealership, the machines coming due across your
          customers show here.
        </p>
      </EmptyState>
    );

  const chosen = [...selected.values()];
  const customers = [...new Map(chosen.map((r) => [r.customer.id, r.customer])).values()];
  const oneCustomer = customers.length === 1 ? customers[0] : null;
  // a view link lets the dealer remind, never propose a service date (the server refuses it too)
  const canPropose =
    oneCustomer !== null &&
    meta.customers.some((c) => c.id === oneCustomer.id && c.access === 'service');
  const csvLink = (
    <a className={buttonClasses('secondary')} href={boardCsvHref(orgId, filters)} download>
      <Icon name="download" />
      Download CSV
    </a>
  );
  const filtered = Boolean(
    filters.customerId || filters.category || filters.status || filters.task,
  );

  return (
    <div className="flex flex-col gap-4 sm:gap-6">
      <StatusCounts
        label="Service counts"
        counts={meta.counts}
        active={filters.status}
        onSelect={(status) => change({ status })}
      />
      <BoardFiltersBar
        filters={filters}
        customers={meta.customers}
        onChange={change}
        beside={folded ? csvLink : null}
      />
      <div className="flex flex-wrap items-center gap-2">
        {folded ? null : csvLink}
        <Button icon="mail" disabled={!oneCustomer} onClick={() => setDialog('reminder')}>
          Send reminder
        </Button>
        <Button
          variant="secondary"
          icon="clock"
          disabled={!canPropose}
          onClick={() => setDialog('booking')}
        >
          Propose booking
        </Button>
        <p className="text-sm text-field-700" aria-live="polite">
          {chosen.length === 0
            ? 'Tick services of one customer to send a reminder or propose a booking.'
            : oneCustomer
              ? `${chosen.length} selected at ${oneCustomer.name}.${canPropose ? '' : ' Their link is view only: you can send a reminder, not propose a date.'}`
              : 'The selection spans customers: keep services of one customer.'}
        </p>
      </div>
      {board.isError ? <Alert>Couldn&apos;t refresh the board: {board.error.message}</Alert> : null}
      <div
        ref={listTop}
        aria-busy={board.isPlaceholderData || undefined}
        className="flex scroll-mt-20 flex-col gap-3"
      >
        <p className="text-sm text-field-700">
          Overdue first, then by the date each service falls due, within the next {filters.horizon}{' '}
          days. As of {dateText(meta.asOf)}.
        </p>
        {board.isPlaceholderData ? (
          <p role="status" className="text-sm text-field-600">
            Updating…
          </p>
        ) : null}
        {rows.length === 0 ? (
          <EmptyState
            icon="check"
            title={
              filtered
                ? 'No services match these filters'
                : `Nothing due in ${filters.horizon} days`
            }
          >
            <p>
              {filtered
                ? 'Clear a filter, or look further ahead.'
                : 'Choose a longer horizon to see what comes after.'}
            </p>
          </EmptyState>
        ) : (
          <BoardList
            rows={rows}
            selected={new Set(selected.keys())}
            onToggle={toggle}
            machineHref={machineHref}
          />
        )}
        {meta.total > 0 && rows.length > 0 ? (
          <Pager
            label="Pages of the board"
            noun={['service', 'services']}
            page={meta.page}
            pageSize={meta.pageSize}
            total={meta.total}
            onPage={(page) => {
              change({ page });
              listTop.current?.scrollIntoView({ block: 'start' });
            }}
          />
        ) : null}
        <p className="flex items-start gap-1.5 text-sm text-field-700">
          <Icon name="alert" className="mt-0.5 size-4" />
          <span>
            Dates are projected from each farm&apos;s meter readings; an old reading makes them less
            sure. Intervals are guides: follow the operator&apos;s manual and qualified service
            practice.
          </span>
        </p>
      </div>
      {dialog === 'reminder' && oneCustomer ? (
        <ReminderDialog
          orgId={orgId}
          customer={oneCustomer}
          taskIds={chosen.map((r) => r.taskId)}
          onClose={() => setDialog(null)}
        />
      ) : null}
      {dialog === 'booking' && oneCustomer ? (
        <BookingDialog
          orgId={orgId}
          timeZone={timeZone}
          customer={oneCustomer}
          rows={chosen}
          onClose={() => setDialog(null)}
        />
      ) : null}
    </div>
  );
}

function BoardSkeleton() {
  return (
    <LoadingRegion label="Loading the board">
      <div className="flex flex-col gap-6">
        <div className="grid grid-cols-2 gap-3 sm:grid-cols-4">
          {Array.from({ length: 4 }, (_, i) => (
            <Skeleton key={i} className="h-24 rounded-xl" />
          ))}
        </div>
        <Skeleton className="h-12 w-full rounded-lg" />
        {Array.from({ length: 5 }, (_, i) => (
          <Skeleton key={i} className="h-16 w-full rounded-xl" />
        ))}
      </div>
    </LoadingRegion>
  );
}
