import type { ReactNode } from 'react';
import { useParams } from 'react-router-dom';
import { NotFound } from '../components/errors/route-error';
import { ErrorState } from '../components/ui/error-state';
import { PageSkeleton } from '../components/ui/skeleton';
import type { UnitSystem } from '../../shared/constants';
import type { DealerAccess } from '../../shared/schemas/dealers';
import { useCustomerFarm } from '../features/dealers/api/get-customers';
import { useCurrentMembership, type Membership } from '../lib/auth';
import { paths, type ServiceFormOptions } from './paths';

/**
 * The farm whose machine a page shows, and the links between its pages. A farm's members reach
 * it at /o/<farm>/…; a dealer's advisor reaches a linked customer's machine at
 * /o/<dealer>/customers/<farm>/…, inside the dealer's own shell, and the API answers them through
 * the link (the server's allow-list decides what they may read and do).
 */
export interface FarmScope {
  farm: { id: string; name: string; timeZone: string; currency: string; units: UnitSystem };
  role: Membership['role'];
  /** null for the farm's members; the link's access for a dealer's advisor */
  dealerAccess: DealerAccess | null;
  /** where a page that finds nothing sends the reader back to */
  homeHref: string;
  machineHref: (machineId: string) => string;
  serviceRecordNewHref: (machineId: string, options?: ServiceFormOptions) => string;
  serviceRecordHref: (recordId: string) => string;
  /** the machine's defects: farm members only (a dealer never sees defects) */
  defectsHref: ((machineId: string) => string) | null;
}

export type FarmScopeState =
  | { status: 'ready'; scope: FarmScope }
  | { status: 'pending' }
  | { status: 'error'; error: Error; retry: () => void }
  /** no active link to that farm (never granted, or revoked) */
  | { status: 'missing'; homeHref: string };

/** The page's farm: the member's own organization, or the customer of the advisor's route. */
export function useFarmScope(): FarmScopeState {
  const { farmId } = useParams();
  const { membership } = useCurrentMembership();
  const own = membership.organization;
  const dealerId = own.id;
  const customer = useCustomerFarm(dealerId, farmId ?? '', !!farmId && own.kind === 'dealer');
  const org = paths.organization;

  if (!farmId)
    return {
      status: 'ready',
      scope: {
        farm: own,
        role: membership.role,
        dealerAccess: null,
        homeHref: org.machines.href(own.id),
        machineHref: (machineId) => org.machine.href(own.id, machineId),
        serviceRecordNewHref: (machineId, options) =>
          org.serviceRecordNew.href(own.id, machineId, options),
        serviceRecordHref: (recordId) => org.serviceRecord.href(own.id, recordId),
        defectsHref:
          own.kind === 'farm' ? (machineId) => org.defects.href(own.id, machineId) : null,
      },
    };

  const homeHref = org.dealerBoard.href(dealerId);
  if (own.kind !== 'dealer') return { status: 'missing', homeHref };
  if (customer.isPending) return { status: 'pending' };
  if (customer.isError)
    return { status: 'error', error: customer.error, retry: () => void customer.refetch() };
  const farm = customer.data;
  if (!farm) return { status: 'missing', homeHref };
  return {
    status: 'ready',
    scope: {
      farm,
      role: membership.role,
      dealerAccess: farm.access,
      homeHref: org.dealerBoard.href(dealerId, farm.id),
      machineHref: (machineId) => org.customerMachine.href(dealerId, farm.id, machineId),
      serviceRecordNewHref: (machineId, options) =>
        org.customerServiceRecordNew.href(dealerId, farm.id, machineId, options),
      serviceRecordHref: (recordId) => org.customerServiceRecord.href(dealerId, farm.id, recordId),
      defectsHref: null,
    },
  };
}

/** Renders the page for its farm once known; a missing link answers "Nothing here", as the API. */
export function WithFarmScope({ children }: { children: (scope: FarmScope) => ReactNode }) {
  const state = useFarmScope();
  if (state.status === 'pending') return <PageSkeleton label="Loading the customer" />;
  if (state.status === 'error')
    return (
      <ErrorState
        title="The customer didn't load"
        message={state.error.message}
        onRetry={state.retry}
      />
    );
  if (state.status === 'missing') return <NotFound homeHref={state.homeHref} inShell />;
  return children(state.scope);
}

/** The farm a loader prefetches for: the customer of an advisor's route, else the page's own. */
export const loaderFarmId = (params: { orgId?: string; farmId?: string }) =>
  params.farmId ?? params.orgId ?? '';
