import { API_BASE, ApiError, segment, type FieldErrors } from '../../../lib/api-client';
import type { UploadedPhoto } from './types';

// lib/api-client sends JSON bodies only; the photo goes as multipart here and failures become
// the same ApiError every other call throws (status 0, code 'unreachable' without a connection).

interface ErrorBody {
  error?: { code?: string; message?: string; fields?: FieldErrors };
}

const FALLBACK: Record<number, string> = {
  0: "Couldn't reach Hourstone. Check your connection and try again.",
  413: 'The photo is too large (at most 10 MB).',
};

/** POST …/machines/:machineId/walkaround-photos (multipart field `photo`) → the photo's id. */
export async function uploadWalkaroundPhoto(
  orgId: string,
  machineId: string,
  file: File,
): Promise<UploadedPhoto> {
  const body = new FormData();
  body.append('photo', file);
  let response: Response;
  try {
    response = await fetch(
      `${API_BASE}/organizations/${segment(orgId)}/machines/${segment(machineId)}/walkaround-photos`,
      { method: 'POST', headers: { Accept: 'application/json' }, credentials: 'include', body },
    );
  } catch {
    throw new ApiError({ status: 0, code: 'unreachable', message: FALLBACK[0] });
  }
  if (response.ok) return ((await response.json()) as { data: UploadedPhoto }).data;
  const error = ((await response.json().catch(() => null)) as ErrorBody | null)?.error;
  throw new ApiError({
    status: response.status,
    code: error?.code ?? (response.status >= 502 ? 'unreachable' : `http_${response.status}`),
    message:
      error?.fields?.photo ??
      error?.message ??
      FALLBACK[response.status] ??
      'The photo could not be uploaded. Try again in a moment.',
    fields: error?.fields,
  });
}
