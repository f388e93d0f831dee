/**
 * The instructors' background machinery for one app: the mailer (in-process SMTP fake or
 * SMTP_URL), the invitation dispatcher, and a timer that retries pending invitations and sends
 * due-date reminders (not in tests: they call `runJobs` directly).
 *
 * One runtime per database (WeakMap), created by the teaching routers. createApp's close() calls
 * `closeTeachingRuntime(db)` before closing the database: timers stop, queued sends finish and
 * the SMTP fake shuts down while the database can still record them.
 */
import type { JobsRunResult } from "../../shared/api/admin";
import type { AppContext } from "../context";
import type { Db } from "../db/database";
import { InvitationDispatcher } from "../services/invitations-dispatch";
import { getCourseCatalog } from "../services/lessons/course";
import { runReminders } from "../services/reminders";
import { createMailer, type Mailer } from "./mailer";
import { mailSettings, type MailSettings } from "./settings";

export type JobsResult = JobsRunResult;

export interface TeachingRuntime {
  settings: MailSettings;
  mailer: Mailer;
  invitations: InvitationDispatcher;
  /** Retry due invitations, then send due-date reminders. Overlapping calls share one run. */
  runJobs(now?: Date): Promise<JobsResult>;
  close(): Promise<void>;
}

const runtimes = new WeakMap<Db, TeachingRuntime>();

export function teachingRuntimeOf(db: Db): TeachingRuntime | undefined {
  return runtimes.get(db);
}

/** Stop the jobs timer, wait for running jobs and sends, close the mailer (and SMTP fake). Idempotent. */
export async function closeTeachingRuntime(db: Db): Promise<void> {
  await runtimes.get(db)?.close();
}

export function teachingRuntime(ctx: AppContext): TeachingRuntime {
  const existing = runtimes.get(ctx.db);
  if (existing) return existing;

  const settings = mailSettings(ctx.config);
  const mailer = createMailer({ smtpUrl: ctx.config.smtpUrl, from: settings.from, db: ctx.db, logger: ctx.logger });
  const invitations = new InvitationDispatcher(ctx.db, mailer, settings, ctx.logger);
  let running: Promise<JobsResult> | null = null;
  let timer: NodeJS.Timeout | null = null;
  let closed = false;

  const runJobs = (now?: Date): Promise<JobsResult> => {
    running ??= (async () => {
      try {
        const invitationsAttempted = await invitations.retryDue(now);
        const reminders = await runReminders({ db: ctx.db, mailer, settings, logger: ctx.logger, catalog: await getCourseCatalog() }, now);
        return { invitationsAttempted, reminders };
      } finally {
        running = null;
      }
    })();
    return running;
  };

  if (settings.runJobs) {
    const tick = () => {
      if (closed) return;
      runJobs().catch((err) => ctx.logger.warn("teaching jobs failed; next run in one interval", { error: String(err) }));
    };
    timer = setInterval(tick, settings.jobsIntervalMs);
    timer.unref();
    // A first run shortly after start-up picks up invitations left pending by a restart.
    setTimeout(tick, 5_000).unref();
  }

  const runtime: TeachingRuntime = {
    settings,
    mailer,
    invitations,
    runJobs,
    async close() {
      if (closed) return;
      closed = true;
      if (timer) clearInterval(timer);
      await running?.catch(() => undefined);
      await invitations.idle();
      await mailer.close();
    },
  };
  runtimes.set(ctx.db, runtime);
  return runtime;
}
