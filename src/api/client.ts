/**
 * The one way the app talks to the server. It owns the base URL, the session's access token,
 * JSON in both directions and turning every failure into an `ApiError`.
 *
 * The access token lives only in memory. When the server answers 401 `unauthorized` (the token
 * expired), the client renews it once from the httpOnly refresh cookie and repeats the request;
 * requests that fail together share one renewal. When renewal is refused the session has ended,
 * and the listeners given to `subscribeToSession` hear `null`.
 */
import type { SessionAnswer } from '@shared/types/account';

/**
 * Same origin unless told otherwise: the Express server serves both the app and `/api`. The Expo
 * dev server (`npm run web`) runs elsewhere and names the API's origin in EXPO_PUBLIC_API_URL.
 */
export const API_BASE_URL = `${process.env.EXPO_PUBLIC_API_URL ?? ''}/api`;

/** The session routes, which alone carry the refresh cookie (it is scoped to this path). */
const AUTH_PATH_PREFIX = '/auth/';
const REFRESH_PATH = '/auth/refresh';

/** The code of a 401 for a missing or expired access token; other 401s (bad credentials) are final. */
const EXPIRED_ACCESS_CODE = 'unauthorized';

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
  /** Sent as JSON, except a FormData, which goes as multipart with the boundary fetch chooses. */
  body?: unknown;
  signal?: AbortSignal;
  /** `blob` resolves with the raw body, for a file to save (a CSV export). */
  responseType?: 'json' | 'blob';
};

let authToken: string | null = null;

/** Set after sign-in, cleared on sign-out; every later request carries it. */
export function setAuthToken(token: string | null): void {
  authToken = token;
}

/** Hears every session the client starts or renews, and `null` when it ends. */
export type SessionListener = (session: SessionAnswer | null) => void;

const sessionListeners = new Set<SessionListener>();

/** Returns the function that stops listening. */
export function subscribeToSession(listener: SessionListener): () => void {
  sessionListeners.add(listener);
  return () => {
    sessionListeners.delete(listener);
  };
}

/** Keeps the answer's access token for later requests and tells the listeners. */
export function beginSession(session: SessionAnswer): void {
  authToken = session.token;
  sessionListeners.forEach((listener) => listener(session));
}

/** Forgets the access token and tells the listeners the session is over. */
export function endSession(): void {
  authToken = null;
  sessionListeners.forEach((listener) => listener(null));
}

let renewal: Promise<SessionAnswer> | null = null;

/**
 * A new access token from the refresh cookie; concurrent callers share one request. A refusal
 * (401) ends the session; no answer at all leaves it be, so a dropped connection in the garage
 * does not sign the rider out.
 */
export function refreshSession(): Promise<SessionAnswer> {
  renewal ??= send<SessionAnswer>(REFRESH_PATH, { method: 'POST' })
    .then(
      (session) => {
        beginSession(session);
        return session;
      },
      (error: unknown) => {
        if (error instanceof ApiError && error.status === 401) endSession();
        throw error;
      },
    )
    .finally(() => {
      renewal = null;
    });
  return renewal;
}

/**
 * `path` is relative to the API root, e.g. `/health`. Resolves with the parsed JSON body. An
 * expired access token is renewed once and the request repeated.
 */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const tokenSent = authToken;
  try {
    return await send<T>(path, options);
  } catch (error) {
    const expired =
      error instanceof ApiError && error.status === 401 && error.code === EXPIRED_ACCESS_CODE;
    if (!expired || path === REFRESH_PATH) throw error;
    // A request that failed after another one already renewed the token only needs repeating.
    if (authToken === tokenSent) await refreshSession();
    return send<T>(path, options);
  }
}

/** One request, as it is: no renewal. */
async function send<T>(path: string, options: RequestOptions): Promise<T> {
  const { method = 'GET', body, signal, responseType = 'json' } = options;
  const multipart = typeof FormData !== 'undefined' && body instanceof FormData;
  const headers: Record<string, string> = { Accept: responseType === 'blob' ? '*/*' : 'application/json' };
  if (body !== undefined && !multipart) headers['Content-Type'] = 'application/json';
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
      // The refresh cookie must travel to the session routes even when the API is on another
      // origin (the dev server); nothing else needs cookies.
      credentials: path.startsWith(AUTH_PATH_PREFIX) ? 'include' : 'same-origin',
      body: body === undefined ? undefined : multipart ? (body as FormData) : JSON.stringify(body),
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
  if (response.ok && responseType === 'blob') return (await response.blob()) as T;

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
