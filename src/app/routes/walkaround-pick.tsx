import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { PageHeader } from '../../components/ui/page-header';
import { pickableMachinesQueryOptions } from '../../features/walkarounds/api/get-pickable-machines';
import { WalkaroundPicker } from '../../features/walkarounds/components/walkaround-picker';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

export const walkaroundPickLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    const membership = me ? findMembership(me, orgId) : undefined;
    if (membership && membership.role !== 'advisor')
      void queryClient.prefetchQuery(pickableMachinesQueryOptions(orgId));
    return null;
  };

export function WalkaroundPickPage() {
  const { me, membership } = useCurrentMembership();
  const { organization, role } = membership;

  if (role === 'advisor') {
    return (
      <ForbiddenState
        role={role}
        pageName="The daily walkaround"
        allowedRoles="the managers, technicians and operators of a farm"
      />
    );
  }

  return (
    <>
      <PageHeader
        title="Daily walkaround"
        description={`${organization.name}: pick the machine you are about to use, or scan the QR label on it. Check it before you start it.`}
      />
      <WalkaroundPicker
        orgId={organization.id}
        userId={me.user.id}
        timeZone={organization.timeZone}
        walkaroundHref={(machineId) =>
          paths.organization.walkaround.href(organization.id, machineId)
        }
        emptyHint={
          role === 'operator'
            ? 'No machines are assigned to you yet. A manager can assign them on the machine page.'
            : 'Machines appear here once they are added to the fleet.'
        }
      />
    </>
  );
}
