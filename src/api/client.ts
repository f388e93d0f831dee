/**
 * The one fetch wrapper every API hook uses: same-origin JSON, session cookie,
 * CSRF token on unsafe methods, and a typed ApiError for every non-2xx answer.
 */
import type { ApiErrorBody, ApiErrorCode } from "@shared/api/errors";
import type { CsrfResponse } from "@shared/api/auth";

export class ApiError extends Error {
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly fields?: Record<string, string[]>;

  constructor(status: number, code: ApiErrorCode, message: string, fields?: Record<string, string[]>) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(value: unknown): value is ApiError {
  return value instanceof ApiError;
}

const UNSAFE_METHODS = new Set(["POST", "PUT", "PATCH", "DELETE"]);
const CSRF_PATH = "/api/auth/csrf";

// The token belongs to the server session, which is regenerated at sign-in and
// sign-out; callers reset it then (resetCsrfToken) and the next unsafe call refetches.
let csrfToken: string | null = null;
let csrfInFlight: Promise<string> | null = null;

export function resetCsrfToken(): void {
  csrfToken = null;
  csrfInFlight = null;
}

export async function getCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  if (!csrfInFlight) {
    csrfInFlight = send<CsrfResponse>("GET", CSRF_PATH)
      .then((body) => {
        csrfToken = body.csrfToken;
        return body.csrfToken;
      })
      .finally(() => {
        csrfInFlight = null;
      });
  }
  return csrfInFlight;
}

/** Drop the cached token and fetch a new one (after the session id changed). */
export async function refreshCsrfToken(): Promise<string> {
  resetCsrfToken();
  return getCsrfToken();
}

export interface RequestOptions {
  body?: unknown;
  signal?: AbortSignal;
}

export async function apiRequest<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
  const upper = method.toUpperCase();
  if (!UNSAFE_METHODS.has(upper)) return send<T>(upper, path, options);

  const token = await getCsrfToken();
  try {
    return await send<T>(upper, path, options, token);
  } catch (error) {
    // A stale token (session expired or regenerated elsewhere): refresh once and retry.
    if (isApiError(error) && error.status === 403 && error.code === "csrf_failed") {
      const fresh = await refreshCsrfToken();
      return send<T>(upper, path, options, fresh);
    }
    throw error;
  }
}

export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>("GET", path, { signal }),
  post: <T>(path: string, body?: unknown) => apiRequest<T>("POST", path, { body }),
  put: <T>(path: string, body?: unknown) => apiRequest<T>("PUT", path, { body }),
  patch: <T>(path: string, body?: unknown) => apiRequest<T>("PATCH", path, { body }),
  delete: <T>(path: string, body?: unknown) => apiRequest<T>("DELETE", path, { body }),
};

async function send<T>(method: string, path: string, options: RequestOptions = {}, token?: string): Promise<T> {
  const headers: Record<string, string> = { Accept: "application/json" };
  const init: RequestInit = { method, headers, credentials: "include", signal: options.signal };
  if (options.body !== undefined) {
    headers["Content-Type"] = "application/json";
    init.body = JSON.stringify(options.body);
  }
  if (token) headers["x-csrf-token"] = token;

  let response: Response;
  try {
    response = await fetch(path, init);
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === "AbortError") throw cause;
    throw new ApiError(0, "network_error", "The server could not be reached. Check your connection and try again.");
  }

  if (response.status === 204) return undefined as T;
  const body = await readJson(response);
  if (response.ok) return body as T;
  throw toApiError(response.status, body);
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

function toApiError(status: number, body: unknown): ApiError {
  const error = (body as Partial<ApiErrorBody> | undefined)?.error;
  if (error && typeof error.code === "string" && typeof error.message === "string") {
    return new ApiError(status, error.code, error.message, error.fields);
  }
  return new ApiError(status, status >= 500 ? "internal_error" : "unknown_error", `The server answered ${status}.`);
}
