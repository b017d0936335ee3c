import { useMemo } from 'react';
import type { QueryClient } from '@tanstack/react-query';
import { Link, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotFound } from '../../components/errors/route-error';
import { Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import {
  HITCH_IMPLEMENT_CATEGORIES,
  HITCH_TRACTOR_CATEGORIES,
} from '../../../shared/schemas/hitch';
import { HitchSection } from '../../features/hitch/components/hitch-section';
import { machineQueryOptions, useMachine } from '../../features/machines/api/get-machine';
import { useMachines } from '../../features/machines/api/get-machines';
import { MachineLinks, MachinePageNav } from './machine-links';
import { MachineDetails } from '../../features/machines/components/machine-details';
import { MachineStatusPanel } from '../../features/machines/components/machine-status-panel';
import { MeterSection } from '../../features/machines/components/meter-section';
import { MetersPanel } from '../../features/machines/components/meters-panel';
import { SpecSheetSection } from '../../features/machines/components/spec-sheet-section';
import {
  machineReadingsQueryOptions,
  useMachineReadings,
} from '../../features/readings/api/get-machine-readings';
import { MeterReplacementForm } from '../../features/readings/components/meter-replacement-form';
import { ReadingsSection } from '../../features/readings/components/readings-section';
import { tasksQueryOptions, useTasks } from '../../features/schedules/api/get-tasks';
import { DueSection } from '../../features/schedules/components/due-section';
import {
  serviceEventsQueryOptions,
  serviceHistoryQueryOptions,
  useCanRecordService,
  useServiceEvents,
} from '../../features/services/api/get-service-history';
import { MeasurementsSection } from '../../features/services/components/measurements-section';
import { ServiceActions, ServiceHistory } from '../../features/services/components/service-history';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import { machineMetersQueryOptions, meterName, useMachineMeters } from '../../lib/meters';
import { paths } from '../paths';

export const machineLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const machineId = params.machineId ?? '';
    // start them all at once; the page shows each part as it arrives
    void queryClient.prefetchQuery(machineQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(tasksQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(machineReadingsQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(machineMetersQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(serviceHistoryQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(serviceEventsQueryOptions(orgId, machineId));
    return null;
  };

const HITCH_CATEGORIES: string[] = [...HITCH_TRACTOR_CATEGORIES, ...HITCH_IMPLEMENT_CATEGORIES];
const TRACTOR_FILTERS = {
  category: 'tractor',
  status: 'in_service',
  sort: 'fleetNumber',
  order: 'asc',
  page: 1,
  pageSize: 200,
} as const;

export function MachinePage() {
  const { machineId = '' } = useParams();
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const orgId = organization.id;
  const timeZone = organization.timeZone;
  const machine = useMachine(orgId, machineId);
  const tasks = useTasks(orgId, machineId);
  const readings = useMachineReadings(orgId, machineId);
  const meters = useMachineMeters(orgId, machineId);
  const dues = useMemo(
    () =>
      (tasks.data?.data ?? []).flatMap((task) =>
        task.due?.dueMeter != null
          ? [{ taskName: task.name, dueMeter: task.due.dueMeter, meterId: task.meterId }]
          : [],
      ),
    [tasks.data],
  );
  const fleetHref = paths.organization.machines.href(orgId);
  const canRecordService = useCanRecordService(orgId, machineId);
  const serviceEvents = useServiceEvents(orgId, machineId);
  const isShop = membership.role === 'manager' || membership.role === 'technician';
  // the tractors an implement may be hitched to (the hitch log)
  const tractors = useMachines(orgId, TRACTOR_FILTERS);

  if (machine.isPending) return <PageSkeleton label="Loading the machine" />;
  if (machine.isError) {
    if (isApiError(machine.error) && machine.error.status === 404)
      return <NotFound homeHref={fleetHref} inShell />;
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
  const hitched = HITCH_CATEGORIES.includes(detail.category);
  const org = paths.organization;
  const defectsHref = org.defects.href(orgId, detail.id);
  const recordHref = (taskIds?: string[]) =>
    org.serviceRecordNew.href(orgId, detail.id, { taskIds });

  return (
    <>
      <Link
        to={fleetHref}
        className="mb-3 inline-flex min-h-touch items-center gap-1 font-bold text-field-700 hover:text-field-950"
      >
        <Icon name="back" />
        Fleet
      </Link>
      <PageHeader
        title={`${detail.fleetNumber} · ${detail.name}`}
        description={
          [detail.make, detail.model, detail.year].filter(Boolean).join(' · ') || undefined
        }
        actions={
          <ServiceActions
            canCreate={canRecordService}
            recordHref={recordHref()}
            planHref={org.serviceRecordNew.href(orgId, detail.id, { plan: true })}
          />
        }
      />
      <div className="flex flex-col gap-8">
        <MachineStatusPanel
          orgId={orgId}
          machine={detail}
          abilities={abilities}
          timeZone={timeZone}
          defectsHref={membership.organization.kind === 'farm' ? defectsHref : undefined}
        />

        <MachineLinks orgId={orgId} machine={detail} isShop={isShop} defectsHref={defectsHref} />
        <MachinePageNav hitched={hitched} />

        <div id="due" className="scroll-mt-20">
          <Section
            title="Due"
            description="Each task's next due point: the meter value, the calendar date and when the meter is projected to get there."
          >
            <DueSection
              orgId={orgId}
              machine={{
                id: detail.id,
                category: detail.category,
                meterUnit: detail.meterUnit,
                machineClass: detail.machineClass,
                lastReading: detail.lastReading,
              }}
              timeZone={timeZone}
              recordServiceHref={canRecordService ? (taskId) => recordHref([taskId]) : undefined}
            />
          </Section>
        </div>

        {hitched ? (
          <div id="hitch" className="scroll-mt-20">
            <Section
              title="Hitch log"
              description="Which tractor pulled which implement, from when to when. An implement without a meter of its own counts the tractor's hours while it is on."
            >
              <HitchSection
                orgId={orgId}
                machine={detail}
                tractors={(tractors.data?.data ?? []).filter((t) => t.id !== detail.id)}
                timeZone={timeZone}
              />
            </Section>
          </div>
        ) : null}

        <div id="history" className="scroll-mt-20">
          <Section
            title="Service history"
            description="Visits done and booked, newest first. Open one for its parts, measurements and files."
          >
            <ServiceHistory
              orgId={orgId}
              machineId={detail.id}
              recordHref={(recordId) => org.serviceRecord.href(orgId, recordId)}
            />
          </Section>
        </div>

        <div id="meter" className="scroll-mt-20">
          <Section
            title="Meters"
            description="The machine's meters, and each one's lifetime count over time with the trend ahead."
          >
            <MetersPanel
              orgId={orgId}
              machineId={detail.id}
              replacementForm={
                abilities.replaceMeter
                  ? (meter, done) => (
                      <MeterReplacementForm
                        orgId={orgId}
                        machineId={detail.id}
                        meterId={meter.id}
                        meterLabel={meterName(meter)}
                        unit={meter.unit}
                        units={organization.units}
                        timeZone={timeZone}
                        onDone={done}
                      />
                    )
                  : undefined
              }
            />
            <MeterSection
              orgId={orgId}
              readings={readings}
              meters={meters.data?.data}
              machine={detail}
              dues={dues}
              services={serviceEvents.data}
              timeZone={timeZone}
            />
          </Section>
        </div>

        <div id="measurements" className="scroll-mt-20">
          <Section
            title="Measurements"
            description="A reading taken at each service visit, against the manual's limits."
          >
            <MeasurementsSection orgId={orgId} machineId={detail.id} meterUnit={detail.meterUnit} />
          </Section>
        </div>

        <div id="spec" className="scroll-mt-20">
          <Section
            title="Spec sheet"
            description="Capacities, fluids, filter numbers, tyre pressures, torques and test pressures, as copied from the operator's manual."
          >
            <SpecSheetSection orgId={orgId} machineId={detail.id} units={organization.units} />
          </Section>
        </div>

        <div id="readings" className="scroll-mt-20">
          <Section title="Readings">
            <ReadingsSection
              orgId={orgId}
              machine={detail}
              abilities={abilities}
              units={organization.units}
              timeZone={timeZone}
            />
          </Section>
        </div>

        <div id="details" className="scroll-mt-20">
          <Section title="Details">
            <MachineDetails orgId={orgId} machine={detail} abilities={abilities} />
          </Section>
        </div>
      </div>
    </>
  );
}
