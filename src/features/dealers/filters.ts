import { DUE_HORIZONS, DUE_STATUSES, MACHINE_CATEGORIES } from '../../../shared/constants';
import type { BoardFilters } from './api/types';

// The board keeps its filters in the URL (?customer=…&task=oil&page=2): a filtered view survives a
// reload and can be sent to a colleague at the parts counter.

export const DEFAULT_BOARD_HORIZON = 30;
export const BOARD_PAGE_SIZE = 25;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const oneOf = <T extends string | number>(list: readonly T[], value: unknown): T | null =>
  list.includes(value as T) ? (value as T) : null;

export function readBoardFilters(search: URLSearchParams): BoardFilters {
  const page = Number(search.get('page'));
  const customer = search.get('customer');
  return {
    horizon: oneOf(DUE_HORIZONS, Number(search.get('horizon'))) ?? DEFAULT_BOARD_HORIZON,
    customerId: customer && UUID.test(customer) ? customer : null,
    category: oneOf(MACHINE_CATEGORIES, search.get('category')),
    status: oneOf(DUE_STATUSES, search.get('status')),
    task: (search.get('task') ?? '').slice(0, 100),
    page: Number.isInteger(page) && page > 1 ? page : 1,
    pageSize: BOARD_PAGE_SIZE,
  };
}

export function writeBoardFilters(filters: Omit<BoardFilters, 'pageSize'>): URLSearchParams {
  const search = new URLSearchParams();
  if (filters.horizon !== DEFAULT_BOARD_HORIZON) search.set('horizon', String(filters.horizon));
  if (filters.customerId) search.set('customer', filters.customerId);
  if (filters.category) search.set('category', filters.category);
  if (filters.status) search.set('status', filters.status);
  if (filters.task.trim()) search.set('task', filters.task.trim());
  if (filters.page > 1) search.set('page', String(filters.page));
  return search;
}
