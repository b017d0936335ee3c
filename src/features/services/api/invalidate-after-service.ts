import type { QueryClient } from '@tanstack/react-query';
import { foreignKeys, measurementKeys, serviceKeys, shopWeekKeys } from './keys';

/**
 * After a record is written: the machine's history and measurements, the record itself and the
 * shop week; and when it was completed, everything its reading, task resets and closed defects
 * move (due points, the machine's status, the fleet and due lists, readings, defects).
 */
export function invalidateAfterService(
  queryClient: QueryClient,
  orgId: string,
  machineId: string,
  options: { recordId?: string; completed: boolean },
) {
  const keys: (readonly unknown[])[] = [
    serviceKeys.machine(orgId, machineId),
    shopWeekKeys.organization(orgId),
    serviceKeys.activeDefects(orgId, machineId),
  ];
  if (options.recordId) keys.push(serviceKeys.detail(orgId, options.recordId));
  if (options.completed)
    keys.push(
      measurementKeys.names(orgId, machineId),
      foreignKeys.machineTasks(orgId, machineId),
      foreignKeys.machineDetail(orgId, machineId),
      foreignKeys.machineReadings(orgId, machineId),
      foreignKeys.machineLists(orgId),
      foreignKeys.latestReadings(orgId),
      foreignKeys.due,
      foreignKeys.defects,
    );
  return Promise.all(keys.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
}
