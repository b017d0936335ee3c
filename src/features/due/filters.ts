import { DUE_HORIZONS, DUE_STATUSES, MACHINE_CATEGORIES } from '../../../shared/constants';
import type { DueFilters } from './api/types';

// The dashboard keeps its filters in the URL (?horizon=90&status=overdue&page=2), so a filtered
// view survives a reload, the back button and a link sent to someone else.

export const DEFAULT_HORIZON = 30;
export const DUE_PAGE_SIZE = 25;

const oneOf = <T extends string | number>(list: readonly T[], value: unknown): T | null =>
  list.includes(value as T) ? (value as T) : null;

/** The due filters a URL's search part asks for; anything unknown falls back to the default. */
export function readDueFilters(search: URLSearchParams): DueFilters {
  const page = Number(search.get('page'));
  return {
    horizon: oneOf(DUE_HORIZONS, Number(search.get('horizon'))) ?? DEFAULT_HORIZON,
    category: oneOf(MACHINE_CATEGORIES, search.get('category')),
    status: oneOf(DUE_STATUSES, search.get('status')),
    page: Number.isInteger(page) && page > 1 ? page : 1,
    pageSize: DUE_PAGE_SIZE,
  };
}

/** The search part for these filters, leaving defaults out so plain URLs stay plain. */
export function writeDueFilters(filters: Omit<DueFilters, 'pageSize'>): URLSearchParams {
  const search = new URLSearchParams();
  if (filters.horizon !== DEFAULT_HORIZON) search.set('horizon', String(filters.horizon));
  if (filters.category) search.set('category', filters.category);
  if (filters.status) search.set('status', filters.status);
  if (filters.page > 1) search.set('page', String(filters.page));
  return search;
}
