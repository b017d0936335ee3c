// A machine's meters (issue 13), shared by the machine page's meter section, the reading form
// and the task form: the list with each meter's last reading, and the manager's changes. Keys sit
// under the readings keys, so a logged reading (which refreshes every readings key) refreshes
// each meter's last reading too.
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { METER_KIND_LABELS } from '../../shared/constants';
import type {
  MachineMeterJson,
  MeterCreateInput,
  MeterList,
  MeterResponse,
  MeterUpdateInput,
} from '../../shared/schemas/meters';
import type { z } from 'zod';
import type { counterResetSchema, ReadingHistory } from '../../shared/schemas/readings';
import { apiClient, segment } from './api-client';
import { queryKeys } from './query-keys';

export type { MachineMeterJson, MeterList };

const base = (orgId: string, machineId: string) =>
  `/organizations/${segment(orgId)}/machines/${segment(machineId)}`;

export const meterKeys = {
  machine: (orgId: string, machineId: string) => queryKeys.readings.meters(orgId, machineId),
  /** one meter's readings (its chart) */
  readings: (orgId: string, machineId: string, meterId: string) =>
    [...queryKeys.readings.machine(orgId, machineId), 'meter', meterId] as const,
};

/** How a meter is named on screen: its kind, and its label when it has one. */
export const meterName = (m: Pick<MachineMeterJson, 'kind' | 'label'>) =>
  m.label ? `${METER_KIND_LABELS[m.kind]} — ${m.label}` : METER_KIND_LABELS[m.kind];

/**
 * What a task's line says of the meter it counts on: the meter's name where it is not the
 * machine's primary ("Separator hours"), nothing on the primary, whose unit every screen shows.
 */
export const boundMeterName = (m: Pick<MachineMeterJson, 'kind' | 'label' | 'isPrimary'>) =>
  m.isPrimary ? null : meterName(m);

export const machineMetersQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: meterKeys.machine(orgId, machineId),
    queryFn: ({ signal }) =>
      apiClient.get<MeterList>(`${base(orgId, machineId)}/meters`, { signal }),
  });

export const useMachineMeters = (orgId: string, machineId: string) =>
  useQuery(machineMetersQueryOptions(orgId, machineId));

/** One meter's readings, newest first (enough for two years of daily readings). */
export const useMeterReadings = (orgId: string, machineId: string, meterId: string) =>
  useQuery({
    queryKey: meterKeys.readings(orgId, machineId, meterId),
    queryFn: ({ signal }) =>
      apiClient.get<ReadingHistory>(
        `${base(orgId, machineId)}/readings?limit=2000&meterId=${segment(meterId)}`,
        { signal },
      ),
  });

/** After a change of meters: the lists, readings, tasks and the machine's own figures. */
function useMeterInvalidation(orgId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all(
      [
        queryKeys.readings.all(orgId),
        queryKeys.tasks.all(orgId),
        queryKeys.machines.all(orgId),
        queryKeys.due.all(orgId),
      ].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
    );
}

type MeterChange =
  | { kind: 'add'; input: MeterCreateInput }
  | { kind: 'update'; meterId: string; input: MeterUpdateInput }
  | { kind: 'primary'; meterId: string }
  | { kind: 'remove'; meterId: string };

/** Adds, renames, makes primary or removes a meter of the machine. */
export function useChangeMeter(orgId: string, machineId: string) {
  const refresh = useMeterInvalidation(orgId);
  const url = `${base(orgId, machineId)}/meters`;
  return useMutation({
    mutationFn: (change: MeterChange): Promise<MeterResponse | void> => {
      switch (change.kind) {
        case 'add':
          return apiClient.post<MeterResponse>(url, change.input);
        case 'update':
          return apiClient.patch<MeterResponse>(`${url}/${segment(change.meterId)}`, change.input);
        case 'primary':
          return apiClient.post<MeterResponse>(`${url}/${segment(change.meterId)}/primary`);
        case 'remove':
          return apiClient.delete(`${url}/${segment(change.meterId)}`);
      }
    },
    onSuccess: refresh,
  });
}

/** Records a counter reset (count before, count after — usually 0). */
export function useCounterReset(orgId: string, machineId: string) {
  const refresh = useMeterInvalidation(orgId);
  return useMutation({
    mutationFn: (input: z.input<typeof counterResetSchema>) =>
      apiClient.post(`${base(orgId, machineId)}/meter-resets`, input),
    onSuccess: refresh,
  });
}
