import type { QueryClient } from '@tanstack/react-query';
import { useParams, type LoaderFunctionArgs } from 'react-router-dom';
import { labelMachineQueryOptions } from '../../features/walkarounds/api/label';
import { MachineLabel } from '../../features/walkarounds/components/machine-label';
import { useCurrentMembership } from '../../lib/auth';

export const machineLabelLoader =
  (queryClient: QueryClient) =>
  ({ params }: LoaderFunctionArgs) => {
    if (params.orgId && params.machineId)
      void queryClient.prefetchQuery(labelMachineQueryOptions(params.orgId, params.machineId));
    return null;
  };

/** A machine's printable QR label (the machine page links here). */
export function MachineLabelPage() {
  const { machineId = '' } = useParams();
  const { membership } = useCurrentMembership();
  return <MachineLabel orgId={membership.organization.id} machineId={machineId} />;
}
