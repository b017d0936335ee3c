import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { defectsQueryOptions } from '../../features/defects/api/get-defects';
import { DefectsView } from '../../features/defects/components/defects-view';
import { filtersFromSearch, searchFromFilters } from '../../features/defects/lib/filters';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const defectsLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    const membership = me ? findMembership(me, orgId) : undefined;
    if (membership && membership.role !== 'advisor') {
      const filters = filtersFromSearch(new URL(request.url).searchParams);
      void queryClient.prefetchQuery(defectsQueryOptions(orgId, filters));
    }
    return null;
  };

export function DefectsPage() {
  const { membership } = useCurrentMembership();
  const { organization, role } = membership;
  const [search, setSearch] = useSearchParams();

  if (role === 'advisor') {
    return (
      <ForbiddenState
        role={role}
        pageName="The defect list"
        allowedRoles="the managers, technicians and operators of a farm"
      />
    );
  }

  const shop = role === 'manager' || role === 'technician';
  return (
    <>
      <PageHeader
        title="Defects"
        description={
          shop
            ? 'What walkarounds and reports found, worst first. Assign, repair and close them here.'
            : 'What is wrong with the machines you use, worst first. Report anything you find.'
        }
      />
      <DefectsView
        orgId={organization.id}
        timeZone={organization.timeZone}
        shop={shop}
        filters={filtersFromSearch(search)}
        onFiltersChange={(next) => setSearch(searchFromFilters(next), { replace: true })}
        machineHref={(machineId) => paths.organization.machine.href(organization.id, machineId)}
        recordHref={(recordId) => paths.organization.serviceRecord.href(organization.id, recordId)}
      />
    </>
  );
}
