import { API_BASE, ApiError, type FieldErrors } from '../../../lib/api-client';

// The one multipart call of the client. lib/api-client sends JSON bodies only, so the CSV upload
// posts its FormData here and turns failures into the same ApiError every other call throws.
// (Worth folding into apiClient as `upload()` once a second feature sends files.)

interface ErrorBody {
  error?: { code?: string; message?: string; fields?: FieldErrors };
}

const FALLBACK: Record<number, string> = {
  0: "Couldn't reach Hourstone. Check your connection and try again.",
  413: 'The file is too large.',
};

/** POST one file in the multipart field `file`; resolves with the JSON body. */
export async function postCsvFile<T>(path: string, file: File): Promise<T> {
  const body = new FormData();
  body.append('file', file);
  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, {
      method: 'POST',
      headers: { Accept: 'application/json' },
      credentials: 'include',
      body,
    });
  } catch {
    throw new ApiError({ status: 0, code: 'unreachable', message: FALLBACK[0] });
  }
  if (response.ok) return (await response.json()) as T;
  const parsed = (await response.json().catch(() => null)) as ErrorBody | null;
  const error = parsed?.error;
  throw new ApiError({
    status: response.status,
    code: error?.code ?? `http_${response.status}`,
    message:
      error?.message ??
      FALLBACK[response.status] ??
      'Hourstone had a problem with that file. Try again in a moment.',
    fields: error?.fields,
  });
}
