import type { ApiErrorBody } from '@shared/schemas/common.schema';

/** A failed API call: the HTTP status (0 when the server could not be reached) and the server's stable error code. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly field: string | undefined;
  /** From the `Retry-After` header, in seconds. */
  readonly retryAfterSeconds: number | undefined;
  /** The server's `error.details`, e.g. every check result behind a refused install. */
  readonly details: unknown;

  constructor(init: { status: number; code: string; message: string; field?: string; retryAfterSeconds?: number; details?: unknown }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.field = init.field;
    this.retryAfterSeconds = init.retryAfterSeconds;
    this.details = init.details;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

export type QueryParams = Record<string, string | number | boolean | null | undefined>;

export function buildUrl(path: string, query?: QueryParams): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === '') continue;
    params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

function parseRetryAfter(header: string | null): number | undefined {
  if (!header) return undefined;
  const seconds = Number(header);
  if (Number.isFinite(seconds)) return Math.max(0, Math.ceil(seconds));
  const at = Date.parse(header);
  if (Number.isNaN(at)) return undefined;
  return Math.max(0, Math.ceil((at - Date.now()) / 1000));
}

const STATUS_MESSAGES: Record<number, string> = {
  400: 'The server did not accept this request.',
  401: 'Your session has ended. Sign in again.',
  403: "You don't have permission to do this.",
  404: 'This record was not found.',
  409: 'This change conflicts with the current state of the record.',
  429: 'Too many requests. Wait a moment and try again.',
};

function defaultMessage(status: number): string {
  return STATUS_MESSAGES[status] ?? (status >= 500 ? 'The server ran into a problem. Try again in a moment.' : `The request failed (HTTP ${status}).`);
}

interface RequestOptions {
  query?: QueryParams;
  body?: unknown;
  signal?: AbortSignal;
}

async function request<T>(method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE', path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  let body: string | undefined;
  if (method !== 'GET') {
    // The server refuses a mutating request that is not JSON, which keeps plain HTML forms on other sites out.
    headers['Content-Type'] = 'application/json';
    body = JSON.stringify(options.body ?? {});
  }

  let response: Response;
  try {
    response = await fetch(buildUrl(path, options.query), {
      method,
      headers,
      body,
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (error) {
    if (options.signal?.aborted) throw error;
    throw new ApiError({
      status: 0,
      code: 'network_error',
      message: 'Ferrule could not reach the server. Check the connection and try again.',
    });
  }

  if (response.status === 204) return undefined as T;

  const text = await response.text();
  let json: unknown = null;
  if (text) {
    try {
      json = JSON.parse(text);
    } catch {
      json = null;
    }
  }

  if (!response.ok) {
    const error = (json as { error?: ApiErrorBody['error'] & { details?: unknown } } | null)?.error;
    throw new ApiError({
      status: response.status,
      code: error?.code ?? `http_${response.status}`,
      message: error?.message ?? defaultMessage(response.status),
      field: error?.field,
      retryAfterSeconds: parseRetryAfter(response.headers.get('Retry-After')),
      details: error?.details,
    });
  }

  return json as T;
}

export const api = {
  get: <T>(path: string, query?: QueryParams, signal?: AbortSignal) => request<T>('GET', path, { query, signal }),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, { body }),
  put: <T>(path: string, body?: unknown) => request<T>('PUT', path, { body }),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, { body }),
  delete: <T>(path: string) => request<T>('DELETE', path),
};

const seconds = (n: number) => `${n} ${n === 1 ? 'second' : 'seconds'}`;

/** A sentence for a person about what went wrong. */
export function describeError(error: unknown): string {
  if (isApiError(error)) {
    if (error.status === 429 && error.retryAfterSeconds !== undefined) {
      return `Too many attempts. Try again in ${seconds(error.retryAfterSeconds)}.`;
    }
    return error.message;
  }
  return 'Something went wrong. Try again.';
}
