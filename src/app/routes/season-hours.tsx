import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { ChoiceChips } from '../../components/ui/choice-chips';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import {
  seasonHoursQueryOptions,
  useSeasonHours,
} from '../../features/season-hours/api/get-season-hours';
import { SeasonHoursList } from '../../features/season-hours/components/season-hours-list';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import { formatLocalDate, todayInZone } from '../../lib/fleet-format';
import { paths } from '../paths';

const yearFrom = (search: URLSearchParams): number | null => {
  const year = search.get('year');
  return year && /^\d{4}$/.test(year) ? Number(year) : null;
};

export const seasonHoursLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    // without ?year the page shows the farm's current year; the reader's clock names the same
    // year except around New Year in another time zone, when this read-ahead is simply unused
    const year = yearFrom(new URL(request.url).searchParams) ?? new Date().getFullYear();
    void queryClient.prefetchQuery(seasonHoursQueryOptions(params.orgId ?? '', year));
    return null;
  };

export function SeasonHoursPage() {
  const { membership } = useCurrentMembership();
  const { id: orgId, timeZone } = membership.organization;
  const [search, setSearch] = useSearchParams();
  const thisYear = Number(todayInZone(timeZone).slice(0, 4));
  const year = yearFrom(search) ?? thisYear;
  const hours = useSeasonHours(orgId, year);

  if (hours.isError && isApiError(hours.error) && hours.error.status === 403)
    return (
      <ForbiddenState
        role={membership.role}
        pageName="Season hours"
        allowedRoles="the farm's managers, technicians and operators"
      />
    );

  const years = [
    { value: String(thisYear - 1), label: `${thisYear - 1} (last year)` },
    { value: String(thisYear), label: `${thisYear} (this year)` },
    { value: String(thisYear + 1), label: `${thisYear + 1} (next year)` },
  ];
  const chooseYear = (value: string) =>
    setSearch(Number(value) === thisYear ? {} : { year: value }, { replace: true });

  return (
    <>
      <PageHeader
        title="Season hours"
        description={
          <>
            <p>
              Each machine&apos;s use in its season so far, beside last season&apos;s to the same
              date and in full, in the units of its meter. A machine without season months counts
              the whole year.
            </p>
            <p className="mt-1">
              A plan for a season feeds the machine&apos;s forecast: its due dates are worked out
              from the plan until the season&apos;s own readings show its pace.
            </p>
          </>
        }
      />
      <ChoiceChips
        legend="Season"
        options={years}
        value={String(year)}
        onChange={chooseYear}
        className="mb-4"
      />
      {hours.isPending ? (
        <ListSkeleton rows={4} label="Loading season hours" />
      ) : hours.isError ? (
        <ErrorState
          title="Season hours didn't load"
          message={hours.error.message}
          onRetry={() => hours.refetch()}
          retrying={hours.isRefetching}
        />
      ) : (
        <>
          <p className="mb-4 text-sm text-field-600">
            Figures to {formatLocalDate(hours.data.meta.asOf)}.
          </p>
          <SeasonHoursList
            orgId={orgId}
            rows={hours.data.data}
            year={year}
            asOf={hours.data.meta.asOf}
            canPlan={membership.role === 'manager'}
            machineHref={(machineId) => paths.organization.machine.href(orgId, machineId)}
          />
        </>
      )}
    </>
  );
}
