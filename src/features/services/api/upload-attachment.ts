import { useMutation, useQueryClient } from '@tanstack/react-query';
import { API_BASE, ApiError, apiClient, segment, type FieldErrors } from '../../../lib/api-client';
import { serviceKeys } from './keys';
import type { Attachment } from './types';

// lib/api-client sends JSON only; a file goes as multipart form data here, and failures become
// the same ApiError every other call throws (422 wrong type on `file`, 413 too large).

const FALLBACK: Record<number, string> = {
  0: "Couldn't reach Hourstone. Check your connection and try again.",
  413: 'The file is too large: at most 10 MB.',
};

export async function uploadAttachment(
  orgId: string,
  recordId: string,
  file: File,
): Promise<Attachment> {
  const body = new FormData();
  body.append('file', file);
  let response: Response;
  try {
    response = await fetch(
      `${API_BASE}/organizations/${segment(orgId)}/service-records/${segment(recordId)}/attachments`,
      { method: 'POST', headers: { Accept: 'application/json' }, credentials: 'include', body },
    );
  } catch {
    throw new ApiError({ status: 0, code: 'unreachable', message: FALLBACK[0] });
  }
  const parsed = (await response.json().catch(() => null)) as {
    data?: Attachment;
    error?: { code?: string; message?: string; fields?: FieldErrors };
  } | null;
  if (response.ok && parsed?.data) return parsed.data;
  throw new ApiError({
    status: response.status,
    code: parsed?.error?.code ?? `http_${response.status}`,
    message:
      parsed?.error?.message ??
      FALLBACK[response.status] ??
      'Hourstone had a problem with that file. Try again in a moment.',
    fields: parsed?.error?.fields,
  });
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
      queryClient.invalidateQueries({ queryKey: serviceKeys.detail(orgId, recordId) }),
  });
}

export function useDeleteAttachment(orgId: string, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: string) => deleteAttachment(orgId, recordId, attachmentId),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: serviceKeys.detail(orgId, recordId) }),
  });
}
