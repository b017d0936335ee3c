import { API_BASE, segment } from '../../../lib/api-client';

/**
 * The farm's whole export (a zip), downloaded by a plain link: the browser streams it to disk
 * with the session cookie, so a large farm never passes through the page's memory.
 */
export const farmExportHref = (orgId: string) =>
  `${API_BASE}/organizations/${segment(orgId)}/export`;
