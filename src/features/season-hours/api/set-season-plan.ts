import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  SeasonPlanInput,
  SeasonPlanJson,
  SeasonPlanResponse,
} from '../../../../shared/schemas/season-hours';
import { apiClient, segment } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

const planPath = (orgId: string, machineId: string, year: number) =>
  `/organizations/${segment(orgId)}/machines/${segment(machineId)}/season-plans/${year}`;

/** PUT …/season-plans/:year: sets the plan (400 names the field; managers only, else 403). */
export const putSeasonPlan = (
  orgId: string,
  machineId: string,
  year: number,
  input: SeasonPlanInput,
) => apiClient.put<SeasonPlanResponse>(planPath(orgId, machineId, year), input);

/** DELETE …/season-plans/:year: the forecast goes back to the machine's past seasons (204). */
export const deleteSeasonPlan = (orgId: string, machineId: string, year: number) =>
  apiClient.delete<void>(planPath(orgId, machineId, year));

/** A plan to set or remove: the machine and the plan's year (the stored plan's own field). */
export type SeasonPlanChange = { machineId: string } & Pick<SeasonPlanJson, 'year'> &
  ({ kind: 'set'; input: SeasonPlanInput } | { kind: 'remove' });

/** Sets or removes a plan; the plan moves the machine's forecast, so its due figures refetch. */
export function useChangeSeasonPlan(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (change: SeasonPlanChange): Promise<SeasonPlanResponse | void> =>
      change.kind === 'set'
        ? putSeasonPlan(orgId, change.machineId, change.year, change.input)
        : deleteSeasonPlan(orgId, change.machineId, change.year),
    onSuccess: (_data, change) =>
      invalidate(queryClient, changedBy.seasonPlan(orgId, change.machineId)),
  });
}
