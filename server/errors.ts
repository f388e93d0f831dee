import type { ApiErrorCode } from "../shared/api/errors";

/**
 * Throw (or pass to next) an HttpError from any handler; the JSON error handler turns it into
 * `{ error: { code, message, fields? } }` with `status`. Express 5 forwards async rejections.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    /** Extra response headers, e.g. Retry-After for 429/503. */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
    this.name = "HttpError";
  }
}

export const unauthenticated = () => new HttpError(401, "unauthenticated", "Sign in to continue.");
export const forbidden = () => new HttpError(403, "forbidden", "You are not allowed to do that.");
/** Object-level denials answer 404 too, so ids of other people's records are not confirmed. */
export const notFound = (what = "That item") => new HttpError(404, "not_found", `${what} was not found.`);
