/**
 * The one way the app talks to the server. It owns the base URL, the auth header,
 * JSON in both directions and turning every failure into an `ApiError`.
 */

/** Same origin: the Express server serves both the app and `/api`. */
export const API_BASE_URL = '/api';

/** How long a request may take before it counts as failed. */
export const REQUEST_TIMEOUT_MS = 15_000;

/** The body of every error response: `{ error: { code, message, fields? } }`. */
export type ApiErrorBody = {
  code: string;
  message: string;
  /** Per-field messages for a rejected form, keyed by field name. */
  fields?: Record<string, string>;
};

/** Codes the client itself produces when no usable answer came back. */
export const CLIENT_ERROR_CODES = {
  network: 'network_error',
  timeout: 'timeout',
  badResponse: 'bad_response',
} as const;

export class ApiError extends Error {
  readonly code: string;
  readonly fields?: Record<string, string>;
  /** HTTP status, or 0 when no response arrived. */
  readonly status: number;

  constructor(status: number, { code, message, fields }: ApiErrorBody) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    if (fields) this.fields = fields;
  }
}

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export type RequestOptions = {
  method?: HttpMethod;
  /** Sent as JSON. */
  body?: unknown;
  signal?: AbortSignal;
};

let authToken: string | null = null;

/** Set after sign-in, cleared on sign-out; every later request carries it. */
export function setAuthToken(token: string | null): void {
  authToken = token;
}

/** `path` is relative to the API root, e.g. `/health`. Resolves with the parsed JSON body. */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (authToken) headers.Authorization = `Bearer ${authToken}`;

  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(), REQUEST_TIMEOUT_MS);
  const abortFromCaller = () => controller.abort();
  if (signal?.aborted) controller.abort();
  signal?.addEventListener('abort', abortFromCaller);

  let response: Response;
  try {
    response = await fetch(`${API_BASE_URL}${path}`, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: controller.signal,
    });
  } catch (cause) {
    if (signal?.aborted) throw cause;
    throw controller.signal.aborted
      ? new ApiError(0, {
          code: CLIENT_ERROR_CODES.timeout,
          message: 'The server took too long to answer.',
        })
      : new ApiError(0, {
          code: CLIENT_ERROR_CODES.network,
          message: 'Could not reach the server. Check the connection and try again.',
        });
  } finally {
    clearTimeout(timer);
    signal?.removeEventListener('abort', abortFromCaller);
  }

  if (response.status === 204) return undefined as T;

  const payload = await readJson(response);
  if (response.ok) {
    if (payload === undefined) throw badResponse(response.status);
    return payload as T;
  }
  if (isErrorEnvelope(payload)) throw new ApiError(response.status, payload.error);
  throw badResponse(response.status);
}

/** Shorthands for `apiRequest` with the method filled in. */
export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'GET' }),
  post: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'POST', body }),
  put: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PUT', body }),
  patch: <T>(path: string, body?: unknown, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'PATCH', body }),
  delete: <T>(path: string, options?: Omit<RequestOptions, 'method' | 'body'>) =>
    apiRequest<T>(path, { ...options, method: 'DELETE' }),
};

/** The parsed body, or undefined when it is empty or not JSON (a proxy's HTML page, say). */
async function readJson(response: Response): Promise<unknown> {
  const text = await response.text().catch(() => '');
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function isErrorEnvelope(value: unknown): value is { error: ApiErrorBody } {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const { error } = value as { error: unknown };
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as ApiErrorBody).code === 'string' &&
    typeof (error as ApiErrorBody).message === 'string'
  );
}

function badResponse(status: number): ApiError {
  return new ApiError(status, {
    code: CLIENT_ERROR_CODES.badResponse,
    message: `The server sent an answer the app could not read (HTTP ${status}).`,
  });
}
