import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import type { MeasurementName, MeasurementPoint } from './types';
import { queryKeys } from '../../../lib/query-keys';

const machinePath = (orgId: string, machineId: string) =>
  `/organizations/${segment(orgId)}/machines/${segment(machineId)}`;

/** The measurements the machine's completed visits carry, for the chart's picker. */
export const measurementNamesQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.measurements.machine(orgId, machineId),
    queryFn: ({ signal }) =>
      apiClient
        .get<DataEnvelope<MeasurementName[]>>(`${machinePath(orgId, machineId)}/measurements`, {
          signal,
        })
        .then((body) => body.data),
  });

export const useMeasurementNames = (orgId: string, machineId: string) =>
  useQuery(measurementNamesQueryOptions(orgId, machineId));

/** One measurement over the visits, oldest first, with its spec limits. */
export const measurementSeriesQueryOptions = (orgId: string, machineId: string, name: string) =>
  queryOptions({
    queryKey: queryKeys.measurements.series(orgId, machineId, name),
    queryFn: ({ signal }) =>
      apiClient
        .get<DataEnvelope<MeasurementPoint[]>>(
          `${machinePath(orgId, machineId)}/measurements/series?name=${encodeURIComponent(name)}`,
          { signal },
        )
        .then((body) => body.data),
  });

export const useMeasurementSeries = (orgId: string, machineId: string, name: string | null) =>
  useQuery({
    ...measurementSeriesQueryOptions(orgId, machineId, name ?? ''),
    enabled: Boolean(name),
  });
