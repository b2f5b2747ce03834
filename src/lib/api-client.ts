/**
 * The one way the client talks to the server: same-origin fetch with the session cookie,
 * a CSRF token on every state-changing request, and errors turned into ApiError.
 */
import { countOf } from './words';

export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;
  /** first message per field, from details when the server sent field messages */
  readonly fieldErrors: FieldErrors;
  /** seconds from a Retry-After header, when the server sent one */
  readonly retryAfterSeconds: number | null;

  constructor(init: { status: number; code: string; message: string; details?: unknown; retryAfterSeconds?: number | null }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.details = init.details;
    // Field messages come only with validation failures; other details (e.g. an infeasible
    // rewrite's best reachable values) are not about form fields.
    this.fieldErrors = init.status === 400 || /valid/i.test(init.code) ? fieldErrorsFrom(init.details) : {};
    this.retryAfterSeconds = init.retryAfterSeconds ?? null;
  }

  get hasFieldErrors(): boolean {
    return Object.keys(this.fieldErrors).length > 0;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** A message a person can act on, for any thrown value. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return 'Something went wrong. Please try again.';
}

function firstMessage(value: unknown): string | null {
  if (typeof value === 'string') return value.trim() || null;
  if (Array.isArray(value)) {
    for (const item of value) {
      const msg = firstMessage(item);
      if (msg) return msg;
    }
    return null;
  }
  if (value && typeof value === 'object') {
    const obj = value as Record<string, unknown>;
    if (typeof obj.message === 'string') return obj.message;
    if (Array.isArray(obj.errors)) return firstMessage(obj.errors);
    if (Array.isArray(obj._errors)) return firstMessage(obj._errors);
  }
  return null;
}

/**
 * Reads field messages from the shapes a validation error's details can take:
 * `{ fieldErrors: { field: [messages] } }` (zod flatten), a flat `{ field: message | [messages] }`,
 * a zod tree `{ properties: { field: { errors: [...] } } }`, or a list of issues `[{ path, message }]`.
 * Nested fields are joined with dots ("targets.kcalMax").
 */
export function fieldErrorsFrom(details: unknown): FieldErrors {
  const out: FieldErrors = {};
  if (!details || typeof details !== 'object') return out;

  if (Array.isArray(details)) {
    for (const issue of details) {
      if (!issue || typeof issue !== 'object') continue;
      const { path, message } = issue as { path?: unknown; message?: unknown };
      const key = Array.isArray(path) ? path.join('.') : typeof path === 'string' ? path : '';
      if (key && typeof message === 'string' && !(key in out)) out[key] = message;
    }
    return out;
  }

  const obj = details as Record<string, unknown>;
  const source =
    obj.fieldErrors && typeof obj.fieldErrors === 'object'
      ? (obj.fieldErrors as Record<string, unknown>)
      : obj.properties && typeof obj.properties === 'object'
        ? (obj.properties as Record<string, unknown>)
        : obj;

  for (const [field, value] of Object.entries(source)) {
    if (source === obj && (field === 'formErrors' || field === 'errors' || field === '_errors')) continue;
    const msg = firstMessage(value);
    if (msg) out[field] = msg;
  }
  return out;
}

function readableStatusMessage(status: number, retryAfterSeconds: number | null): string {
  if (status === 429) {
    if (retryAfterSeconds && retryAfterSeconds > 0) {
      const wait = retryAfterSeconds < 90 ? countOf(retryAfterSeconds, 'second') : `${Math.ceil(retryAfterSeconds / 60)} minutes`;
      return `Too many attempts in a short time. Please wait ${wait} and try again.`;
    }
    return 'Too many attempts in a short time. Please wait a minute and try again.';
  }
  if (status === 400 || status === 422) return 'Some of what you entered needs another look.';
  if (status === 401) return 'Please sign in to continue.';
  if (status === 403) return "You don't have access to that.";
  if (status === 404) return "We couldn't find that.";
  if (status === 409) return 'This changed somewhere else in the meantime. Reload to see the latest version.';
  if (status === 413) return 'That is too large to send.';
  if (status >= 500) return 'The server ran into a problem. Please try again in a moment.';
  return `The request failed (HTTP ${status}).`;
}

function parseRetryAfter(header: string | null): number | null {
  if (!header) return null;
  const seconds = Number(header);
  if (Number.isFinite(seconds)) return Math.max(0, Math.round(seconds));
  const at = Date.parse(header);
  return Number.isNaN(at) ? null : Math.max(0, Math.round((at - Date.now()) / 1000));
}

/** Builds an ApiError from a failed response and its parsed body (if any). */
export function apiErrorFromResponse(status: number, body: unknown, retryAfterHeader: string | null): ApiError {
  const retryAfterSeconds = parseRetryAfter(retryAfterHeader);
  const envelope = body && typeof body === 'object' && 'error' in body ? (body as { error: unknown }).error : undefined;

  let code = status === 429 ? 'rate_limited' : `http_${status}`;
  let message = '';
  let details: unknown;

  if (envelope && typeof envelope === 'object') {
    const e = envelope as { code?: unknown; message?: unknown; details?: unknown };
    if (typeof e.code === 'string' && e.code) code = e.code;
    if (typeof e.message === 'string') message = e.message.trim();
    details = e.details;
  } else if (typeof envelope === 'string') {
    message = envelope.trim();
  }

  // A rate limit's own wording is often terse ("Too many requests"); ours says how long to wait.
  if (!message || status === 429) message = readableStatusMessage(status, retryAfterSeconds);
  return new ApiError({ status, code, message, details, retryAfterSeconds });
}

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const CSRF_PATH = '/api/auth/csrf';

export interface RequestOptions {
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

async function send<T>(fetchImpl: typeof fetch, method: string, path: string, body: unknown, options: RequestOptions): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json', ...options.headers };
  const init: RequestInit = { method, credentials: 'same-origin', headers, signal: options.signal };
  if (body !== undefined) {
    headers['Content-Type'] = 'application/json';
    init.body = JSON.stringify(body);
  }

  let response: Response;
  try {
    response = await fetchImpl(path, init);
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({
      status: 0,
      code: 'network',
      message: "Can't reach Hearthswap right now. Check your connection and try again.",
    });
  }

  const text = response.status === 204 ? '' : await response.text();
  let parsed: unknown = undefined;
  if (text) {
    try {
      parsed = JSON.parse(text);
    } catch {
      parsed = undefined;
    }
  }

  if (!response.ok) throw apiErrorFromResponse(response.status, parsed, response.headers.get('Retry-After'));
  return parsed as T;
}

function isCsrfRejection(error: unknown): boolean {
  return error instanceof ApiError && error.status === 403 && /csrf/i.test(`${error.code} ${error.message}`);
}

/** A request against the API. Exported as a factory so tests can hand in their own fetch. */
export function createApiClient(fetchImpl: typeof fetch = (...args) => globalThis.fetch(...args)) {
  let csrfToken: Promise<string> | null = null;

  function getCsrfToken(): Promise<string> {
    if (!csrfToken) {
      const pending = send<{ token?: unknown }>(fetchImpl, 'GET', CSRF_PATH, undefined, {}).then((body) => {
        if (!body || typeof body.token !== 'string' || !body.token) {
          throw new ApiError({
            status: 0,
            code: 'csrf_missing',
            message: 'Could not start a secure session. Please reload the page.',
          });
        }
        return body.token;
      });
      pending.catch(() => {
        if (csrfToken === pending) csrfToken = null;
      });
      csrfToken = pending;
    }
    return csrfToken;
  }

  /** Forget the CSRF token; the next state-changing request fetches a new one (the session changed). */
  function resetCsrfToken(): void {
    csrfToken = null;
  }

  async function request<T>(method: string, path: string, body?: unknown, options: RequestOptions = {}): Promise<T> {
    const upper = method.toUpperCase();
    if (!UNSAFE_METHODS.has(upper)) return send<T>(fetchImpl, upper, path, body, options);

    const withToken = async () =>
      send<T>(fetchImpl, upper, path, body, {
        ...options,
        headers: { ...options.headers, 'X-CSRF-Token': await getCsrfToken() },
      });
    try {
      return await withToken();
    } catch (error) {
      // The token is tied to the session; after the session rotates the old one is refused once.
      if (!isCsrfRejection(error)) throw error;
      resetCsrfToken();
      return withToken();
    }
  }

  return {
    request,
    resetCsrfToken,
    get: <T>(path: string, options?: RequestOptions) => request<T>('GET', path, undefined, options),
    post: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('POST', path, body ?? {}, options),
    patch: <T>(path: string, body: unknown, options?: RequestOptions) => request<T>('PATCH', path, body, options),
    put: <T>(path: string, body: unknown, options?: RequestOptions) => request<T>('PUT', path, body, options),
    delete: <T>(path: string, body?: unknown, options?: RequestOptions) => request<T>('DELETE', path, body, options),
  };
}

export type ApiClient = ReturnType<typeof createApiClient>;

/** The app's client. */
export const api: ApiClient = createApiClient();

/** Forget the app client's CSRF token; call after sign-in, sign-up and sign-out. */
export function resetCsrfToken(): void {
  api.resetCsrfToken();
}
