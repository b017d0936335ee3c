import type { QueryClient } from '@tanstack/react-query';
import { Link, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Card, Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import { useBookings } from '../../features/dealers/api/get-bookings';
import {
  farmDealersQueryOptions,
  useFarmDealers,
} from '../../features/dealers/api/get-farm-dealers';
import { BookingList } from '../../features/dealers/components/booking-list';
import { DealerActivity } from '../../features/dealers/components/dealer-activity';
import { FarmDealerList } from '../../features/dealers/components/farm-dealer-list';
import { GrantDealerForm } from '../../features/dealers/components/grant-dealer-form';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const farmDealersLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(farmDealersQueryOptions(params.orgId ?? '')).catch(() => null);
    return null;
  };

/** The farm manager's page: who has access, proposals to answer, what dealers did. */
export function FarmDealersPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const links = useFarmDealers(organization.id);
  const bookings = useBookings(organization.id);
  if (
    organization.kind !== 'farm' ||
    (links.isError && isApiError(links.error) && links.error.status === 403)
  )
    return <ForbiddenState role={membership.role} pageName="The dealers page" />;
  const proposals = (bookings.data?.data ?? []).filter((b) => b.status === 'proposed');
  return (
    <>
      <PageHeader
        title="Dealers"
        description="The dealers who may see your machines, what they may do, and what they did."
      />
      <div className="flex flex-col gap-8">
        {proposals.length > 0 ? (
          <Section
            title="Booking proposals"
            actions={
              <Link
                className="font-bold text-field-800 underline"
                to={paths.organization.bookings.href(organization.id)}
              >
                All bookings
              </Link>
            }
          >
            <BookingList orgId={organization.id} bookings={proposals} side="farm" emptyText="" />
          </Section>
        ) : null}
        <Section title="Dealers with access">
          {links.isPending ? (
            <ListSkeleton rows={2} label="Loading dealers" />
          ) : links.isError ? (
            <ErrorState
              title="The dealers didn't load"
              message={links.error.message}
              onRetry={() => links.refetch()}
              retrying={links.isRefetching}
            />
          ) : (
            <FarmDealerList
              orgId={organization.id}
              links={links.data.data}
              timeZone={organization.timeZone}
            />
          )}
        </Section>
        <Section
          title="Give a dealer access"
          description="By the e-mail of one of its service advisors. Access starts at once."
        >
          <Card>
            <GrantDealerForm orgId={organization.id} />
          </Card>
        </Section>
        <Section
          title="Dealer activity"
          description="Every look and action of a dealer at your farm."
        >
          <DealerActivity orgId={organization.id} timeZone={organization.timeZone} />
        </Section>
      </div>
    </>
  );
}
