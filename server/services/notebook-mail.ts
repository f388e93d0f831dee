/**
 * The student's e-mail when an instructor reviews a notebook entry. The review is committed
 * first; the message goes out afterwards through the instructors' mailer (server/mail: the
 * in-process SMTP fake and admin outbox, or SMTP_URL), one at a time in the background, so a
 * slow or broken mail server never holds up or fails the request. The comment row records
 * "pending" -> "sent" or "failed", which the entry page shows.
 */
import { REVIEW_STATUS_LABELS } from "../../shared/api/notebook";
import type { AppContext } from "../context";
import type { Db } from "../db/database";
import { headerText } from "../mail/headers";
import { teachingRuntime } from "../mail/runtime";
import { escapeHtml, type MailContent } from "../mail/templates";

export interface ReviewMailInput {
  studentName: string;
  reviewerName: string;
  entryTitle: string;
  status: "reviewed" | "needs-rework";
  comment: string;
  link: string;
}

export function notebookReviewMail(input: ReviewMailInput): MailContent {
  const title = headerText(input.entryTitle, 120);
  const reviewer = headerText(input.reviewerName, 120);
  const verdict = input.status === "reviewed" ? "has been reviewed" : "needs rework";
  const subject = headerText(`Your notebook entry "${title}" ${verdict}`);
  const comment = input.comment.trim();
  const text = [
    `Hello ${headerText(input.studentName, 120)},`,
    "",
    `${reviewer} marked your forge notebook entry "${title}" as: ${REVIEW_STATUS_LABELS[input.status]}.`,
    ...(comment ? ["", "Their comment:", "", ...comment.split(/\r?\n/).map((line) => `> ${line}`)] : []),
    "",
    "Open the entry:",
    input.link,
    "",
    "— Grain & Edge",
    "",
  ].join("\n");
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(subject)}</title></head>
<body style="margin:0;padding:24px;background:#f6f1e8;color:#1a1714;font-family:Inter,Segoe UI,Helvetica,Arial,sans-serif;font-size:16px;line-height:1.55;">
<p>Hello ${escapeHtml(headerText(input.studentName, 120))},</p>
<p><strong>${escapeHtml(reviewer)}</strong> marked your forge notebook entry <strong>${escapeHtml(title)}</strong> as <strong>${escapeHtml(REVIEW_STATUS_LABELS[input.status])}</strong>.</p>
${comment ? `<blockquote style="margin:16px 0;padding:8px 16px;border-left:4px solid #c08a45;background:#fcfaf6;white-space:pre-wrap;">${escapeHtml(comment)}</blockquote>` : ""}
<p style="margin:24px 0;"><a href="${escapeHtml(input.link)}" style="display:inline-block;background:#f26d1d;color:#0f0d0b;font-weight:bold;text-decoration:none;padding:12px 20px;border-radius:6px;">Open the entry</a></p>
<p style="font-size:13px;color:#524a43;">Grain &amp; Edge — lessons on the physical metallurgy of blade steels.</p>
</body></html>`;
  return { subject, text, html };
}

export interface ReviewNotifier {
  /** Send the e-mail for this comment after whatever is already queued. */
  enqueue(commentId: number, linkBase: string): void;
  /** Resolves when every queued e-mail has been sent or has failed (tests, shutdown). */
  idle(): Promise<void>;
}

const notifiers = new WeakMap<Db, ReviewNotifier>();

export function reviewNotifierOf(db: Db): ReviewNotifier | undefined {
  return notifiers.get(db);
}

export function reviewNotifier(ctx: AppContext): ReviewNotifier {
  const existing = notifiers.get(ctx.db);
  if (existing) return existing;
  const { db, logger } = ctx;
  const runtime = teachingRuntime(ctx);
  let chain: Promise<void> = Promise.resolve();

  const setNotification = (id: number, notification: "sent" | "failed") =>
    db.write((transaction) => db.models.NotebookComment.update({ notification }, { where: { id }, transaction }));

  async function sendOne(commentId: number, linkBase: string): Promise<void> {
    const comment = await db.read(() => db.models.NotebookComment.findByPk(commentId, { include: [{ model: db.models.User, as: "author", attributes: ["displayName"] }] }));
    if (!comment || comment.status === null || comment.notification !== "pending") return;
    const entry = await db.read(() => db.models.NotebookEntry.findByPk(comment.entryId, { include: [{ model: db.models.User, as: "owner", attributes: ["email", "displayName", "disabledAt"] }] }));
    const student = entry?.owner;
    if (!entry || !student || student.disabledAt) {
      await setNotification(commentId, "failed");
      return;
    }
    const content = notebookReviewMail({
      studentName: student.displayName,
      reviewerName: comment.author?.displayName ?? "Your instructor",
      entryTitle: entry.title,
      status: comment.status,
      comment: comment.body,
      link: `${runtime.settings.publicUrl ?? linkBase}/notebook/${entry.id}`,
    });
    try {
      await runtime.mailer.send({ ...content, to: { address: student.email, name: student.displayName } });
      await setNotification(commentId, "sent");
    } catch (err) {
      logger.warn("notebook review e-mail failed", { commentId, error: String((err as { code?: string })?.code ?? "send failed") });
      await setNotification(commentId, "failed");
    }
  }

  const notifier: ReviewNotifier = {
    enqueue(commentId, linkBase) {
      chain = chain.then(() => sendOne(commentId, linkBase)).catch((err) => logger.error("notebook review e-mail step failed", { commentId, error: String(err) }));
    },
    idle: () => chain,
  };
  notifiers.set(db, notifier);
  // Let queued e-mails finish before the mailer (wrapped by teachingRuntime) and the database close.
  const closeDb = db.close.bind(db);
  db.close = async () => {
    await chain;
    await closeDb();
  };
  return notifier;
}
