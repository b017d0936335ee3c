import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { API_BASE, apiClient, segment } from '../../../lib/api-client';
import type { Board, BoardFilters } from './types';
import { queryKeys } from '../../../lib/query-keys';

function boardSearch(filters: Omit<BoardFilters, 'page' | 'pageSize'>) {
  const query = new URLSearchParams({ horizon: String(filters.horizon) });
  if (filters.customerId) query.set('customerId', filters.customerId);
  if (filters.category) query.set('category', filters.category);
  if (filters.status) query.set('status', filters.status);
  if (filters.task.trim()) query.set('task', filters.task.trim());
  return query;
}

export const getBoard = (orgId: string, filters: BoardFilters, signal?: AbortSignal) => {
  const query = boardSearch(filters);
  query.set('page', String(filters.page));
  query.set('pageSize', String(filters.pageSize));
  return apiClient.get<Board>(`/organizations/${segment(orgId)}/board?${query}`, { signal });
};

/** The CSV of the board with the same filters (every page), downloaded by a plain link. */
export const boardCsvHref = (orgId: string, filters: BoardFilters) =>
  `${API_BASE}/organizations/${segment(orgId)}/board.csv?${boardSearch(filters)}`;

export const boardQueryOptions = (orgId: string, filters: BoardFilters) =>
  queryOptions({
    queryKey: queryKeys.dealers.boardPage(orgId, filters),
    queryFn: ({ signal }) => getBoard(orgId, filters, signal),
  });

/** The board for these filters; the previous answer stays on screen while a new one loads. */
export const useBoard = (orgId: string, filters: BoardFilters) =>
  useQuery({ ...boardQueryOptions(orgId, filters), placeholderData: keepPreviousData });
