import type { QueryClient } from '@tanstack/react-query';
import { foreignKeys, machineKeys, machineReadingKeys } from './keys';

/**
 * After any change to a machine's readings: its usage and last reading (detail), its history,
 * its tasks' due points, the fleet list's meter column and every due list.
 */
export const invalidateAfterReadingChange = (
  queryClient: QueryClient,
  orgId: string,
  machineId: string,
) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: machineKeys.detail(orgId, machineId) }),
    queryClient.invalidateQueries({ queryKey: machineReadingKeys.list(orgId, machineId) }),
    queryClient.invalidateQueries({ queryKey: foreignKeys.machineTasks(orgId, machineId) }),
    queryClient.invalidateQueries({ queryKey: [...machineKeys.lists(), orgId] }),
    queryClient.invalidateQueries({ queryKey: foreignKeys.due }),
  ]);
