import type { QueryClient } from '@tanstack/react-query';
import { foreignKeys, taskKeys } from './keys';

/** After a change to a machine's schedule: its tasks, its due summary, the fleet list, due lists. */
export const invalidateAfterScheduleChange = (
  queryClient: QueryClient,
  orgId: string,
  machineId: string,
) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: taskKeys.list(orgId, machineId) }),
    queryClient.invalidateQueries({ queryKey: foreignKeys.machineDetail(orgId, machineId) }),
    queryClient.invalidateQueries({ queryKey: foreignKeys.machineLists(orgId) }),
    queryClient.invalidateQueries({ queryKey: foreignKeys.due }),
  ]);
