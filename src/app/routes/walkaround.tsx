import type { QueryClient } from '@tanstack/react-query';
import { useParams, useSearchParams, type LoaderFunctionArgs } from 'react-router-dom';
import { ForbiddenState } from '../../components/errors/forbidden-state';
import { HITCH_IMPLEMENT_CATEGORIES } from '../../../shared/schemas/hitch';
import { WalkaroundHitch } from '../../features/hitch/components/walkaround-hitch';
import { useMachines } from '../../features/machines/api/get-machines';
import { checklistQueryOptions } from '../../features/walkarounds/api/get-checklist';
import { WalkaroundScreen } from '../../features/walkarounds/components/walkaround-screen';
import { findMembership, meQueryOptions, useCurrentMembership } from '../../lib/auth';
import { paths } from '../paths';

// the implements an operator may say are on a tractor at its walkaround (the hitch log)
const IN_SERVICE = {
  status: 'in_service',
  sort: 'fleetNumber',
  order: 'asc',
  page: 1,
  pageSize: 200,
} as const;
const isImplement = (category: string) =>
  (HITCH_IMPLEMENT_CATEGORIES as readonly string[]).includes(category);

const purposeOf = (search: URLSearchParams) =>
  search.get('purpose') === 'inspection' ? 'inspection' : 'use';

export const walkaroundLoader =
  (queryClient: QueryClient) =>
  async ({ params, request }: LoaderFunctionArgs) => {
    const orgId = params.orgId ?? '';
    const me = await queryClient.ensureQueryData(meQueryOptions()).catch(() => null);
    const membership = me ? findMembership(me, orgId) : undefined;
    if (membership && membership.role !== 'advisor' && params.machineId) {
      const purpose = purposeOf(new URL(request.url).searchParams);
      void queryClient.prefetchQuery(checklistQueryOptions(orgId, params.machineId, purpose));
    }
    return null;
  };

/** The QR label's target: one machine's walkaround (or, for the shop, its inspection). */
export function WalkaroundPage() {
  const { machineId = '' } = useParams();
  const [search] = useSearchParams();
  const { me, membership } = useCurrentMembership();
  const { organization, role } = membership;
  const orgId = organization.id;
  const purpose = purposeOf(search);
  const shop = role === 'manager' || role === 'technician';
  const machines = useMachines(orgId, IN_SERVICE);
  const implementsToPick = (machines.data?.data ?? []).filter(
    (m) => isImplement(m.category) && m.meterUnit === 'h',
  );

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
    // keyed: another machine (or purpose) is another walkaround, with its own draft
    <WalkaroundScreen
      key={`${machineId}:${purpose}`}
      orgId={orgId}
      machineId={machineId}
      purpose={purpose}
      userId={me.user.id}
      units={organization.units}
      timeZone={organization.timeZone}
      machineExtras={(machine) =>
        machine.category === 'tractor' && purpose === 'use' ? (
          <WalkaroundHitch
            orgId={orgId}
            tractor={machine}
            implementsToPick={implementsToPick}
            timeZone={organization.timeZone}
          />
        ) : null
      }
      hrefs={{
        pick: paths.organization.walkaroundPick.href(orgId),
        defects: paths.organization.defects.href(orgId, machineId),
        inspect:
          shop && purpose === 'use'
            ? paths.organization.walkaround.href(orgId, machineId, 'inspection')
            : null,
      }}
    />
  );
}
