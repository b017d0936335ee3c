import { queryOptions, useQuery } from '@tanstack/react-query';
import type { WalkaroundPurpose } from '../../../../shared/schemas/walkarounds';
import { apiClient, segment } from '../../../lib/api-client';
import type { ChecklistResponse } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** The machine's checklist; purpose=use answers 409 tagged_out on a tagged-out machine. */
export const getChecklist = (
  orgId: string,
  machineId: string,
  purpose: WalkaroundPurpose,
  signal?: AbortSignal,
) =>
  apiClient.get<ChecklistResponse>(
    `/organizations/${segment(orgId)}/machines/${segment(machineId)}/checklist?purpose=${purpose}`,
    { signal },
  );

export const checklistQueryOptions = (
  orgId: string,
  machineId: string,
  purpose: WalkaroundPurpose,
) =>
  queryOptions({
    queryKey: queryKeys.walkarounds.checklist(orgId, machineId, purpose),
    queryFn: ({ signal }) => getChecklist(orgId, machineId, purpose, signal),
    // fetched afresh on every visit (someone may have tagged the machine out meanwhile), but
    // not when the phone comes back to the page: the form stays as the operator left it
    staleTime: 0,
    refetchOnWindowFocus: false,
  });

/** `enabled` false once the walkaround is sent: the screen shows the answer, not the list. */
export const useChecklist = (
  orgId: string,
  machineId: string,
  purpose: WalkaroundPurpose,
  enabled = true,
) => useQuery({ ...checklistQueryOptions(orgId, machineId, purpose), enabled });
