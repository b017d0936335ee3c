import type { QueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { boardQueryOptions } from '../../features/dealers/api/get-board';
import type { BoardFilters } from '../../features/dealers/api/types';
import { CustomerOutlookSection } from '../../features/dealers/components/customer-outlook-section';
import { DealerBoard } from '../../features/dealers/components/dealer-board';
import { readBoardFilters, writeBoardFilters } from '../../features/dealers/filters';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

/** Starts loading the board with the page (dealer organizations only). */
export const dealerBoardLoader =
  (queryClient: QueryClient) =>
  async ({ request, params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (me && findMembership(me, orgId)?.organization.kind === 'dealer')
      void queryClient.prefetchQuery(
        boardQueryOptions(orgId, readBoardFilters(new URL(request.url).searchParams)),
      );
    return null;
  };

/** The board with its filters in the URL; used by this page and the dealer's dashboard. */
export function DealerBoardSection() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const [search, setSearch] = useSearchParams();
  const filters = readBoardFilters(search);
  const onChange = useCallback(
    (change: Partial<Omit<BoardFilters, 'pageSize'>>) =>
      setSearch((prev) => writeBoardFilters({ ...readBoardFilters(prev), page: 1, ...change }), {
        preventScrollReset: true,
      }),
    [setSearch],
  );
  return (
    <DealerBoard
      orgId={organization.id}
      timeZone={organization.timeZone}
      filters={filters}
      onFiltersChange={onChange}
      customersHref={paths.organization.customers.href(organization.id)}
      machineHref={(row) =>
        paths.organization.customerMachine.href(organization.id, row.customer.id, row.machine.id)
      }
    />
  );
}

export function DealerBoardPage() {
  const { membership } = useCurrentMembership();
  if (membership.organization.kind !== 'dealer')
    return (
      <ForbiddenState
        role={membership.role}
        pageName="The board"
        allowedRoles="dealers' service advisors"
      />
    );
  return (
    <>
      <PageHeader
        title="Coming due"
        description="Services coming due across your customers, by the date each falls due."
      />
      <DealerBoardSection />
      <div className="mt-10">
        <CustomerOutlookSection
          orgId={membership.organization.id}
          links={{
            machineHref: (machine, customer) =>
              customer
                ? paths.organization.customerMachine.href(
                    membership.organization.id,
                    customer.id,
                    machine.id,
                  )
                : null,
          }}
        />
      </div>
    </>
  );
}
