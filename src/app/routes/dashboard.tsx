import { lazy, Suspense } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { Section } from '../../components/ui/card';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import type { DueFilters } from '../../features/due/api/types';
import { DueBoard } from '../../features/due/components/due-board';
import { DailyCareBoard } from '../../features/due/components/daily-care-board';
import { WaitingProposals } from '../../features/dealers/components/waiting-proposals';
import { FirstRunChecklistPanel } from '../../features/onboarding/components/first-run-checklist';
import { readDueFilters, writeDueFilters } from '../../features/due/filters';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';
import { loadDealerBoard, SEES_BOOKINGS } from './dashboard-loader';

// The page's loader is dashboard-loader.ts, in the first file (it starts every read of the page
// beside the session). A dealer's board is another role's screen: fetched only when a dealer's
// dashboard opens.
const DealerBoardSection = lazy(() =>
  loadDealerBoard().then((m) => ({ default: m.DealerBoardSection })),
);

const LOGS_HOURS = new Set(['manager', 'technician', 'operator']);

export function DashboardPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const [search, setSearch] = useSearchParams();
  const filters = readDueFilters(search);

  const changeFilters = (change: Partial<Omit<DueFilters, 'pageSize'>>) => {
    // a new filter starts at the first page; turning the page keeps the rest
    const next = { ...filters, page: 1, ...change };
    setSearch(writeDueFilters(next), { preventScrollReset: true });
  };

  return (
    <>
      <PageHeader
        title="Dashboard"
        description={
          <>
            <p className="text-lg font-bold">{organization.name}</p>
            {organization.kind === 'farm' ? (
              <p>What is overdue, what comes due next and when, across the fleet.</p>
            ) : null}
          </>
        }
      />
      {organization.kind === 'farm' && SEES_BOOKINGS.has(membership.role) ? (
        <WaitingProposals
          orgId={organization.id}
          href={paths.organization.bookings.href(organization.id)}
        />
      ) : null}
      <FirstRunChecklistPanel
        orgId={organization.id}
        enabled={organization.kind === 'farm' && membership.role === 'manager'}
        links={{
          importFleet: paths.organization.importFleet.href(organization.id),
          addMachine: paths.organization.machineNew.href(organization.id),
          fleet: paths.organization.machines.href(organization.id),
          machine: (machineId) => paths.organization.machine.href(organization.id, machineId),
          team: paths.organization.team.href(organization.id),
          dealers: paths.organization.farmDealers.href(organization.id),
          reminders: paths.organization.reminders.href(organization.id),
        }}
      />
      {organization.kind === 'dealer' ? (
        <Section
          title="Coming due"
          description="Across your customers, by the date each service falls due."
          actions={
            <Link
              className="font-bold text-field-800 underline"
              to={paths.organization.dealerBoard.href(organization.id)}
            >
              Open the board
            </Link>
          }
        >
          <Suspense fallback={<ListSkeleton rows={4} label="Loading the board" />}>
            <DealerBoardSection />
          </Suspense>
        </Section>
      ) : (
        <>
          <DailyCareBoard
            orgId={organization.id}
            machineHref={(machineId) => paths.organization.machine.href(organization.id, machineId)}
          />
          <DueBoard
            orgId={organization.id}
            filters={filters}
            onFiltersChange={changeFilters}
            machineHref={(machineId) => paths.organization.machine.href(organization.id, machineId)}
            emptyFleetLinks={
              membership.role === 'manager'
                ? {
                    addMachine: paths.organization.machineNew.href(organization.id),
                    importFleet: paths.organization.importFleet.href(organization.id),
                  }
                : undefined
            }
            logHoursHref={
              LOGS_HOURS.has(membership.role)
                ? (fleetNumber) => paths.organization.logHours.href(organization.id, fleetNumber)
                : undefined
            }
          />
        </>
      )}
    </>
  );
}
