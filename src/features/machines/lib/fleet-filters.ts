import {
  DUE_STATUSES,
  MACHINE_CATEGORIES,
  MACHINE_STATUSES,
  type MachineCategory,
  type MachineStatus,
} from '../../../../shared/constants';
import type { DueStatus } from '../../../../shared/domain/types';
import { MACHINE_SORT_FIELDS, type MachineFilters, type MachineSortField } from '../api/types';

// The fleet's filters live in the URL (?category=…&page=…) so a filtered view can be bookmarked,
// shared and restored with the back button.

export const FLEET_PAGE_SIZE = 25;

const oneOf = <T extends string>(values: readonly T[], value: string | null): T | undefined =>
  value && (values as readonly string[]).includes(value) ? (value as T) : undefined;

export function filtersFromSearch(search: URLSearchParams): MachineFilters {
  const page = Number(search.get('page'));
  return {
    category: oneOf<MachineCategory>(MACHINE_CATEGORIES, search.get('category')),
    status: oneOf<MachineStatus>(MACHINE_STATUSES, search.get('status')),
    dueStatus: oneOf<DueStatus>(DUE_STATUSES, search.get('dueStatus')),
    q: search.get('q')?.trim() || undefined,
    sort: oneOf<MachineSortField>(MACHINE_SORT_FIELDS, search.get('sort')) ?? 'fleetNumber',
    order: search.get('order') === 'desc' ? 'desc' : 'asc',
    page: Number.isInteger(page) && page > 0 ? page : 1,
    pageSize: FLEET_PAGE_SIZE,
  };
}

/** The URL search for a set of filters, leaving out the defaults so URLs stay short. */
export function searchFromFilters(filters: MachineFilters): URLSearchParams {
  const search = new URLSearchParams();
  if (filters.category) search.set('category', filters.category);
  if (filters.status) search.set('status', filters.status);
  if (filters.dueStatus) search.set('dueStatus', filters.dueStatus);
  if (filters.q) search.set('q', filters.q);
  if (filters.sort !== 'fleetNumber') search.set('sort', filters.sort);
  if (filters.order !== 'asc') search.set('order', filters.order);
  if (filters.page > 1) search.set('page', String(filters.page));
  return search;
}

export const hasNarrowingFilters = (filters: MachineFilters) =>
  Boolean(filters.category || filters.status || filters.dueStatus || filters.q);

/** How each sort reads in a sentence ("sorted by next due date"). */
export const SORT_LABELS: Record<MachineSortField, string> = {
  fleetNumber: 'fleet number',
  name: 'name',
  category: 'category',
  status: 'status',
  nextDue: 'next due date',
};
