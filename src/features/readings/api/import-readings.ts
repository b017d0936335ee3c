import { useMutation, useQueryClient } from '@tanstack/react-query';
import { segment } from '../../../lib/api-client';
import { postCsvFile } from './post-csv-file';
import type { ImportPreviewResponse, ImportResultResponse } from './types';
import { changedBy, invalidate } from '../../../lib/invalidation';

/** Reports the share of the file sent (0–1); the server reads the rows as they arrive. */
export type UploadProgress = (sent: number) => void;

/** Checks every row of the file; the server writes nothing. */
export const previewImport = (orgId: string, file: File, onProgress?: UploadProgress) =>
  postCsvFile<ImportPreviewResponse>(
    `/organizations/${segment(orgId)}/readings/import/preview`,
    file,
    onProgress,
  ).then((body) => body.data);

/** Imports the whole file in one transaction, or nothing (422 with `line N` fields). */
export const commitImport = (orgId: string, file: File, onProgress?: UploadProgress) =>
  postCsvFile<ImportResultResponse>(
    `/organizations/${segment(orgId)}/readings/import/commit`,
    file,
    onProgress,
  ).then((body) => body.data);

export const usePreviewImport = (orgId: string, onProgress?: UploadProgress) =>
  useMutation({ mutationFn: (file: File) => previewImport(orgId, file, onProgress) });

/** New readings move every machine's figures: the fleet, the due points, Log hours. */
export function useCommitImport(orgId: string, onProgress?: UploadProgress) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => commitImport(orgId, file, onProgress),
    onSuccess: () => invalidate(queryClient, changedBy.readings(orgId)),
  });
}
