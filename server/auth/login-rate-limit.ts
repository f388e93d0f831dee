import { rateLimit } from "express-rate-limit";
import type { RequestHandler } from "express";
import type { Config } from "../config";
import { HttpError } from "../errors";

/**
 * Per-IP limit on POST /api/auth/login counting failed attempts only (successful sign-ins are
 * refunded): by default the 11th failure within 15 minutes gets 429 with Retry-After. Memory
 * store: one process owns the database anyway; it resets on restart. Behind a proxy, TRUST_PROXY
 * must be set or every client shares the proxy's bucket.
 */
export function loginRateLimit(cfg: Config["loginRateLimit"]): RequestHandler {
  return rateLimit({
    windowMs: cfg.windowMs,
    limit: cfg.limit,
    standardHeaders: "draft-8",
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    handler: (_req, _res, next) => {
      next(new HttpError(429, "rate_limited", "Too many sign-in attempts from this network. Try again later."));
    },
  });
}
