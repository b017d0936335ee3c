import type { QueryClient } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { OutboxPanel } from '../../components/outbox/outbox-panel';
import { buttonClasses } from '../../components/ui/button';
import { EmptyState } from '../../components/ui/empty-state';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import {
  latestReadingsQueryOptions,
  useLatestReadings,
} from '../../features/readings/api/get-latest-readings';
import { LogHoursForm } from '../../features/readings/components/log-hours-form';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const logHoursLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    const membership = me ? findMembership(me, orgId) : undefined;
    if (membership && membership.role !== 'advisor')
      void queryClient.prefetchQuery(latestReadingsQueryOptions(orgId));
    return null;
  };

export function LogHoursPage() {
  const { me, membership } = useCurrentMembership();
  const { organization, role } = membership;
  const [search] = useSearchParams();
  const canLog = role !== 'advisor';
  const latest = useLatestReadings(organization.id, { enabled: canLog });
  const canImport = role === 'manager' || role === 'technician';

  if (!canLog) {
    return (
      <ForbiddenState
        role={role}
        pageName="Logging hours"
        allowedRoles="the managers, technicians and operators of a farm"
      />
    );
  }

  return (
    <>
      <PageHeader
        title="Log hours"
        description="Type each machine's hour meter as it reads now. Only the rows you fill in are saved."
        actions={
          canImport ? (
            <Link
              to={paths.organization.importReadings.href(organization.id)}
              className={buttonClasses('secondary')}
            >
              Import a CSV file
            </Link>
          ) : null
        }
      />
      <OutboxPanel orgId={organization.id} userId={me.user.id} timeZone={organization.timeZone} />
      {latest.isPending ? (
        <ListSkeleton rows={6} label="Loading machines" />
      ) : latest.isError ? (
        <ErrorState
          title="The machines didn't load"
          message={latest.error.message}
          onRetry={() => latest.refetch()}
          retrying={latest.isRefetching}
        />
      ) : latest.data.length === 0 ? (
        <EmptyState icon="clock" title="No machines to log hours for">
          <p>
            {role === 'operator'
              ? 'No machines are assigned to you yet. A manager can assign them on the machine page.'
              : 'Machines appear here once they are added to the fleet.'}
          </p>
        </EmptyState>
      ) : (
        <LogHoursForm
          orgId={organization.id}
          timeZone={organization.timeZone}
          units={organization.units}
          items={latest.data}
          initialFind={search.get('find') ?? ''}
        />
      )}
    </>
  );
}
