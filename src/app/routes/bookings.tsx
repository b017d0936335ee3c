import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import { bookingsQueryOptions, useBookings } from '../../features/dealers/api/get-bookings';
import { BookingList } from '../../features/dealers/components/booking-list';
import { isApiError } from '../../lib/api-client';
import { useCurrentMembership } from '../../lib/auth';

export const bookingsLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(bookingsQueryOptions(params.orgId ?? '')).catch(() => null);
    return null;
  };

/** Both sides' bookings: the dealer's proposals and their answers; the farm's to accept or decline. */
export function BookingsPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const bookings = useBookings(organization.id);
  const side = organization.kind === 'dealer' ? 'dealer' : 'farm';
  if (bookings.isError && isApiError(bookings.error) && bookings.error.status === 403)
    return (
      <ForbiddenState
        role={membership.role}
        pageName="Bookings"
        allowedRoles="managers and technicians"
      />
    );
  const all = bookings.data?.data ?? [];
  const open = all.filter((b) => b.status === 'proposed');
  const answered = all.filter((b) => b.status !== 'proposed');
  return (
    <>
      <PageHeader
        title="Bookings"
        description={
          side === 'dealer'
            ? 'Service dates you proposed to customers, and their answers. Propose one from the board.'
            : 'Service dates your dealers propose. An accepted booking is planned in your shop week.'
        }
      />
      {bookings.isPending ? (
        <ListSkeleton rows={3} label="Loading bookings" />
      ) : bookings.isError ? (
        <ErrorState
          title="The bookings didn't load"
          message={bookings.error.message}
          onRetry={() => bookings.refetch()}
          retrying={bookings.isRefetching}
        />
      ) : (
        <div className="flex flex-col gap-8">
          <Section title={side === 'dealer' ? 'Waiting for the farm' : 'Waiting for your answer'}>
            <BookingList
              orgId={organization.id}
              bookings={open}
              side={side}
              emptyText={
                side === 'dealer' ? 'No proposal is waiting.' : 'No proposal needs an answer.'
              }
            />
          </Section>
          <Section title="Answered">
            <BookingList
              orgId={organization.id}
              bookings={answered}
              side={side}
              emptyText="Nothing answered yet."
            />
          </Section>
        </div>
      )}
    </>
  );
}
