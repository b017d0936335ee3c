import {
  DEFECT_SEVERITIES,
  DEFECT_STATUSES,
  type DefectSeverity,
} from '../../../../shared/schemas/defects';
import type { DefectFilters, DefectStatusFilter } from '../api/types';

const STATUS_FILTERS: readonly DefectStatusFilter[] = ['active', 'all', ...DEFECT_STATUSES];

/** The list's filters from the page's URL (so a filtered list can be shared or bookmarked). */
export function filtersFromSearch(search: URLSearchParams): DefectFilters {
  const status = search.get('status') as DefectStatusFilter | null;
  const severity = search.get('severity') as DefectSeverity | null;
  const page = Number(search.get('page'));
  return {
    status: status && STATUS_FILTERS.includes(status) ? status : 'active',
    severity: severity && DEFECT_SEVERITIES.includes(severity) ? severity : undefined,
    machineId: search.get('machineId') || undefined,
    assignedTo: search.get('assignedTo') || undefined,
    page: Number.isInteger(page) && page > 1 ? page : 1,
  };
}

/** The URL search of a set of filters; the defaults are left out. */
export function searchFromFilters(filters: DefectFilters): URLSearchParams {
  const search = new URLSearchParams();
  if (filters.status !== 'active') search.set('status', filters.status);
  if (filters.severity) search.set('severity', filters.severity);
  if (filters.machineId) search.set('machineId', filters.machineId);
  if (filters.assignedTo) search.set('assignedTo', filters.assignedTo);
  if (filters.page > 1) search.set('page', String(filters.page));
  return search;
}
