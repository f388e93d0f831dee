/**
 * Self-study passes: who has paid, who has a valid pass now, and activating a pass when the
 * provider reports a succeeded payment. Activation is idempotent (the purchase route and the
 * webhook may both report the same payment, in either order) and runs in the write queue.
 */
import { Op, type Transaction } from "sequelize";
import type { Db } from "../db/database";
import { recordAudit } from "../services/audit";

/** A payment as the provider reports it (only what activation needs). */
export interface SucceededPayment {
  id: string;
  amount: number;
  currency: string;
}

export type ActivationOutcome = "activated" | "already_active" | "unknown_payment" | "amount_mismatch";

/** Pass validity: `months` calendar months after `from`, in UTC. */
export function passValidUntil(from: Date, months: number): Date {
  const until = new Date(from.getTime());
  until.setUTCMonth(until.getUTCMonth() + months);
  return until;
}

/** True once any payment for this user has succeeded (a "self" account may sign in from then on). */
export async function hasEverPaid(db: Db, userId: number): Promise<boolean> {
  const row = await db.read(() => db.models.StudyPass.findOne({ where: { userId, status: "succeeded" }, attributes: ["id"] }));
  return row !== null;
}

/** The end of the user's latest paid pass, or null when they never paid. */
export async function latestPassValidUntil(db: Db, userId: number): Promise<Date | null> {
  const row = await db.read(() =>
    db.models.StudyPass.findOne({ where: { userId, status: "succeeded" }, order: [["validUntil", "DESC"]], attributes: ["validUntil"] }),
  );
  return row?.validUntil ? new Date(row.validUntil) : null;
}

/** True when the user holds a succeeded pass valid at `now`. */
export async function hasValidPass(db: Db, userId: number, now = new Date()): Promise<boolean> {
  const row = await db.read(() =>
    db.models.StudyPass.findOne({ where: { userId, status: "succeeded", validUntil: { [Op.gt]: now } }, attributes: ["id"] }),
  );
  return row !== null;
}

/**
 * Mark the pass for this provider payment as paid, valid for `months` from max(now, the end of the
 * user's latest paid pass): a renewal bought while a pass still runs extends it instead of
 * overlapping, and a first purchase or a lapsed pass starts now. A payment the app does not know
 * (e.g. its sign-up was abandoned) or whose amount or currency differ from what the pass was
 * created for is not activated; the outcome says why.
 */
export async function activatePass(db: Db, payment: SucceededPayment, months: number, now = new Date()): Promise<ActivationOutcome> {
  return db.write(async (transaction: Transaction) => {
    const pass = await db.models.StudyPass.findOne({ where: { providerPaymentId: payment.id }, transaction });
    if (!pass) return "unknown_payment";
    if (pass.status === "succeeded") return "already_active";
    if (pass.amountMinor !== payment.amount || pass.currency !== payment.currency.toLowerCase()) {
      await recordAudit(db, { actorId: null, action: "billing.amount_mismatch", targetType: "user", targetId: pass.userId, details: { paymentId: payment.id, expected: pass.amountMinor, got: payment.amount, currency: payment.currency } }, transaction);
      return "amount_mismatch";
    }
    const latest = await db.models.StudyPass.findOne({ where: { userId: pass.userId, status: "succeeded" }, order: [["validUntil", "DESC"]], transaction });
    const from = latest?.validUntil && latest.validUntil.getTime() > now.getTime() ? new Date(latest.validUntil) : now;
    await pass.update({ status: "succeeded", paidAt: now, validUntil: passValidUntil(from, months) }, { transaction });
    await recordAudit(db, { actorId: pass.userId, action: "billing.pass_activated", targetType: "user", targetId: pass.userId, details: { paymentId: payment.id, amountMinor: pass.amountMinor, currency: pass.currency } }, transaction);
    return "activated";
  });
}
