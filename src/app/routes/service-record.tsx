import { useQuery, type QueryClient } from '@tanstack/react-query';
import { Link, useLocation, useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { NotFound } from '../../components/errors/route-error';
import { ErrorState } from '../../components/ui/error-state';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { PageSkeleton } from '../../components/ui/skeleton';
import { machineQueryOptions } from '../../features/machines/api/get-machine';
import { TagOutPanel } from '../../features/machines/components/tag-out-panel';
import { useSpecSheet } from '../../features/machines/api/get-spec-sheet';
import { OutOfSpecDefects } from '../../features/defects/components/out-of-spec-defects';
import {
  serviceRecordQueryOptions,
  useServiceRecord,
} from '../../features/services/api/get-service-record';
import type { TaskReset } from '../../features/services/api/types';
import { ServiceRecordView } from '../../features/services/components/service-record-view';
import { isApiError } from '../../lib/api-client';
import { formatLocalDate } from '../../lib/fleet-format';
import { loaderFarmId, WithFarmScope, type FarmScope } from '../farm-scope';
import { outOfSpecItems } from '../out-of-spec';

export const serviceRecordLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(
      serviceRecordQueryOptions(loaderFarmId(params), params.recordId ?? ''),
    );
    return null;
  };

/** The resets the service form passed along when it completed this record (history state). */
function resetsFrom(state: unknown): TaskReset[] | null {
  const resets = (state as { resets?: unknown } | null)?.resets;
  return Array.isArray(resets) ? (resets as TaskReset[]) : null;
}

/** A service record, for a farm's members or a dealer's advisor on a customer's machine. */
export function ServiceRecordPage() {
  return <WithFarmScope>{(scope) => <ServiceRecordScreen scope={scope} />}</WithFarmScope>;
}

function ServiceRecordScreen({ scope }: { scope: FarmScope }) {
  const { recordId = '' } = useParams();
  const location = useLocation();
  const orgId = scope.farm.id;
  const timeZone = scope.farm.timeZone;
  const record = useServiceRecord(orgId, recordId);
  // the machine's tag-out shows here too: closing its defects did not release it
  const machineId = record.data?.data.machine.id ?? '';
  const machine = useQuery({ ...machineQueryOptions(orgId, machineId), enabled: !!machineId });
  // a member who may report defects raises one in a tap from a measurement outside its spec
  const defectsHref = scope.defectsHref?.(machineId) ?? null;
  const mayRaise = defectsHref !== null && machine.data?.data.status !== 'sold';
  const sheet = useSpecSheet(orgId, machineId, mayRaise);

  if (record.isPending) return <PageSkeleton label="Loading the service record" />;
  if (record.isError) {
    if (isApiError(record.error) && record.error.status === 404)
      return <NotFound homeHref={scope.homeHref} inShell />;
    return (
      <ErrorState
        title="This service record didn't load"
        message={record.error.message}
        onRetry={() => record.refetch()}
        retrying={record.isRefetching}
      />
    );
  }

  const { data, abilities } = record.data;
  const date = data.performedOn ?? data.plannedFor;
  const kind = data.status === 'planned' ? 'Planned service' : 'Service';
  return (
    <>
      <Link
        to={scope.machineHref(data.machine.id)}
        className="mb-3 inline-flex min-h-touch items-center gap-1 font-bold text-field-700 hover:text-field-950"
      >
        <Icon name="back" />
        {data.machine.fleetNumber} · {data.machine.name}
      </Link>
      <PageHeader
        title={`${kind} · ${data.machine.fleetNumber}${date ? ` · ${formatLocalDate(date)}` : ''}`}
        description={data.tasks.map((t) => t.name).join(', ') || undefined}
      />
      {machine.data ? (
        <div className="mb-6">
          <TagOutPanel
            orgId={orgId}
            machine={machine.data.data}
            abilities={machine.data.abilities}
            timeZone={timeZone}
            defectsHref={scope.defectsHref?.(data.machine.id)}
          />
        </div>
      ) : null}
      {mayRaise && defectsHref && data.status === 'completed' ? (
        <div className="mb-6">
          <OutOfSpecDefects
            orgId={orgId}
            machineId={data.machine.id}
            items={outOfSpecItems(data, sheet.data?.data.testPressures ?? [])}
            defectsHref={defectsHref}
          />
        </div>
      ) : null}
      <ServiceRecordView
        orgId={orgId}
        record={data}
        abilities={abilities}
        resets={data.status === 'completed' ? resetsFrom(location.state) : null}
        timeZone={timeZone}
        completeHref={scope.serviceRecordNewHref(data.machine.id, { complete: data.id })}
        defectsHref={scope.defectsHref?.(data.machine.id) ?? null}
      />
    </>
  );
}
