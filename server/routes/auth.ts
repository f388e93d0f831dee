import { Router, type Request } from "express";
import {
  loginRequestSchema,
  passwordChangeRequestSchema,
  type CsrfResponse,
  type PasswordChangeRequest,
  type SessionResponse,
} from "../../shared/api/auth";
import { requiredWaitMs } from "../auth/account-throttle";
import { issueCsrfToken } from "../auth/csrf";
import type { CheckCredentials } from "../auth/credentials";
import { loginRateLimit } from "../auth/login-rate-limit";
import type { LoginFailure, PassportInstance as Passport } from "../auth/passport";
import { hashPassword, verifyPassword } from "../auth/passwords";
import type { QueuedSessionStore } from "../auth/session-store";
import type { AppContext } from "../context";
import { HttpError, unauthenticated } from "../errors";
import { currentUser, requireAuth } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { recordAudit } from "../services/audit";


export interface AuthRouterDeps {
  passport: Passport;
  store: QueuedSessionStore;
  cookieName: string;
  checkCredentials: CheckCredentials;
}

const INVALID_CREDENTIALS = "The e-mail address or password is not correct.";

function throttled(retryAfterS: number): HttpError {
  return new HttpError(429, "rate_limited", "Too many failed sign-in attempts for this account. Wait a moment and try again.", undefined, {
    "Retry-After": String(Math.max(1, retryAfterS)),
  });
}

/** Promisified passport.authenticate("local") with a custom callback (no redirects). */
function authenticateLocal(passport: Passport, req: Request): Promise<{ user: Express.User | false; info?: LoginFailure }> {
  return new Promise((resolve, reject) => {
    passport.authenticate("local", (err: unknown, user: Express.User | false, info?: LoginFailure) =>
      err ? reject(err) : resolve({ user, info }),
    )(req, req.res!, (err?: unknown) => (err ? reject(err) : undefined));
  });
}

export function createAuthRouter(ctx: AppContext, deps: AuthRouterDeps): Router {
  const { db, config } = ctx;
  const router = Router();

  // GET /api/auth/csrf -> { csrfToken }. Creates the session if there is none.
  router.get("/csrf", (req, res) => {
    const body: CsrfResponse = { csrfToken: issueCsrfToken(req) };
    res.json(body);
  });

  // POST /api/auth/login {email,password} -> 200 { user } | 401 invalid_credentials | 429
  router.post("/login", loginRateLimit(config.loginRateLimit), validate({ body: loginRequestSchema }), async (req, res) => {
    const { user, info } = await authenticateLocal(deps.passport, req);
    if (!user) {
      if (info?.reason === "throttled") throw throttled(info.retryAfterS ?? 1);
      if (info?.reason === "unpaid") {
        throw new HttpError(403, "payment_incomplete", "The payment for this self-study account has not gone through, so it cannot sign in yet. Try again in a few minutes, or buy the pass again on the Join page.");
      }
      throw new HttpError(401, "invalid_credentials", INVALID_CREDENTIALS);
    }
    // passport 0.7 regenerates the session here: new id, old one destroyed in the store.
    await new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
    req.session.signedInAt = Date.now();
    const body: SessionResponse = { user };
    res.json(body);
  });

  // POST /api/auth/logout -> 204. Destroys the session row and clears the cookie.
  router.post("/logout", async (req, res) => {
    const user = req.user;
    if (user) {
      await db.write((t) => recordAudit(db, { actorId: user.id, action: "auth.logout", ip: req.ip }, t));
    }
    if (req.session) {
      await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err) : resolve())));
    }
    req.user = undefined;
    res.clearCookie(deps.cookieName, { path: "/", httpOnly: true, sameSite: "lax", secure: config.cookieSecure });
    res.status(204).end();
  });

  // GET /api/auth/me -> { user } | 401
  router.get("/me", (req, res) => {
    if (!req.user) throw unauthenticated();
    const body: SessionResponse = { user: req.user };
    res.json(body);
  });

  // POST /api/auth/password {currentPassword,newPassword} -> 204; ends the user's other sessions.
  router.post("/password", requireAuth, validate({ body: passwordChangeRequestSchema }), async (req, res) => {
    const me = currentUser(req);
    const { currentPassword, newPassword } = req.body as PasswordChangeRequest;
    const user = await db.read(() => db.models.User.findByPk(me.id));
    if (!user) throw unauthenticated();

    const wait = requiredWaitMs(user.failedLoginCount, user.lastFailedLoginAt, Date.now(), config.accountThrottle);
    if (wait > 0) throw throttled(Math.ceil(wait / 1000));

    if (!(await verifyPassword(user.passwordHash, currentPassword))) {
      await db.write(async (t) => {
        await user.increment("failedLoginCount", { transaction: t });
        await user.update({ lastFailedLoginAt: new Date() }, { transaction: t });
        await recordAudit(db, { actorId: me.id, action: "auth.password_change_failed", ip: req.ip }, t);
      });
      throw new HttpError(400, "validation_failed", "Your current password is not correct.", {
        currentPassword: ["Your current password is not correct."],
      });
    }
    if (newPassword === currentPassword) {
      throw new HttpError(400, "validation_failed", "Choose a new password.", {
        newPassword: ["The new password must differ from the current one."],
      });
    }

    const passwordHash = await hashPassword(newPassword);
    await db.write(async (t) => {
      await user.update({ passwordHash, failedLoginCount: 0, lastFailedLoginAt: null }, { transaction: t });
      await recordAudit(db, { actorId: me.id, action: "auth.password_changed", targetType: "user", targetId: me.id, ip: req.ip }, t);
    });
    await deps.store.endSessionsForUser(me.id, req.sessionID);
    res.status(204).end();
  });

  return router;
}

