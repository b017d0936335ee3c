import { useMemo } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { DEALER_ACCESS_DESCRIPTIONS } from '../../../shared/schemas/dealers';
import { NotFound } from '../../components/errors/route-error';
import { Alert } from '../../components/ui/alert';
import { Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import { AccessBadge } from '../../features/dealers/components/access-badge';
import { machineQueryOptions, useMachine } from '../../features/machines/api/get-machine';
import { MachineStatusPanel } from '../../features/machines/components/machine-status-panel';
import { MeterSection } from '../../features/machines/components/meter-section';
import { SpecSheetSection } from '../../features/machines/components/spec-sheet-section';
import {
  machineReadingsQueryOptions,
  useMachineReadings,
} from '../../features/readings/api/get-machine-readings';
import { ReadingsSection } from '../../features/readings/components/readings-section';
import { tasksQueryOptions, useTasks } from '../../features/schedules/api/get-tasks';
import { DueSection } from '../../features/schedules/components/due-section';
import {
  serviceEventsQueryOptions,
  serviceHistoryQueryOptions,
} from '../../features/services/api/get-service-history';
import { ServiceActions, ServiceHistory } from '../../features/services/components/service-history';
import { isApiError } from '../../lib/api-client';
import { machineMetersQueryOptions, useMachineMeters } from '../../lib/meters';
import { WithFarmScope, type FarmScope } from '../farm-scope';

/** Starts the machine's reads with the page (the service history waits for the link's access). */
export const customerMachineLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const farmId = params.farmId ?? '';
    const machineId = params.machineId ?? '';
    void queryClient.prefetchQuery(machineQueryOptions(farmId, machineId));
    void queryClient.prefetchQuery(tasksQueryOptions(farmId, machineId));
    void queryClient.prefetchQuery(machineReadingsQueryOptions(farmId, machineId));
    void queryClient.prefetchQuery(machineMetersQueryOptions(farmId, machineId));
    return null;
  };

/**
 * A linked customer's machine as a dealer's advisor sees it: its status, due tasks, meter and
 * readings (any link), and with a `service` link its service history and the record and plan
 * forms. Nothing here edits the machine, its schedule, readings, defects or status: the API
 * refuses those to a dealer whatever the page shows.
 */
export function CustomerMachinePage() {
  return <WithFarmScope>{(scope) => <CustomerMachine scope={scope} />}</WithFarmScope>;
}

function CustomerMachine({ scope }: { scope: FarmScope }) {
  const { machineId = '' } = useParams();
  const { farm } = scope;
  const service = scope.dealerAccess === 'service';
  const machine = useMachine(farm.id, machineId);
  const tasks = useTasks(farm.id, machineId);
  const readings = useMachineReadings(farm.id, machineId);
  const meters = useMachineMeters(farm.id, machineId);
  // a view link does not reach the service history: not asked, rather than answered 404
  const history = useQuery({ ...serviceHistoryQueryOptions(farm.id, machineId), enabled: service });
  const events = useQuery({ ...serviceEventsQueryOptions(farm.id, machineId), enabled: service });
  const dues = useMemo(
    () =>
      (tasks.data?.data ?? []).flatMap((task) =>
        task.due?.dueMeter != null
          ? [{ taskName: task.name, dueMeter: task.due.dueMeter, meterId: task.meterId }]
          : [],
      ),
    [tasks.data],
  );

  if (machine.isPending) return <PageSkeleton label="Loading the machine" />;
  if (machine.isError) {
    if (isApiError(machine.error) && machine.error.status === 404)
      return <NotFound homeHref={scope.homeHref} inShell />;
    return (
      <ErrorState
        title="This machine didn't load"
        message={machine.error.message}
        onRetry={() => machine.refetch()}
        retrying={machine.isRefetching}
      />
    );
  }

  const { data: detail, abilities } = machine.data;
  const canRecord = service && (history.data?.abilities.create ?? false);
  const recordHref = (taskIds?: string[]) => scope.serviceRecordNewHref(detail.id, { taskIds });

  return (
    <>
      <Link
        to={scope.homeHref}
        className="mb-3 inline-flex min-h-touch items-center gap-1 font-bold text-field-700 hover:text-field-950"
      >
        <Icon name="back" />
        Coming due · {farm.name}
      </Link>
      <PageHeader
        title={`${detail.fleetNumber} · ${detail.name}`}
        description={[farm.name, detail.make, detail.model, detail.year]
          .filter(Boolean)
          .join(' · ')}
        actions={
          <ServiceActions
            canCreate={canRecord}
            recordHref={recordHref()}
            planHref={scope.serviceRecordNewHref(detail.id, { plan: true })}
          />
        }
      />
      <div className="flex flex-col gap-8">
        <Alert tone="info" title={`${farm.name} links you with`}>
          <p className="flex flex-wrap items-center gap-2">
            {scope.dealerAccess ? <AccessBadge access={scope.dealerAccess} /> : null}
            <span>{scope.dealerAccess ? DEALER_ACCESS_DESCRIPTIONS[scope.dealerAccess] : ''}</span>
          </p>
          {service ? null : (
            <p className="mt-1">
              Recording or planning a service needs service access, which the farm's manager gives
              on its Dealers page. A booking proposal from the board still reaches the farm.
            </p>
          )}
        </Alert>

        <MachineStatusPanel
          orgId={farm.id}
          machine={detail}
          abilities={abilities}
          timeZone={farm.timeZone}
        />

        <Section
          title="Due"
          description="Each task's next due point: the meter value, the calendar date and when the meter is projected to get there."
        >
          <DueSection
            orgId={farm.id}
            machine={{ id: detail.id, category: detail.category, meterUnit: detail.meterUnit }}
            timeZone={farm.timeZone}
            recordServiceHref={canRecord ? (taskId) => recordHref([taskId]) : undefined}
          />
        </Section>

        {service ? (
          <Section
            title="Service history"
            description="Visits done and booked, newest first. Open one for its parts, measurements and files."
          >
            <ServiceHistory
              orgId={farm.id}
              machineId={detail.id}
              recordHref={(recordId) => scope.serviceRecordHref(recordId)}
            />
          </Section>
        ) : null}

        <Section
          title="Meters"
          description="Each of the machine's meters: its lifetime count over time and the trend ahead."
        >
          <MeterSection
            orgId={farm.id}
            readings={readings}
            meters={meters.data?.data}
            machine={detail}
            dues={dues}
            services={events.data}
            timeZone={farm.timeZone}
          />
        </Section>

        <Section title="Readings">
          <ReadingsSection
            orgId={farm.id}
            machine={detail}
            abilities={abilities}
            units={farm.units}
            timeZone={farm.timeZone}
          />
        </Section>

        <Section
          title="Spec sheet"
          description="The farm's figures for this machine: capacities, fluids, filter numbers, tyre pressures, torques and test pressures."
        >
          <SpecSheetSection orgId={farm.id} machineId={detail.id} units={farm.units} />
        </Section>
      </div>
    </>
  );
}
