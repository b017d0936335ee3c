import type { QueryClient } from '@tanstack/react-query';
import { Link, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { buttonClasses } from '../../components/ui/button';
import { Icon } from '../../components/ui/icons';
import { PageHeader } from '../../components/ui/page-header';
import { machinesQueryOptions, useFleetAbilities } from '../../features/machines/api/get-machines';
import { FleetView } from '../../features/machines/components/fleet-view';
import { filtersFromSearch } from '../../features/machines/lib/fleet-filters';
import { useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const machinesLoader =
  (queryClient: QueryClient) =>
  ({ params, request }: LoaderFunctionArgs) => {
    const filters = filtersFromSearch(new URL(request.url).searchParams);
    void queryClient.prefetchQuery(machinesQueryOptions(params.orgId ?? '', filters));
    return null;
  };

const machineHrefFor = (orgId: string) => (machineId: string) =>
  paths.organization.machine.href(orgId, machineId);

export function MachinesPage() {
  const { membership } = useCurrentMembership();
  const { organization } = membership;
  const [search] = useSearchParams();
  const abilities = useFleetAbilities(organization.id, filtersFromSearch(search));

  const addLink = abilities.create ? (
    <div className="flex flex-wrap gap-2">
      <Link to={paths.organization.machineNew.href(organization.id)} className={buttonClasses()}>
        <Icon name="plus" />
        Add machine
      </Link>
      <Link
        to={paths.organization.importFleet.href(organization.id)}
        className={buttonClasses('secondary')}
      >
        Import fleet
      </Link>
    </div>
  ) : null;

  return (
    <>
      <PageHeader
        title="Fleet"
        description={`The machines of ${organization.name}, their meters and what is due.`}
        actions={addLink}
      />
      <FleetView
        orgId={organization.id}
        timeZone={organization.timeZone}
        machineHref={machineHrefFor(organization.id)}
        addAction={addLink}
      />
    </>
  );
}
