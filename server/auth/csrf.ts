import { csrfSync } from "csrf-sync";
import type { Request, RequestHandler } from "express";
import { HttpError } from "../errors";
import { isUnsafeMethod } from "../middleware/request-guards";

/**
 * Synchronizer-token CSRF protection (csrf-sync): the token lives in the session and must come
 * back in the `x-csrf-token` header on every unsafe request, including sign-in. GET
 * /api/auth/csrf issues it (creating the session). Signing in and out regenerates the session,
 * which drops the token, so the client fetches a new one afterwards.
 */
const { generateToken, isRequestValid } = csrfSync({
  getTokenFromRequest: (req) => req.get("x-csrf-token"),
  size: 32, // 256 bits
});

export function issueCsrfToken(req: Request): string {
  return generateToken(req);
}

export const csrfProtection: RequestHandler = (req, _res, next) => {
  if (!isUnsafeMethod(req)) return next();
  if (!req.session || !isRequestValid(req)) {
    throw new HttpError(403, "csrf_failed", "Missing or invalid CSRF token. Reload the page and try again.");
  }
  next();
};
