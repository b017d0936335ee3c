import { queryOptions, useQuery } from '@tanstack/react-query';
import { API_BASE, apiClient, segment } from '../../../lib/api-client';
import type { MachineDetail } from '../../../../shared/schemas/machines';
import type { MachineRef } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The printable label (SVG, 60 × 76 mm); the cookie session goes along with an <img>. */
export const labelSvgUrl = (orgId: string, machineId: string, download = false) =>
  `${API_BASE}/organizations/${segment(orgId)}/machines/${segment(machineId)}/label.svg${download ? '?download=1' : ''}`;

/** The machine a label is for: its fleet number and name (GET machines/:id, trimmed). */
export const getLabelMachine = (orgId: string, machineId: string, signal?: AbortSignal) =>
  apiClient
    .get<MachineDetail>(`/organizations/${segment(orgId)}/machines/${segment(machineId)}`, {
      signal,
    })
    .then(
      ({
        data: { id, fleetNumber, name, category, status, restriction, meterUnit },
      }): MachineRef => ({
        id,
        fleetNumber,
        name,
        category,
        status,
        restricted: restriction !== null,
        meterUnit,
      }),
    );

export const labelMachineQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.walkarounds.labelMachine(orgId, machineId),
    queryFn: ({ signal }) => getLabelMachine(orgId, machineId, signal),
  });

export const useLabelMachine = (orgId: string, machineId: string) =>
  useQuery(labelMachineQueryOptions(orgId, machineId));
