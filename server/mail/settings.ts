/**
 * Settings of the instructors' mail and jobs, from the environment (validated like server/config.ts):
 *   PUBLIC_URL                   origin used in e-mailed links (default: the inviting request's origin;
 *                                for reminders http://localhost:PORT)
 *   MAIL_FROM                    sender, default "Grain & Edge <no-reply@grain-edge.test>"
 *   INVITATION_TTL_DAYS          how long an invitation link works (default 7)
 *   REMINDER_DAYS_BEFORE         remind students this many days before a due date (default 2)
 *   JOBS_INTERVAL_SECONDS        how often the reminder and retry jobs run (default 300)
 *   SMTP_URL (server/config.ts)  send through a real SMTP server instead of the in-process fake
 */
import { z } from "zod";
import type { Config } from "../config";

const schema = z.object({
  PUBLIC_URL: z
    .url()
    .refine((u) => /^https?:\/\//.test(u), "PUBLIC_URL must be an http(s) URL.")
    .transform((u) => u.replace(/\/+$/, ""))
    .optional(),
  MAIL_FROM: z.string().min(3).max(200).optional(),
  INVITATION_TTL_DAYS: z.coerce.number().int().min(1).max(60).optional().default(7),
  REMINDER_DAYS_BEFORE: z.coerce.number().int().min(0).max(30).optional().default(2),
  JOBS_INTERVAL_SECONDS: z.coerce.number().int().min(5).max(86_400).optional().default(300),
});

export interface MailSettings {
  publicUrl: string | undefined;
  /** Used when there is no PUBLIC_URL and no request to take the origin from (jobs). */
  fallbackBase: string;
  from: { name: string; address: string };
  invitationTtlMs: number;
  reminderDaysBefore: number;
  jobsIntervalMs: number;
  /** Jobs run on a timer except in tests, which call them directly. */
  runJobs: boolean;
}

export function mailSettings(config: Config, env: Record<string, string | undefined> = process.env): MailSettings {
  const parsed = schema.safeParse(env);
  if (!parsed.success) {
    throw new Error(`Invalid mail configuration:\n${parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n")}`);
  }
  const e = parsed.data;
  const fromMatch = /^\s*(.*?)\s*<([^<>\s]+@[^<>\s]+)>\s*$/.exec(e.MAIL_FROM ?? "");
  return {
    publicUrl: e.PUBLIC_URL,
    fallbackBase: e.PUBLIC_URL ?? `http://localhost:${config.port}`,
    from: fromMatch
      ? { name: fromMatch[1].replace(/"/g, "") || "Grain & Edge", address: fromMatch[2] }
      : e.MAIL_FROM && /^[^<>\s]+@[^<>\s]+$/.test(e.MAIL_FROM)
        ? { name: "Grain & Edge", address: e.MAIL_FROM }
        : { name: "Grain & Edge", address: "no-reply@grain-edge.test" },
    invitationTtlMs: e.INVITATION_TTL_DAYS * 86_400_000,
    reminderDaysBefore: e.REMINDER_DAYS_BEFORE,
    jobsIntervalMs: e.JOBS_INTERVAL_SECONDS * 1000,
    runJobs: config.nodeEnv !== "test",
  };
}
