/**
 * Sends pending invitations, one at a time, in the background: each send draws a NEW token
 * (only its hash is stored), sets the expiry and e-mails the link. When the mail server is down
 * the invitation stays "pending" with a growing back-off, and `retryDue` (run by the jobs timer,
 * or directly in tests) sends it again later. HTTP requests only enqueue; they never wait for SMTP.
 */
import { Op } from "sequelize";
import type { Db } from "../db/database";
import type { Logger } from "../log";
import type { Mailer } from "../mail/mailer";
import type { MailSettings } from "../mail/settings";
import { invitationMail } from "../mail/templates";
import { hashInvitationToken, newInvitationToken } from "./invitations";

/** A claimed send that never finished (crash) becomes due again after this long. */
const CLAIM_LEASE_MS = 5 * 60_000;
const BACKOFF_BASE_MS = 60_000;
const BACKOFF_MAX_MS = 60 * 60_000;

export function backoffMs(attempts: number): number {
  return Math.min(BACKOFF_MAX_MS, BACKOFF_BASE_MS * 2 ** Math.max(0, attempts - 1));
}

/** A short reason an instructor can read; never the server's full error text. */
function sendErrorSummary(err: unknown): string {
  const code = (err as { code?: unknown })?.code;
  return typeof code === "string" && /^[A-Z0-9_]{2,40}$/.test(code)
    ? `The mail server could not take the message (${code}). It will be retried.`
    : "The mail server could not take the message. It will be retried.";
}

export class InvitationDispatcher {
  private chain: Promise<void> = Promise.resolve();
  private readonly inFlight = new Set<number>();

  constructor(
    private readonly db: Db,
    private readonly mailer: Mailer,
    private readonly settings: MailSettings,
    private readonly logger: Logger,
  ) {}

  /** Send these invitations after whatever is already queued. */
  enqueue(ids: number[]): void {
    if (ids.length === 0) return;
    this.chain = this.chain.then(() => this.sendAll(ids)).catch((err) => this.logger.error("invitation dispatch failed", { error: String(err) }));
  }

  /** Resolves when every queued send has finished (tests and shutdown). */
  idle(): Promise<void> {
    return this.chain;
  }

  /** Send every pending invitation whose retry time has come. Returns how many were attempted. */
  async retryDue(now = new Date()): Promise<number> {
    const due = await this.db.read(() =>
      this.db.models.Invitation.findAll({
        where: { status: "pending", nextSendAt: { [Op.lte]: now } },
        attributes: ["id"],
        order: [["nextSendAt", "ASC"]],
        limit: 200,
        raw: true,
      }),
    );
    const ids = due.map((r) => r.id).filter((id) => !this.inFlight.has(id));
    const run = this.chain.then(() => this.sendAll(ids, now));
    this.chain = run.catch(() => undefined);
    await run;
    return ids.length;
  }

  private async sendAll(ids: number[], asOf?: Date): Promise<void> {
    for (const id of ids) {
      if (this.inFlight.has(id)) continue;
      this.inFlight.add(id);
      try {
        await this.sendOne(id, asOf ?? new Date());
      } catch (err) {
        // The database itself failed (e.g. closing): leave the row pending for the next run.
        this.logger.warn("invitation send skipped", { invitationId: id, error: String(err) });
      } finally {
        this.inFlight.delete(id);
      }
    }
  }

  private async sendOne(id: number, asOf: Date): Promise<void> {
    const { db, settings } = this;
    const { Invitation, Cohort, User } = db.models;
    const token = newInvitationToken();
    const tokenHash = hashInvitationToken(token);
    const now = new Date();

    // 1. Claim: new token hash, new expiry, one more attempt; a lease so no other run sends it meanwhile.
    const claimed = await db.write(async (transaction) => {
      const row = await Invitation.findByPk(id, {
        include: [{ model: Cohort, as: "cohort", include: [{ model: User, as: "instructor", attributes: ["displayName"] }] }],
        transaction,
      });
      if (!row || row.status !== "pending" || !row.cohort || row.cohort.archivedAt) return null;
      if (row.nextSendAt && new Date(row.nextSendAt).getTime() > asOf.getTime() + 1000) return null; // not due, or claimed by another run
      await row.update(
        {
          tokenHash,
          expiresAt: new Date(now.getTime() + settings.invitationTtlMs),
          sendAttempts: row.sendAttempts + 1,
          nextSendAt: new Date(now.getTime() + CLAIM_LEASE_MS),
        },
        { transaction },
      );
      return row;
    });
    if (!claimed) return;

    // 2. Send, outside any transaction.
    const link = `${settings.publicUrl ?? claimed.linkBase}/invite/${token}`;
    const content = invitationMail({
      recipientName: claimed.displayName,
      cohortName: claimed.cohort!.name,
      instructorName: claimed.cohort!.instructor?.displayName ?? "Your instructor",
      link,
      expiresAt: claimed.expiresAt!,
    });
    let failure: unknown = null;
    try {
      await this.mailer.send({ ...content, to: { address: claimed.email, name: claimed.displayName } });
    } catch (err) {
      failure = err;
    }

    // 3. Record the outcome, unless the invitation changed meanwhile (revoked, resent).
    await db.write(async (transaction) => {
      const row = await Invitation.findByPk(id, { transaction });
      if (!row || row.status !== "pending" || row.tokenHash !== tokenHash) return;
      if (failure) {
        await row.update(
          { lastSendError: sendErrorSummary(failure), nextSendAt: new Date(Date.now() + backoffMs(row.sendAttempts)) },
          { transaction },
        );
      } else {
        await row.update({ status: "sent", sentAt: new Date(), lastSendError: null, nextSendAt: null }, { transaction });
      }
    });
    if (failure) {
      this.logger.warn("invitation e-mail failed; will retry", { invitationId: id, error: sendErrorSummary(failure) });
    }
  }
}
