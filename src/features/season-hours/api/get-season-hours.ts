import { queryOptions, useQuery } from '@tanstack/react-query';
import type { z } from 'zod';
import type { seasonHoursResponseSchema } from '../../../../shared/schemas/season-hours';
import { apiClient, segment } from '../../../lib/api-client';
import { queryKeys } from '../../../lib/query-keys';

export type { SeasonHoursRow, SeasonPlanJson } from '../../../../shared/schemas/season-hours';
export type SeasonHours = z.infer<typeof seasonHoursResponseSchema>;

/** GET …/season-hours?year=: each machine's season use this year against last, with its plan. */
export const getSeasonHours = (orgId: string, year: number, signal?: AbortSignal) =>
  apiClient.get<SeasonHours>(`/organizations/${segment(orgId)}/season-hours?year=${year}`, {
    signal,
  });

export const seasonHoursQueryOptions = (orgId: string, year: number) =>
  queryOptions({
    queryKey: queryKeys.seasonHours.year(orgId, year),
    queryFn: ({ signal }) => getSeasonHours(orgId, year, signal),
  });

export const useSeasonHours = (orgId: string, year: number) =>
  useQuery(seasonHoursQueryOptions(orgId, year));
