import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient, segment } from '../../../lib/api-client';
import type { Attachment } from './types';
import { queryKeys } from '../../../lib/query-keys';

/** Uploads a photo or PDF (multipart field `file`): 422 wrong type, 413 too large, both on `file`. */
export async function uploadAttachment(
  orgId: string,
  recordId: string,
  file: File,
): Promise<Attachment> {
  const path = `/organizations/${segment(orgId)}/service-records/${segment(recordId)}/attachments`;
  return (await apiClient.upload<{ data: Attachment }>(path, 'file', file)).data;
}

export const deleteAttachment = (orgId: string, recordId: string, attachmentId: string) =>
  apiClient.delete(
    `/organizations/${segment(orgId)}/service-records/${segment(recordId)}/attachments/${segment(attachmentId)}`,
  );

export function useUploadAttachment(orgId: string, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadAttachment(orgId, recordId, file),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.serviceRecords.detail(orgId, recordId) }),
  });
}

export function useDeleteAttachment(orgId: string, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => deleteAttachment(orgId, recordId, attachmentId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: queryKeys.serviceRecords.detail(orgId, recordId) }),
  });
}
