import { useMutation, useQueryClient } from '@tanstack/react-query';
import type {
  FleetImportPreview,
  FleetImportResult,
} from '../../../../shared/schemas/fleet-import';
import { API_BASE, apiClient, segment, type DataEnvelope } from '../../../lib/api-client';
import { changedBy, invalidate } from '../../../lib/invalidation';

const base = (orgId: string) => `/organizations/${segment(orgId)}/fleet-import`;

/** Checks every row of a fleet file; the server writes nothing. */
export const previewFleetImport = (orgId: string, file: File) =>
  apiClient
    .upload<DataEnvelope<FleetImportPreview>>(`${base(orgId)}/preview`, 'file', file)
    .then((body) => body.data);

/** Imports the whole file in one transaction, or nothing (422 with `line N` fields). */
export const commitFleetImport = (orgId: string, file: File) =>
  apiClient
    .upload<DataEnvelope<FleetImportResult>>(`${base(orgId)}/commit`, 'file', file)
    .then((body) => body.data);

/** The example file's address (a plain download link: the session cookie goes with it). */
export const fleetExampleHref = (orgId: string) => `${API_BASE}${base(orgId)}/example`;

export const usePreviewFleetImport = (orgId: string) =>
  useMutation({ mutationFn: (file: File) => previewFleetImport(orgId, file) });

/** After an import: the fleet, its readings and due points, and the first-run checklist. */
export function useCommitFleetImport(orgId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => commitFleetImport(orgId, file),
    onSuccess: () => invalidate(queryClient, changedBy.fleetImport(orgId)),
  });
}
