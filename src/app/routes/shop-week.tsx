import type { QueryClient } from '@tanstack/react-query';
import { addDays, format, parseISO } from 'date-fns';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { buttonClasses } from '../../components/ui/button';
import { ErrorState } from '../../components/ui/error-state';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import { shopWeekQueryOptions, useShopWeek } from '../../features/services/api/get-shop-week';
import type { ShopLinks } from '../../features/services/components/shop-week-lines';
import { ShopWeekView } from '../../features/services/components/shop-week-view';
import { ShopOutlookSection } from '../../features/services/components/shop-outlook-section';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import { formatLocalDate } from '../../lib/fleet-format';
import { paths } from '../paths';

const startFrom = (search: URLSearchParams) => {
  const start = search.get('start');
  return start && /^\d{4}-\d{2}-\d{2}$/.test(start) ? start : null;
};

export const shopWeekLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const start = startFrom(new URL(request.url).searchParams);
    void queryClient.prefetchQuery(shopWeekQueryOptions(params.orgId ?? '', start));
    return null;
  };

/** Calendar arithmetic for the week buttons only; every figure on the page is the server's. */
const shiftWeek = (start: string, weeks: number) =>
  format(addDays(parseISO(start), weeks * 7), 'yyyy-MM-dd');

export function ShopWeekPage() {
  const { membership } = useCurrentMembership();
  const orgId = membership.organization.id;
  const [search] = useSearchParams();
  const start = startFrom(search);
  const week = useShopWeek(orgId, start);

  if (week.isError && isApiError(week.error) && week.error.status === 403)
    return (
      <ForbiddenState
        role={membership.role}
        pageName="The shop week"
        allowedRoles="technicians and managers"
      />
    );

  const links: ShopLinks = {
    machineHref: (machineId) => paths.organization.machine.href(orgId, machineId),
    recordHref: (recordId) => paths.organization.serviceRecord.href(orgId, recordId),
    planHref: (machineId, taskId, date) =>
      paths.organization.serviceRecordNew.href(orgId, machineId, {
        taskIds: [taskId],
        plan: true,
        on: date,
      }),
    recordServiceHref: (machineId, { planId, taskId }) =>
      paths.organization.serviceRecordNew.href(
        orgId,
        machineId,
        planId ? { complete: planId } : { taskIds: taskId ? [taskId] : [] },
      ),
  };
  const shown = week.data;
  const nav = 'inline-flex items-center gap-1';

  return (
    <>
      <PageHeader
        title="Shop week"
        description={
          shown
            ? `${formatLocalDate(shown.start)} – ${formatLocalDate(shown.end)}: booked visits, tasks falling due and the parts to pull.`
            : 'Booked visits, tasks falling due and the parts to pull, day by day.'
        }
      />
      <nav aria-label="Weeks" className="mb-6 flex flex-wrap gap-2">
        {shown ? (
          <>
            <Link
              to={paths.organization.shopWeek.href(orgId, shiftWeek(shown.start, -1))}
              className={buttonClasses('secondary', nav)}
            >
              <Icon name="back" />
              Previous week
            </Link>
            <Link
              to={paths.organization.shopWeek.href(orgId)}
              className={buttonClasses('secondary', nav)}
              aria-current={start === null ? 'page' : undefined}
            >
              This week
            </Link>
            <Link
              to={paths.organization.shopWeek.href(orgId, shiftWeek(shown.start, 1))}
              className={buttonClasses('secondary', nav)}
            >
              Next week
              <Icon name="back" className="size-5 rotate-180" />
            </Link>
          </>
        ) : null}
      </nav>
      {week.isPending ? (
        <ListSkeleton rows={5} label="Loading the shop week" />
      ) : week.isError ? (
        <ErrorState
          title="The shop week didn't load"
          message={week.error.message}
          onRetry={() => week.refetch()}
          retrying={week.isRefetching}
        />
      ) : (
        <div aria-busy={week.isPlaceholderData || undefined}>
          <ShopWeekView week={week.data} links={links} />
        </div>
      )}
      <div className="mt-10">
        <ShopOutlookSection
          orgId={orgId}
          links={{ machineHref: (machine) => links.machineHref(machine.id) }}
        />
      </div>
    </>
  );
}
