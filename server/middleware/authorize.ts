import type { NextFunction, Request, RequestHandler, Response } from "express";
import type { PublicUser, Role } from "../../shared/api/auth";
import { forbidden, notFound, unauthenticated } from "../errors";

/**
 * THE authorization module. Every route states its guard here, in order:
 *   router.get("/cohorts/:id", requireRole("instructor", "admin"), loadOwned("cohort", loadCohort, canSeeCohort), handler)
 * and lists itself in server/policy.ts (tests check the table against the routes and the behaviour).
 *
 *  - requireAuth            -> 401 unauthenticated when signed out.
 *  - requireRole(...roles)  -> 401 when signed out, 403 forbidden for other roles (function level).
 *  - loadOwned(key, load, allow) -> loads one record, 404 when missing OR not allowed (object level;
 *    a 404 does not confirm that someone else's record exists), then `owned<T>(res, key)` reads it.
 * The role comes from req.user, which deserializeUser re-reads from the database on every request,
 * so a role change or a disabled account takes effect on the next request.
 */

export function currentUser(req: Request): PublicUser {
  if (!req.user) throw unauthenticated();
  return req.user;
}

export const requireAuth: RequestHandler = (req, _res, next) => {
  currentUser(req);
  next();
};

export function requireRole(...roles: [Role, ...Role[]]): RequestHandler {
  const allowed = new Set<Role>(roles);
  return (req, _res, next) => {
    const user = currentUser(req);
    if (!allowed.has(user.role)) throw forbidden();
    next();
  };
}

type Loader<T> = (req: Request) => Promise<T | null | undefined>;
type Allow<T> = (user: PublicUser, record: T, req: Request) => boolean | Promise<boolean>;

export function loadOwned<T>(key: string, load: Loader<T>, allow: Allow<T>, what = "That item"): RequestHandler {
  return async (req: Request, res: Response, next: NextFunction) => {
    const user = currentUser(req);
    const record = await load(req);
    if (record === null || record === undefined || !(await allow(user, record, req))) throw notFound(what);
    (res.locals.owned ??= {})[key] = record;
    next();
  };
}

/** The record a preceding loadOwned(key, ...) attached. */
export function owned<T>(res: Response, key: string): T {
  const record = (res.locals.owned as Record<string, unknown> | undefined)?.[key];
  if (record === undefined) throw new Error(`owned(): no loadOwned("${key}") ran before this handler`);
  return record as T;
}
