import { queryOptions, useQuery } from '@tanstack/react-query';
import type { SpecSheetResponse } from '../../../../shared/schemas/spec-sheet';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type {
  SpecSheet,
  SpecSheetResponse,
  SpecSheetSaved,
} from '../../../../shared/schemas/spec-sheet';

export const specSheetUrl = (orgId: string, machineId: string) =>
  `/organizations/${segment(orgId)}/machines/${segment(machineId)}/spec-sheet`;

export const specSheetQueryOptions = (orgId: string, machineId: string) =>
  queryOptions({
    queryKey: queryKeys.machines.specSheet(orgId, machineId),
    queryFn: ({ signal }) =>
      apiClient.get<SpecSheetResponse>(specSheetUrl(orgId, machineId), { signal }),
  });

export const useSpecSheet = (orgId: string, machineId: string, enabled = true) =>
  useQuery({ ...specSheetQueryOptions(orgId, machineId), enabled: enabled && !!machineId });
