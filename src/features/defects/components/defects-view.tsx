import { useId, useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { DEFECTS_PAGE_SIZE, useDefects } from '../api/get-defects';
import { useMachineOptions } from '../api/get-machine-options';
import { useShopPeople } from '../api/get-shop-people';
import type { ClosedDefect, DefectFilters } from '../api/types';
import { ClosedDefectNotice } from './closed-defect-notice';
import { DefectCard } from './defect-card';
import { DefectFiltersBar } from './defect-filters';
import { ReportDefectForm } from './report-defect-form';
import { SeverityCounts } from './severity-counts';
import { TaggedOutMachines } from './tagged-out-machines';

interface DefectsViewProps {
  orgId: string;
  timeZone: string;
  /** technicians and managers assign, repair and close; others read and report */
  shop: boolean;
  filters: DefectFilters;
  onFiltersChange: (next: DefectFilters) => void;
  machineHref: (machineId: string) => string;
  recordHref: (recordId: string) => string;
}

/** The defects page: tagged-out machines, counts, filters, the list, and "Report a defect". */
export function DefectsView({
  orgId,
  timeZone,
  shop,
  filters,
  onFiltersChange,
  machineHref,
  recordHref,
}: DefectsViewProps) {
  const defects = useDefects(orgId, filters);
  const machines = useMachineOptions(orgId);
  const people = useShopPeople(orgId, { enabled: shop });
  const [reporting, setReporting] = useState(false);
  const [closed, setClosed] = useState<ClosedDefect | null>(null);
  const [returned, setReturned] = useState<string | null>(null);
  const reportId = useId();

  const allMachines = machines.data ?? [];
  const taggedOut = allMachines.filter(
    (m) => m.status === 'tagged_out' && (!filters.machineId || m.id === filters.machineId),
  );
  const abilities = defects.data?.abilities;
  const canHandle = shop && (abilities?.update ?? false);
  const canReturn = abilities?.returnToService ?? false;
  const onReturned = (fleetNumber: string) => {
    setClosed(null);
    setReturned(fleetNumber);
  };

  return (
    <div className="flex flex-col gap-5">
      {returned ? (
        <Alert tone="success" title={`${returned} is back in service`}>
          Your note of what was checked is kept with its history.
        </Alert>
      ) : null}
      {closed ? (
        <ClosedDefectNotice
          key={closed.data.id}
          orgId={orgId}
          closed={closed}
          canReturn={canReturn}
          onReturned={onReturned}
          onDismiss={() => setClosed(null)}
        />
      ) : null}
      <TaggedOutMachines
        orgId={orgId}
        machines={taggedOut}
        canReturn={canReturn}
        onReturned={onReturned}
      />

      <div className="flex flex-col gap-3">
        <Button
          variant={reporting ? 'ghost' : 'secondary'}
          icon={reporting ? 'close' : 'plus'}
          className="min-h-12 self-start"
          aria-expanded={reporting}
          aria-controls={reportId}
          onClick={() => setReporting((was) => !was)}
        >
          {reporting ? 'Hide the report form' : 'Report a defect'}
        </Button>
        {reporting ? (
          <section
            id={reportId}
            aria-labelledby={`${reportId}-heading`}
            className="flex flex-col gap-3 rounded-xl border border-field-200 bg-white p-4"
          >
            <h2 id={`${reportId}-heading`} className="text-xl font-black text-field-900">
              Report a defect
            </h2>
            <ReportDefectForm
              orgId={orgId}
              machines={allMachines.filter((m) => m.status !== 'sold')}
              defaultMachineId={filters.machineId}
            />
          </section>
        ) : null}
      </div>

      <DefectFiltersBar
        filters={filters}
        machines={allMachines}
        people={shop ? (people.data ?? []) : null}
        onChange={onFiltersChange}
      />

      {defects.isPending ? (
        <ListSkeleton rows={4} label="Loading defects" />
      ) : defects.isError ? (
        <ErrorState
          title="The defects didn't load"
          message={defects.error.message}
          onRetry={() => defects.refetch()}
          retrying={defects.isRefetching}
        />
      ) : (
        <>
          <SeverityCounts counts={defects.data.meta.activeBySeverity} />
          {defects.data.data.length === 0 ? (
            <EmptyState icon="check" title="No defects here">
              <p>
                {filters.status === 'active'
                  ? 'Nothing open or in repair for these filters. Defects come from walkarounds and reports.'
                  : 'No defect matches these filters.'}
              </p>
            </EmptyState>
          ) : (
            <ul aria-label="Defects" className="flex flex-col gap-3">
              {defects.data.data.map((defect) => (
                <li key={defect.id}>
                  <DefectCard
                    orgId={orgId}
                    defect={defect}
                    timeZone={timeZone}
                    machineHref={machineHref}
                    recordHref={recordHref}
                    people={canHandle ? (people.data ?? []) : null}
                    onClosed={(result) => {
                      setReturned(null);
                      setClosed(result);
                    }}
                  />
                </li>
              ))}
            </ul>
          )}
          <Pages
            page={filters.page}
            total={defects.data.meta.total}
            onPage={(page) => onFiltersChange({ ...filters, page })}
          />
        </>
      )}
    </div>
  );
}

function Pages({
  page,
  total,
  onPage,
}: {
  page: number;
  total: number;
  onPage: (page: number) => void;
}) {
  const pages = Math.ceil(total / DEFECTS_PAGE_SIZE);
  if (pages <= 1) return null;
  return (
    <nav aria-label="Pages of defects" className="flex items-center justify-between gap-2">
      <Button variant="secondary" disabled={page <= 1} onClick={() => onPage(page - 1)}>
        Previous
      </Button>
      <span className="text-field-700">
        Page {page} of {pages} · {total} defects
      </span>
      <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
        Next
      </Button>
    </nav>
  );
}
