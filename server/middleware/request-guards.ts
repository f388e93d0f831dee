import type { Request, RequestHandler } from "express";
import { HttpError } from "../errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);
export const isUnsafeMethod = (req: Request) => !SAFE_METHODS.has(req.method);

/** API responses can hold personal data: never cache them (ASVS 14.3.2). */
export const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader("Cache-Control", "no-store");
  next();
};

/**
 * Defence in depth against cross-site requests (besides the CSRF token and SameSite cookie):
 * an unsafe request must not come from another site. Browsers send Sec-Fetch-Site, which pages
 * cannot forge; when it is present it decides. Otherwise (older browsers) Origin must be this
 * site or one of `allowedOrigins` (e.g. the Vite dev server, whose proxy rewrites Host).
 * Requests with neither header (curl, server-to-server) are left to the CSRF token.
 */
export function rejectCrossSite(allowedOrigins: readonly string[] = []): RequestHandler {
  const allowed = new Set(allowedOrigins);
  return (req, _res, next) => {
    if (!isUnsafeMethod(req)) return next();
    const site = req.get("sec-fetch-site");
    if (site !== undefined) {
      if (site === "same-origin" || site === "none") return next();
      throw new HttpError(403, "csrf_failed", "Cross-site requests are not allowed.");
    }
    const origin = req.get("origin");
    if (origin !== undefined && origin !== `${req.protocol}://${req.host}` && !allowed.has(origin)) {
      throw new HttpError(403, "csrf_failed", "Cross-site requests are not allowed.");
    }
    next();
  };
}

/**
 * JSON routes accept only application/json bodies (415 otherwise), so a cross-site HTML form
 * (text/plain, urlencoded, multipart: all "simple" types) can never reach them. Bodyless unsafe
 * requests (e.g. logout with Content-Length: 0) pass. Upload routes opt in to multipart via
 * `allowMultipart(req)` (see server/policy.ts).
 */
export function requireJsonBody(allowMultipart: (req: Request) => boolean): RequestHandler {
  return (req, _res, next) => {
    if (!isUnsafeMethod(req)) return next();
    const hasBody = req.get("transfer-encoding") !== undefined || Number(req.get("content-length") ?? 0) > 0;
    if (!hasBody) return next();
    if (req.is("application/json")) return next();
    if (req.is("multipart/form-data") && allowMultipart(req)) return next();
    throw new HttpError(415, "unsupported_media_type", "Send the request body as application/json.");
  };
}
