import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { MachineList } from '../../../../shared/schemas/machines';
import type { PickableMachine } from './types';
import { queryKeys } from '../../../lib/query-keys';

// The server answers only the machines the caller may see (an operator: the ones assigned to
// them, where assignments exist). 200 is the page limit; a yard's walkaround list is far shorter.
const PICK_QUERY = 'sort=fleetNumber&order=asc&page=1&pageSize=200';

/** Machines to pick for a walkaround: sold ones are left out, tagged-out ones kept (and shown), restrictions with them. */
export const getPickableMachines = (orgId: string, signal?: AbortSignal) =>
  apiClient
    .get<MachineList>(`/organizations/${segment(orgId)}/machines?${PICK_QUERY}`, { signal })
    .then((body) =>
      body.data
        .filter((machine) => machine.status !== 'sold')
        .map((m): PickableMachine => ({
          id: m.id,
          fleetNumber: m.fleetNumber,
          name: m.name,
          category: m.category,
          status: m.status,
          restriction: m.restriction,
          meterUnit: m.meterUnit,
          lastReading: m.lastReading,
          operatorIds: m.operatorIds,
        })),
    );

export const pickableMachinesQueryOptions = (orgId: string) =>
  queryOptions({
    queryKey: queryKeys.walkarounds.machines(orgId),
    queryFn: ({ signal }) => getPickableMachines(orgId, signal),
  });

export const usePickableMachines = (orgId: string) => useQuery(pickableMachinesQueryOptions(orgId));
