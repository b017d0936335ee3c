// The one fetch wrapper: every server call goes through here, so the cookie session, the JSON
// envelope and the error shape are handled in one place.

export const API_BASE = '/api/v1';

export type FieldErrors = Record<string, string>;

/** What every failed call throws: the server's `{ error: { code, message, fields? } }`, or ours. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors;
  /** seconds to wait before trying again (429, 503), when the server said so */
  readonly retryAfter: number | null;

  constructor(init: {
    status: number;
    code: string;
    message: string;
    fields?: FieldErrors;
    retryAfter?: number | null;
  }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields ?? {};
    this.retryAfter = init.retryAfter ?? null;
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

/**
 * The server (or its database) cannot answer now: no connection, a gateway without the API, or
 * our 503 while PostgreSQL restarts. Trying again later can succeed; the request itself was fine.
 */
export const isUnavailable = (error: unknown): error is ApiError =>
  isApiError(error) && [0, 502, 503, 504].includes(error.status);

/** The response body of a successful call that returns one record or a list. */
export interface DataEnvelope<T> {
  data: T;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions {
  body?: unknown;
  signal?: AbortSignal;
}

// 413 from an upload: the server's JSON names the field and the limit; this is for a proxy's page.
const UPLOAD_TOO_LARGE = 'The file is too large.';

// Shown when the answer is not our JSON at all (API down behind the dev proxy, a gateway page).
const FALLBACK_MESSAGES: Record<number, string> = {
  0: "Couldn't reach Hourstone. Check your connection and try again.",
  502: "Couldn't reach Hourstone's server. Try again in a moment.",
  503: "Hourstone's server is not answering right now. Try again in a moment.",
  504: "Hourstone's server took too long to answer. Try again in a moment.",
  401: 'Please sign in again.',
  403: "You don't have access to that.",
  404: "That doesn't exist, or you don't have access to it.",
  429: 'Too many attempts. Wait a minute and try again.',
  413: UPLOAD_TOO_LARGE,
};

function fallbackMessage(status: number): string {
  return (
    FALLBACK_MESSAGES[status] ??
    (status >= 500
      ? 'Hourstone had a problem answering. Try again in a moment.'
      : 'Something went wrong. Try again.')
  );
}

function parseRetryAfter(response: Response): number | null {
  const header = response.headers.get('Retry-After');
  if (!header) return null;
  const seconds = Number(header);
  return Number.isFinite(seconds) ? seconds : null;
}

async function toApiError(response: Response): Promise<ApiError> {
  const retryAfter = parseRetryAfter(response);
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // not JSON: fall through to the generic message for this status
  }
  const error = (body as { error?: { code?: unknown; message?: unknown; fields?: unknown } })
    ?.error;
  if (error && typeof error === 'object') {
    return new ApiError({
      status: response.status,
      code: typeof error.code === 'string' ? error.code : `http_${response.status}`,
      message: typeof error.message === 'string' ? error.message : fallbackMessage(response.status),
      fields:
        error.fields && typeof error.fields === 'object'
          ? (error.fields as FieldErrors)
          : undefined,
      retryAfter,
    });
  }
  // No JSON error from our API: a gateway (or the dev proxy) answered because the API did not.
  const unreachable = [502, 503, 504].includes(response.status);
  return new ApiError({
    status: response.status,
    code: unreachable ? 'unreachable' : `http_${response.status}`,
    message: fallbackMessage(response.status),
    retryAfter,
  });
}

async function request<T>(method: Method, path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const multipart = options.body instanceof FormData;
  if (options.body !== undefined && !multipart) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      credentials: 'include',
      body:
        options.body === undefined
          ? undefined
          : multipart
            ? (options.body as FormData)
            : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({ status: 0, code: 'unreachable', message: fallbackMessage(0) });
  }

  if (!response.ok) throw await toApiError(response);
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/**
 * POSTs one file as multipart form data like `upload`, reporting the share of it sent (0–1) as it
 * goes. XMLHttpRequest, because fetch reports no upload progress; the answer and its errors are
 * read the same way as every other call.
 */
function uploadWithProgress<T>(
  path: string,
  field: string,
  file: File,
  onProgress: (sent: number) => void,
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${API_BASE}${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && event.total > 0) onProgress(event.loaded / event.total);
    };
    xhr.upload.onload = () => onProgress(1);
    xhr.onerror = () =>
      reject(new ApiError({ status: 0, code: 'unreachable', message: fallbackMessage(0) }));
    xhr.onload = () => {
      if (xhr.status === 0)
        return reject(
          new ApiError({ status: 0, code: 'unreachable', message: fallbackMessage(0) }),
        );
      const retryAfter = xhr.getResponseHeader('Retry-After');
      const response = new Response(xhr.status === 204 ? null : xhr.responseText, {
        status: xhr.status,
        headers: retryAfter ? { 'Retry-After': retryAfter } : {},
      });
      if (!response.ok) return void toApiError(response).then(reject);
      resolve((xhr.responseText ? JSON.parse(xhr.responseText) : undefined) as T);
    };
    const body = new FormData();
    body.append(field, file);
    xhr.send(body);
  });
}

export const apiClient = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body'>) =>
    request<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) =>
    request<T>('PUT', path, { ...options, body }),
  delete: <T = void>(path: string, options?: RequestOptions) => request<T>('DELETE', path, options),
  /** Sends one file as multipart form data in `field` (the browser sets the boundary header). */
  upload: <T>(path: string, field: string, file: File, method: 'POST' | 'PUT' = 'POST') => {
    const body = new FormData();
    body.append(field, file);
    return request<T>(method, path, { body });
  },
  uploadWithProgress,
};

/** Path segments from the URL or the user go through this so ids cannot break out of the path. */
export const segment = (value: string) => encodeURIComponent(value);
