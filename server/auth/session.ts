import type { RequestHandler } from "express";
import session from "express-session";
import type { Config } from "../config";
import type { Db } from "../db/database";
import { QueuedSessionStore } from "./session-store";

/** `__Host-` requires Secure, Path=/ and no Domain, so it is only used over HTTPS. */
export const sessionCookieName = (secure: boolean) => (secure ? "__Host-ge.sid" : "ge.sid");

/**
 * express-session in the SQLite database. Cookie: httpOnly, SameSite=Lax, Secure over HTTPS,
 * Max-Age = inactivity timeout, renewed on each response (rolling). The absolute timeout is
 * enforced separately (enforceAbsoluteTimeout) from the sign-in time kept in the session.
 * Session ids are express-session's 24 random bytes (192 bits).
 */
export function createSession(
  config: Config,
  db: Db,
): { middleware: RequestHandler; store: QueuedSessionStore; cookieName: string } {
  // Touch (extend) the stored expiry at most every 60 s, or a tenth of the idle timeout if shorter.
  const store = new QueuedSessionStore(db, Math.min(60_000, Math.floor(config.session.idleTimeoutMs / 10)));
  const cookieName = sessionCookieName(config.cookieSecure);
  const middleware = session({
    name: cookieName,
    secret: config.sessionSecret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    unset: "destroy",
    cookie: {
      httpOnly: true,
      sameSite: "lax",
      secure: config.cookieSecure,
      path: "/",
      maxAge: config.session.idleTimeoutMs,
    },
  });
  return { middleware, store, cookieName };
}

/** Sign out sessions older than the absolute timeout, whatever their activity. */
export function enforceAbsoluteTimeout(absoluteTimeoutMs: number): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next();
    const signedInAt = req.session?.signedInAt;
    if (signedInAt !== undefined && Date.now() - signedInAt <= absoluteTimeoutMs) return next();
    req.user = undefined;
    req.session.destroy((err) => next(err));
  };
}
