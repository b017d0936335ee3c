import { useCallback, type ReactNode } from 'react';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { Button } from '../../../components/ui/button';
import { useMachines } from '../api/get-machines';
import type { MachineFilters, MachineSortField } from '../api/types';
import { filtersFromSearch, hasNarrowingFilters, searchFromFilters } from '../lib/fleet-filters';
import { useMediaQuery, WIDE_LAYOUT_QUERY } from '../lib/use-media-query';
import { FleetCards } from './fleet-cards';
import { FleetFilters } from './fleet-filters';
import { FleetPagination } from './fleet-pagination';
import { FleetSortSelect } from './fleet-sort-select';
import { FleetTable } from './fleet-table';

interface FleetViewProps {
  orgId: string;
  timeZone: string;
  machineHref: (machineId: string) => string;
  /** the empty fleet's call to action, for those who may add machines */
  addAction?: ReactNode;
}

/** Filters, the page of machines (table or cards by width) and the pager, all driven by the URL. */
export function FleetView({ orgId, timeZone, machineHref, addAction }: FleetViewProps) {
  const [search, setSearch] = useSearchParams();
  const filters = filtersFromSearch(search);
  const wide = useMediaQuery(WIDE_LAYOUT_QUERY);
  const machines = useMachines(orgId, filters);

  const update = useCallback(
    (change: Partial<MachineFilters>, { keepPage = false } = {}) => {
      const current = filtersFromSearch(search);
      const next = { ...current, ...change, page: keepPage ? (change.page ?? current.page) : 1 };
      setSearch(searchFromFilters(next), { replace: !('page' in change) });
    },
    [search, setSearch],
  );
  const onSort = (sort: MachineSortField, order: 'asc' | 'desc') => update({ sort, order });
  const refreshing = machines.isPlaceholderData;

  return (
    <div className="flex flex-col gap-4">
      <FleetFilters
        filters={filters}
        onChange={update}
        collapsible={!wide}
        extra={!wide ? <FleetSortSelect filters={filters} onSort={onSort} /> : null}
      />

      {machines.isPending ? (
        <ListSkeleton rows={6} label="Loading the fleet" />
      ) : machines.isError ? (
        <ErrorState
          title="The fleet didn't load"
          message={machines.error.message}
          onRetry={() => machines.refetch()}
          retrying={machines.isRefetching}
        />
      ) : machines.data.data.length === 0 ? (
        hasNarrowingFilters(filters) ? (
          <EmptyState
            icon="field"
            title="No machines match"
            action={
              <Button
                variant="secondary"
                onClick={() =>
                  update({
                    category: undefined,
                    status: undefined,
                    dueStatus: undefined,
                    q: undefined,
                  })
                }
              >
                Clear filters
              </Button>
            }
          >
            <p>Try another search or fewer filters.</p>
          </EmptyState>
        ) : filters.page > 1 ? (
          <EmptyState
            title="This page is empty"
            action={
              <Button variant="secondary" onClick={() => update({ page: 1 })}>
                First page
              </Button>
            }
          >
            <p>The fleet has fewer pages now.</p>
          </EmptyState>
        ) : (
          <EmptyState icon="field" title="No machines yet" action={addAction}>
            <p>
              Machines you add here get a service schedule and an hour-meter history, and show up on
              the due list.
            </p>
          </EmptyState>
        )
      ) : (
        <>
          {wide ? (
            <FleetTable
              machines={machines.data.data}
              filters={filters}
              onSort={onSort}
              machineHref={machineHref}
              timeZone={timeZone}
              refreshing={refreshing}
            />
          ) : (
            <FleetCards
              machines={machines.data.data}
              machineHref={machineHref}
              timeZone={timeZone}
              refreshing={refreshing}
            />
          )}
          <FleetPagination
            page={filters.page}
            pageSize={filters.pageSize}
            total={machines.data.meta.total}
            pending={refreshing}
            onPage={(page) => {
              update({ page }, { keepPage: true });
              window.scrollTo({ top: 0 });
            }}
          />
        </>
      )}
    </div>
  );
}
