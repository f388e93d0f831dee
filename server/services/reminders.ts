/**
 * Due-date reminders: e-mail each student of an active cohort who has not finished an assignment
 * due within the next N days (REMINDER_DAYS_BEFORE). Safe to run twice, or twice at once: a
 * ReminderLog row, UNIQUE(userId, assignmentId, kind), is claimed in a queued write before the
 * e-mail goes out, and only the run that claimed it sends. A failed send leaves the row unsent
 * and unclaimed, so the next run tries again (at most MAX_ATTEMPTS times).
 */
import { Op } from "sequelize";
import type { Db } from "../db/database";
import type { Logger } from "../log";
import type { Mailer } from "../mail/mailer";
import type { MailSettings } from "../mail/settings";
import { reminderMail } from "../mail/templates";
import { loadLearnerWork, moduleWork, progressOf } from "./gradebook-completion";
import type { CourseCatalog } from "./lessons/catalog";

export const REMINDER_KIND = "due-soon";
const MAX_ATTEMPTS = 5;
/** A claim older than this belongs to a run that died; another run may take it over. */
const STALE_CLAIM_MS = 10 * 60_000;
const DAY_MS = 86_400_000;

export interface ReminderRunResult {
  /** Student × assignment pairs that needed a reminder. */
  candidates: number;
  sent: number;
  failed: number;
  /** Already reminded (or being reminded by another run). */
  skipped: number;
}

interface Candidate {
  userId: number;
  email: string;
  displayName: string;
  assignmentId: number;
  cohortName: string;
  moduleTitle: string;
  dueAt: Date;
  progress: ReturnType<typeof progressOf>;
}

async function findCandidates(db: Db, catalog: CourseCatalog, daysBefore: number, now: Date): Promise<Candidate[]> {
  return db.read(async () => {
    const { Assignment, Cohort, Module, Enrollment, User } = db.models;
    const assignments = await Assignment.findAll({
      where: { dueAt: { [Op.gt]: now, [Op.lte]: new Date(now.getTime() + daysBefore * DAY_MS) } },
      include: [
        { model: Cohort, as: "cohort", where: { archivedAt: null }, attributes: ["id", "name"] },
        { model: Module, as: "module" },
      ],
    });
    const out: Candidate[] = [];
    for (const a of assignments) {
      const work = moduleWork(catalog, a.module?.slug ?? "", a.module?.title);
      const enrollments = await Enrollment.findAll({
        where: { cohortId: a.cohortId },
        include: [{ model: User, as: "student", where: { disabledAt: null, role: "student" }, attributes: ["id", "email", "displayName"] }],
      });
      const learners = await loadLearnerWork(db, catalog, enrollments.map((e) => e.studentId), work.lessons.map((l) => l.slug), work.quizIds);
      for (const e of enrollments) {
        const progress = progressOf(work, learners.get(e.studentId));
        if (progress.finished) continue;
        out.push({
          userId: e.studentId,
          email: e.student!.email,
          displayName: e.student!.displayName,
          assignmentId: a.id,
          cohortName: (a as unknown as { cohort: { name: string } }).cohort.name,
          moduleTitle: work.title,
          dueAt: new Date(a.dueAt),
          progress,
        });
      }
    }
    return out;
  });
}

/** Claim the reminder for this run: true when this run should send it. */
async function claim(db: Db, c: Candidate, now: Date): Promise<boolean> {
  return db.write(async (transaction) => {
    const { ReminderLog } = db.models;
    const row = await ReminderLog.findOne({ where: { userId: c.userId, assignmentId: c.assignmentId, kind: REMINDER_KIND }, transaction });
    if (!row) {
      await ReminderLog.create({ userId: c.userId, assignmentId: c.assignmentId, kind: REMINDER_KIND, claimedAt: now, attempts: 1 }, { transaction });
      return true;
    }
    if (row.sentAt || row.attempts >= MAX_ATTEMPTS) return false;
    if (row.claimedAt && now.getTime() - new Date(row.claimedAt).getTime() < STALE_CLAIM_MS) return false;
    await row.update({ claimedAt: now, attempts: row.attempts + 1 }, { transaction });
    return true;
  });
}

export async function runReminders(
  deps: { db: Db; mailer: Mailer; settings: MailSettings; logger: Logger; catalog: CourseCatalog },
  now = new Date(),
): Promise<ReminderRunResult> {
  const { db, mailer, settings, logger, catalog } = deps;
  const candidates = await findCandidates(db, catalog, settings.reminderDaysBefore, now);
  const result: ReminderRunResult = { candidates: candidates.length, sent: 0, failed: 0, skipped: 0 };
  for (const c of candidates) {
    if (!(await claim(db, c, now))) {
      result.skipped += 1;
      continue;
    }
    const content = reminderMail({
      recipientName: c.displayName,
      cohortName: c.cohortName,
      moduleTitle: c.moduleTitle,
      dueAt: c.dueAt,
      lessonsDone: c.progress.lessonsDone,
      lessonsTotal: c.progress.lessonsTotal,
      quizzesPassed: c.progress.quizzesPassed,
      quizzesTotal: c.progress.quizzesTotal,
      link: `${settings.fallbackBase}/learn`,
    });
    try {
      await mailer.send({ ...content, to: { address: c.email, name: c.displayName } });
      await db.write((t) => db.models.ReminderLog.update({ sentAt: new Date() }, { where: { userId: c.userId, assignmentId: c.assignmentId, kind: REMINDER_KIND }, transaction: t }));
      result.sent += 1;
    } catch (err) {
      // Release the claim so the next run retries.
      await db.write((t) => db.models.ReminderLog.update({ claimedAt: null }, { where: { userId: c.userId, assignmentId: c.assignmentId, kind: REMINDER_KIND, sentAt: null }, transaction: t }));
      logger.warn("reminder e-mail failed; will retry", { userId: c.userId, assignmentId: c.assignmentId, error: err instanceof Error ? err.message.slice(0, 200) : "unknown" });
      result.failed += 1;
    }
  }
  if (result.sent || result.failed) logger.info("reminders run", { ...result });
  return result;
}
