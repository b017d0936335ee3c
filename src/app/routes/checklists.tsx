import type { QueryClient } from '@tanstack/react-query';
import { useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { MACHINE_CATEGORIES, type MachineCategory } from '../../../shared/constants';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { templatesQueryOptions } from '../../features/checklists/api/get-templates';
import { ChecklistsView } from '../../features/checklists/components/checklists-view';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const checklistsLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    if (me && findMembership(me, orgId)?.role === 'manager')
      void queryClient.prefetchQuery(templatesQueryOptions(orgId));
    return null;
  };

const categoryOf = (value: string | null): MachineCategory =>
  MACHINE_CATEGORIES.find((c) => c === value) ?? 'tractor';

/** The walkaround checklists of each machine category (manager). */
export function ChecklistsPage() {
  const { membership } = useCurrentMembership();
  const { organization, role } = membership;
  const [search] = useSearchParams();

  if (role !== 'manager') {
    return <ForbiddenState role={role} pageName="Editing walkaround checklists" />;
  }

  return (
    <>
      <PageHeader
        title="Checklists"
        description="What operators check on each kind of machine before using it. Critical items tag the machine out when they fail."
      />
      <ChecklistsView
        orgId={organization.id}
        category={categoryOf(search.get('category'))}
        hrefFor={(category) => paths.organization.checklists.href(organization.id, category)}
      />
    </>
  );
}
