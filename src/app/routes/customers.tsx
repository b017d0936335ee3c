import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { Card, Section } from '../../components/ui/card';
import { ErrorState } from '../../components/ui/error-state';
import { PageHeader } from '../../components/ui/page-header';
import { ListSkeleton } from '../../components/ui/skeleton';
import { customersQueryOptions, useCustomers } from '../../features/dealers/api/get-customers';
import { CustomerList } from '../../features/dealers/components/customer-list';
import { InviteCustomerForm } from '../../features/dealers/components/invite-customer-form';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const customersLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    void queryClient.prefetchQuery(customersQueryOptions(params.orgId ?? '')).catch(() => null);
    return null;
  };

export function CustomersPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const isDealer = organization.kind === 'dealer';
  const customers = useCustomers(isDealer ? organization.id : '');
  if (!isDealer)
    return (
      <ForbiddenState
        role={membership.role}
        pageName="The customers page"
        allowedRoles="dealers' service advisors"
      />
    );
  return (
    <>
      <PageHeader
        title="Customers"
        description={`The farms that share their machines with ${organization.name}.`}
      />
      <div className="flex flex-col gap-8">
        <Section title="Linked farms">
          {customers.isPending ? (
            <ListSkeleton rows={3} label="Loading customers" />
          ) : customers.isError ? (
            <ErrorState
              title="The customers didn't load"
              message={customers.error.message}
              onRetry={() => customers.refetch()}
              retrying={customers.isRefetching}
            />
          ) : (
            <CustomerList
              orgId={organization.id}
              customers={customers.data.data}
              timeZone={organization.timeZone}
              boardHref={(customerId) =>
                paths.organization.dealerBoard.href(organization.id, customerId)
              }
            />
          )}
        </Section>
        <Section
          title="Ask a farm for access"
          description="The farm's manager gets an e-mail with a link, and chooses view or service access."
        >
          <Card>
            <InviteCustomerForm orgId={organization.id} />
          </Card>
        </Section>
      </div>
    </>
  );
}
