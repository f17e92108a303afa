/**
 * The one way the client talks to the API: fetch with the session cookie, JSON both ways,
 * and every non-2xx answer turned into an {@link ApiError} carrying the server's
 * `{ error: { code, message, fields? } }`.
 */

/** Field messages keyed by field path ("email", "spec.girthMm"). */
export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: FieldErrors | undefined;
  /** The parsed error body, for answers that carry more (a 412 carries the current head). */
  readonly body: unknown;

  constructor(status: number, code: string, message: string, fields?: FieldErrors, body?: unknown) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
    this.body = body;
  }
}

export interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** Sent as JSON unless it is FormData (uploads). */
  body?: unknown;
  headers?: Record<string, string>;
  signal?: AbortSignal;
}

export interface ApiResponse<T> {
  data: T;
  status: number;
  headers: Headers;
}

/** Servers may send one message or a list per field; the form shows the first. */
function normaliseFields(raw: unknown): FieldErrors | undefined {
  if (!raw || typeof raw !== 'object') return undefined;
  const out: FieldErrors = {};
  for (const [key, value] of Object.entries(raw as Record<string, unknown>)) {
    if (typeof value === 'string') out[key] = value;
    else if (Array.isArray(value) && typeof value[0] === 'string') out[key] = value[0];
  }
  return Object.keys(out).length > 0 ? out : undefined;
}

/** The body of an answer: JSON, text, or nothing. */
export async function readBody(res: Response): Promise<unknown> {
  if (res.status === 204) return undefined;
  const type = res.headers.get('content-type') ?? '';
  if (type.includes('json')) return res.json();
  const text = await res.text();
  return text.length > 0 ? text : undefined;
}

/** The server's error body of a failed answer as an {@link ApiError}. */
export function toApiError(res: Response, body: unknown): ApiError {
  const err = (body as { error?: { code?: unknown; message?: unknown; fields?: unknown } } | undefined)?.error;
  const code = typeof err?.code === 'string' ? err.code : `http_${res.status}`;
  const message =
    typeof err?.message === 'string' ? err.message : res.statusText || `The server answered ${res.status}.`;
  return new ApiError(res.status, code, message, normaliseFields(err?.fields), body);
}

/** Sends one request and returns the parsed body with status and headers (ETag lives there). */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<ApiResponse<T>> {
  const headers: Record<string, string> = { Accept: 'application/json', ...options.headers };
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  let res: Response;
  try {
    res = await fetch(path, {
      method: options.method ?? 'GET',
      headers,
      body,
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError(0, 'network', 'Latchet could not reach its server. Check the connection and try again.');
  }
  const parsed = await readBody(res);
  if (!res.ok) throw toApiError(res, parsed);
  return { data: parsed as T, status: res.status, headers: res.headers };
}

/** Shorthands that return only the body. */
export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }).then((r) => r.data),
  post: <T>(path: string, body?: unknown, headers?: Record<string, string>) =>
    apiRequest<T>(path, { method: 'POST', body, headers }).then((r) => r.data),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>(path, { method: 'PATCH', body }).then((r) => r.data),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }).then((r) => r.data),
};

/** True for an ApiError with the given status. */
export function isApiError(err: unknown, status?: number): err is ApiError {
  return err instanceof ApiError && (status === undefined || err.status === status);
}
