import { literal } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import type { AppContext } from "../context";
import { hasEverPaid } from "../billing/passes";
import { recordAudit } from "../services/audit";
import { requiredWaitMs, UnknownEmailThrottle } from "./account-throttle";
import { verifyAgainstDummy, verifyPassword } from "./passwords";
import { normalizeEmail, toPublicUser } from "./public-user";

export type CredentialCheck =
  | { ok: true; user: PublicUser }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "unpaid" }
  | { ok: false; reason: "throttled"; retryAfterS: number };

/**
 * Check an e-mail + password. Unknown e-mail, wrong password and disabled account all give the
 * same "invalid" result after the same amount of argon2 work (no enumeration). Successes and
 * failures are audited; failures bump the per-account delay.
 */
export function createCredentialChecker(ctx: AppContext) {
  const { db, config } = ctx;
  const { User } = db.models;
  const unknownEmails = new UnknownEmailThrottle(config.accountThrottle);

  return async function checkCredentials(rawEmail: string, password: string, ip: string | undefined): Promise<CredentialCheck> {
    const email = normalizeEmail(rawEmail);
    const now = Date.now();
    const user = await db.read(() => User.findOne({ where: { email } }));

    if (!user) {
      const wait = unknownEmails.waitMs(email, now);
      if (wait > 0) return { ok: false, reason: "throttled", retryAfterS: Math.ceil(wait / 1000) };
      await verifyAgainstDummy(password);
      unknownEmails.recordFailure(email, Date.now());
      await db.write((t) =>
        recordAudit(db, { actorId: null, action: "auth.login_failed", details: { email, reason: "unknown_email" }, ip }, t),
      );
      return { ok: false, reason: "invalid" };
    }

    const wait = requiredWaitMs(user.failedLoginCount, user.lastFailedLoginAt, now, config.accountThrottle);
    if (wait > 0) return { ok: false, reason: "throttled", retryAfterS: Math.ceil(wait / 1000) };

    const passwordOk = await verifyPassword(user.passwordHash, password);
    // A self-study account signs in only once its pass payment has succeeded (server/billing/).
    if (passwordOk && !user.disabledAt && user.kind === "self" && !(await hasEverPaid(db, user.id))) return { ok: false, reason: "unpaid" };
    if (passwordOk && !user.disabledAt) {
      await db.write(async (t) => {
        if (user.failedLoginCount > 0) {
          await User.update({ failedLoginCount: 0, lastFailedLoginAt: null }, { where: { id: user.id }, transaction: t });
        }
        await recordAudit(db, { actorId: user.id, action: "auth.login", ip }, t);
      });
      return { ok: true, user: toPublicUser(user) };
    }

    await db.write(async (t) => {
      if (!passwordOk) {
        // Atomic increment: concurrent failures cannot overwrite each other's count.
        await User.update(
          { failedLoginCount: literal('"failedLoginCount" + 1') as unknown as number, lastFailedLoginAt: new Date() },
          { where: { id: user.id }, transaction: t },
        );
      }
      const reason = passwordOk ? "disabled" : "wrong_password";
      await recordAudit(db, { actorId: null, action: "auth.login_failed", targetType: "user", targetId: user.id, details: { email, reason }, ip }, t);
    });
    return { ok: false, reason: "invalid" };
  };
}

export type CheckCredentials = ReturnType<typeof createCredentialChecker>;
