import { useMemo } from 'react';
import { useQuery, type QueryClient } from '@tanstack/react-query';
import {
  Link,
  useNavigate,
  useParams,
  useSearchParams,
  type LoaderFunctionArgs,
} from 'react-router-dom';
import { NotFound } from '../../components/errors/route-error';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Alert } from '../../components/ui/alert';
import { ErrorState } from '../../components/ui/error-state';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import { machineQueryOptions, useMachine } from '../../features/machines/api/get-machine';
import { useSpecSheet } from '../../features/machines/api/get-spec-sheet';
import { tasksQueryOptions, useTasks } from '../../features/schedules/api/get-tasks';
import {
  activeDefectsQueryOptions,
  useActiveDefects,
} from '../../features/services/api/get-active-defects';
import { prefillQueryOptions } from '../../features/services/api/get-prefill';
import {
  serviceHistoryQueryOptions,
  useServiceHistory,
} from '../../features/services/api/get-service-history';
import {
  serviceRecordQueryOptions,
  useServiceRecord,
} from '../../features/services/api/get-service-record';
import { shopPeopleQueryOptions, useShopPeople } from '../../features/services/api/get-shop-people';
import type { Prefill, TaskChoice } from '../../features/services/api/types';
import { ServiceRecordForm } from '../../features/services/components/service-record-form';
import {
  completeDefaults,
  newRecordDefaults,
  type ServiceFormMode,
} from '../../features/services/lib/form-values';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import { formatLocalDate, todayInZone } from '../../lib/fleet-format';
import { loaderFarmId, WithFarmScope, type FarmScope } from '../farm-scope';

const EMPTY_PREFILL: Prefill = {
  tasks: [],
  estimatedLabourHours: 0,
  parts: [],
  fluids: [],
  plannedVisits: [],
};

function readSearch(search: URLSearchParams) {
  const complete = search.get('complete');
  const mode: ServiceFormMode = complete
    ? 'complete'
    : search.get('plan') === '1'
      ? 'plan'
      : 'record';
  const taskIds = (search.get('taskIds') ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  const on = search.get('on');
  return { mode, complete, taskIds, on: on && /^\d{4}-\d{2}-\d{2}$/.test(on) ? on : null };
}

export const serviceRecordNewLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const orgId = loaderFarmId(params);
    const machineId = params.machineId ?? '';
    const { complete, taskIds } = readSearch(new URL(request.url).searchParams);
    // everything at once; the page waits for the lot because the form starts from all of it
    void queryClient.prefetchQuery(machineQueryOptions(orgId, machineId));
    void queryClient.prefetchQuery(tasksQueryOptions(orgId, machineId));
    if (!params.farmId) {
      // the farm's team and defects are its own: a dealer's advisor is sent neither
      void queryClient.prefetchQuery(shopPeopleQueryOptions(orgId));
      void queryClient.prefetchQuery(activeDefectsQueryOptions(orgId, machineId));
    }
    void queryClient.prefetchQuery(serviceHistoryQueryOptions(orgId, machineId));
    if (complete) void queryClient.prefetchQuery(serviceRecordQueryOptions(orgId, complete));
    else if (taskIds.length)
      void queryClient.prefetchQuery(prefillQueryOptions(orgId, machineId, taskIds));
    return null;
  };

const TITLES: Record<ServiceFormMode, string> = {
  record: 'Record service',
  plan: 'Plan a service',
  complete: 'Complete service',
};

/** The service form for a farm's members, or for a dealer's advisor on a customer's machine. */
export function ServiceRecordNewPage() {
  return <WithFarmScope>{(scope) => <ServiceRecordNewScreen scope={scope} />}</WithFarmScope>;
}

function ServiceRecordNewScreen({ scope }: { scope: FarmScope }) {
  const { machineId = '' } = useParams();
  const [search] = useSearchParams();
  const navigate = useNavigate();
  const { me } = useCurrentMembership();
  const orgId = scope.farm.id;
  const timeZone = scope.farm.timeZone;
  const member = scope.dealerAccess === null;
  const { mode, complete, taskIds: wanted, on } = readSearch(search);

  const machine = useMachine(orgId, machineId);
  const tasks = useTasks(orgId, machineId);
  // an advisor names no technicians (the farm's team is its own) and never closes defects
  const people = useShopPeople(orgId, member);
  const defects = useActiveDefects(orgId, machineId, member);
  const history = useServiceHistory(orgId, machineId, { q: '', page: 1 });
  // its test pressures give measurements their spec; the form does not wait for it
  const sheet = useSpecSheet(orgId, machineId);
  const record = useServiceRecord(orgId, complete ?? '');
  const known = useMemo(() => {
    const ids = new Set((tasks.data?.data ?? []).map((t) => t.id));
    return wanted.filter((id) => ids.has(id));
  }, [tasks.data, wanted]);
  const prefill = useQuery({
    ...prefillQueryOptions(orgId, machineId, known),
    enabled: mode !== 'complete' && known.length > 0 && tasks.isSuccess,
  });

  const machineHref = scope.machineHref(machineId);
  const queries = [
    machine,
    tasks,
    ...(member ? [people, defects] : []),
    history,
    ...(complete ? [record] : []),
  ];
  const failed = queries.find((query) => query.isError);
  if (failed?.error) {
    if (isApiError(failed.error) && failed.error.status === 404)
      return <NotFound homeHref={scope.homeHref} inShell />;
    return (
      <ErrorState
        title="The service form didn't load"
        message={failed.error.message}
        onRetry={() => queries.forEach((query) => query.isError && query.refetch())}
      />
    );
  }
  if (
    !machine.data ||
    !tasks.data ||
    (member && (!people.data || !defects.data)) ||
    !history.data ||
    (complete && !record.data) ||
    (known.length > 0 && mode !== 'complete' && !prefill.data && !prefill.isError)
  )
    return <PageSkeleton label="Loading the service form" />;

  const detail = machine.data.data;
  const title = `${TITLES[mode]} · ${detail.fleetNumber}`;
  if (!history.data.abilities.create)
    return detail.status === 'sold' ? (
      <Alert tone="info" title={`${detail.fleetNumber} is sold`}>
        A sold machine takes no new services. Its history stays on its page.
      </Alert>
    ) : (
      <ForbiddenState
        role={scope.role}
        pageName="Recording a service"
        allowedRoles="technicians and managers, and dealers with service access"
      />
    );
  if (mode === 'complete' && record.data && !record.data.abilities.complete)
    return (
      <Alert tone="info" title="This record is not a plan any more">
        It is {record.data.data.status}.{' '}
        <Link className="font-bold underline" to={scope.serviceRecordHref(record.data.data.id)}>
          Open the record
        </Link>
      </Alert>
    );

  const today = todayInZone(timeZone);
  const taskChoices: TaskChoice[] = tasks.data.data.map((t) => ({
    id: t.id,
    name: t.name,
    hazards: t.hazards,
    safetyNotes: t.safetyNotes,
    labourHours: t.labourHours,
    dueStatus: t.due?.status ?? null,
  }));
  const self = people.data?.find((p) => p.userId === me.user.id);
  const initialPrefill = record.data
    ? {
        parts: record.data.data.parts,
        fluids: record.data.data.fluids,
        estimatedLabourHours: record.data.data.estimatedLabourHours,
        plannedVisits: [],
      }
    : (prefill.data ?? EMPTY_PREFILL);
  const defaultValues = record.data
    ? completeDefaults(record.data.data, {
        today,
        activeDefectIds: (defects.data ?? []).map((d) => d.id),
      })
    : newRecordDefaults(mode === 'plan' ? 'plan' : 'record', {
        today,
        plannedFor: on,
        taskIds: known,
        prefill: prefill.data ?? EMPTY_PREFILL,
        technicianIds: self ? [self.userId] : [],
      });

  return (
    <>
      <Link
        to={machineHref}
        className="mb-3 inline-flex min-h-touch items-center gap-1 font-bold text-field-700 hover:text-field-950"
      >
        <Icon name="back" />
        {detail.fleetNumber} · {detail.name}
      </Link>
      <PageHeader
        title={title}
        description={
          mode === 'plan'
            ? 'Book a visit for a date with the tasks it will cover; the parts to pull follow from them.'
            : mode === 'complete'
              ? `Booked for ${record.data?.data.plannedFor ? formatLocalDate(record.data.data.plannedFor) : '—'}. Enter what was done; completing resets the tasks from this visit.`
              : 'What was done on this visit. Completing it logs the meter, resets the tasks ticked and closes the defects ticked, all at once.'
        }
      />
      {detail.status === 'tagged_out' ? (
        <Alert tone="warning" title={`${detail.fleetNumber} is tagged out`} className="mb-6">
          Record the repair here and tick the defects it fixes. Closing them does not release the
          machine: it stays tagged out until a technician or manager returns it to service, with a
          note of what was checked, from the saved record or the machine page.
        </Alert>
      ) : null}
      {prefill.isError ? (
        <Alert tone="warning" className="mb-6">
          The parts lists of the chosen tasks didn't load; add the parts by hand.
        </Alert>
      ) : null}
      <ServiceRecordForm
        key={`${mode}|${complete ?? ''}|${known.join(',')}`}
        orgId={orgId}
        mode={mode}
        machine={{
          id: detail.id,
          fleetNumber: detail.fleetNumber,
          meterUnit: detail.meterUnit,
          lastReading: detail.lastReading,
        }}
        tasks={taskChoices}
        people={member ? (people.data ?? []) : []}
        defects={member ? (defects.data ?? []) : null}
        defaultValues={defaultValues}
        initialPrefill={initialPrefill}
        recordId={complete ?? undefined}
        today={today}
        timeZone={timeZone}
        currency={scope.farm.currency}
        units={scope.farm.units}
        cancelHref={complete ? scope.serviceRecordHref(complete) : machineHref}
        sheetTests={sheet.data?.data.testPressures}
        onSaved={(result) =>
          navigate(scope.serviceRecordHref(result.data.id), {
            state: result.data.status === 'completed' ? { resets: result.resets } : null,
          })
        }
      />
    </>
  );
}
