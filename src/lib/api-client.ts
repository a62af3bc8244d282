/**
 * The one way the client talks to the API: JSON over fetch, every failure turned into an `ApiError`
 * carrying the `{error: {code, message, fields}}` body of PRODUCT.md §8 (shared/errors.ts).
 * A 401 also calls `onUnauthorized`, which the app wires to "go to sign-in with redirectTo".
 */
import type { ErrorBody } from '../../shared/errors';

export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    /** HTTP status; 0 when the server could not be reached. */
    readonly status: number,
    readonly code: string,
    message: string,
    /** Field path (`braces[1].position`) → message, for 400 answers. */
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
  }

  get isUnauthorized(): boolean {
    return this.status === 401;
  }
  get isConflict(): boolean {
    return this.status === 409;
  }
  get isNotFound(): boolean {
    return this.status === 404;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

type FetchLike = (input: string, init?: RequestInit) => Promise<Response>;

export interface ApiClientOptions {
  fetch?: FetchLike;
  /** Prefix for every path, e.g. '' in the browser or 'http://127.0.0.1:3000' elsewhere. */
  baseUrl?: string;
  onUnauthorized?: (error: ApiError) => void;
}

export interface RequestOptions extends RequestInit {
  /**
   * false: a 401 is only thrown, without calling `onUnauthorized` (for "who am I?" and the
   * sign-in request itself, where a 401 is an expected answer).
   */
  authRedirect?: boolean;
}

export interface ApiClient {
  get<T>(path: string, init?: RequestOptions): Promise<T>;
  post<T>(path: string, body?: unknown, init?: RequestOptions): Promise<T>;
  put<T>(path: string, body?: unknown, init?: RequestOptions): Promise<T>;
  patch<T>(path: string, body?: unknown, init?: RequestOptions): Promise<T>;
  /** `body`: for the few deletes that carry one (deleting a workshop sends the typed name). */
  delete<T = void>(path: string, init?: RequestOptions, body?: unknown): Promise<T>;
  /** Replace the 401 handler (the app sets it once the router exists). */
  setOnUnauthorized(handler: ((error: ApiError) => void) | undefined): void;
}

/** Plain words for statuses that arrive without our JSON error body (a proxy, a crash page). */
const STATUS_MESSAGES: Record<number, string> = {
  400: 'The request was not accepted.',
  401: 'Please sign in.',
  403: 'You do not have access to this.',
  404: 'Not found.',
  409: 'Someone else changed this since you loaded it.',
  413: 'That is too large to send.',
  429: 'Too many attempts. Please wait a moment and try again.',
};

function isErrorBody(value: unknown): value is ErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  return (
    typeof error === 'object' &&
    error !== null &&
    typeof (error as { code?: unknown }).code === 'string' &&
    typeof (error as { message?: unknown }).message === 'string'
  );
}

function cleanFields(fields: unknown): Record<string, string> {
  if (typeof fields !== 'object' || fields === null) return {};
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(fields)) {
    if (typeof value === 'string') out[key] = value;
  }
  return out;
}

/** Turns a non-2xx response into an ApiError, whatever its body is. */
export async function errorFromResponse(response: Response): Promise<ApiError> {
  let body: unknown = null;
  const text = await response.text().catch(() => '');
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = null;
    }
  }
  if (isErrorBody(body)) {
    return new ApiError(response.status, body.error.code, body.error.message, cleanFields(body.error.fields));
  }
  const message =
    STATUS_MESSAGES[response.status] ??
    (response.status >= 500 ? 'The server had a problem. Please try again.' : `The request failed (HTTP ${response.status}).`);
  return new ApiError(response.status, `http_${response.status}`, message);
}

export function createApiClient(clientOptions: ApiClientOptions = {}): ApiClient {
  const baseUrl = clientOptions.baseUrl ?? '';
  let onUnauthorized = clientOptions.onUnauthorized;

  async function request<T>(method: string, path: string, body: unknown, options: RequestOptions = {}): Promise<T> {
    const { authRedirect = true, ...init } = options;
    const doFetch: FetchLike = clientOptions.fetch ?? ((input, requestInit) => globalThis.fetch(input, requestInit));
    const headers = new Headers(init.headers);
    headers.set('Accept', 'application/json');
    if (body !== undefined) headers.set('Content-Type', 'application/json');

    let response: Response;
    try {
      response = await doFetch(`${baseUrl}${path}`, {
        credentials: 'same-origin',
        ...init,
        method,
        headers,
        body: body === undefined ? undefined : JSON.stringify(body),
      });
    } catch (cause) {
      if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
      throw new ApiError(0, 'network', 'Could not reach the server. Check the connection and try again.');
    }

    if (!response.ok) {
      const error = await errorFromResponse(response);
      if (error.isUnauthorized && authRedirect) onUnauthorized?.(error);
      throw error;
    }
    if (response.status === 204) return undefined as T;
    const text = await response.text();
    if (!text) return undefined as T;
    try {
      return JSON.parse(text) as T;
    } catch {
      throw new ApiError(response.status, 'bad_response', 'The server sent an answer the app could not read.');
    }
  }

  return {
    get: (path, init) => request('GET', path, undefined, init),
    post: (path, body, init) => request('POST', path, body, init),
    put: (path, body, init) => request('PUT', path, body, init),
    patch: (path, body, init) => request('PATCH', path, body, init),
    delete: (path, init, body) => request('DELETE', path, body, init),
    setOnUnauthorized(handler) {
      onUnauthorized = handler;
    },
  };
}

/** The browser's client: same origin, cookies sent; the 401 handler is set in app/provider.tsx. */
export const api = createApiClient();
