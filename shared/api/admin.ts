/**
 * School administration: accounts (role changes, disabling), and the outbox of the in-process
 * mail fake. The audit log has its own resource (shared/api/audit.ts).
 */
import { z } from "zod";
import { roleSchema, type Role } from "./auth";
import { idParam } from "./cohorts";

export const ADMIN_USERS_PAGE_SIZE = 50;

export const adminUsersQuerySchema = z.object({
  q: z.string().trim().max(100).optional(),
  role: roleSchema.optional(),
  status: z.enum(["active", "disabled"]).optional(),
  page: z.coerce.number().int().min(1).max(10_000).optional().default(1),
});
export type AdminUsersQuery = z.infer<typeof adminUsersQuerySchema>;

export const userParamsSchema = z.object({ userId: idParam("user") });

export const updateUserRequestSchema = z
  .strictObject({ role: roleSchema.optional(), disabled: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, "Send at least one change.");
export type UpdateUserRequest = z.infer<typeof updateUserRequestSchema>;

export interface AdminUser {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  disabled: boolean;
  createdAt: string;
  lastSignInAt: string | null;
  cohortsTaught: number;
  cohortsEnrolled: number;
}

/** GET /api/admin/users */
export interface AdminUsersResponse {
  users: AdminUser[];
  total: number;
  page: number;
  pageSize: number;
}

/** PATCH /api/admin/users/:userId */
export interface UpdateUserResponse {
  user: AdminUser;
  /** Sessions ended by this change (disabling a user ends all of them). */
  sessionsEnded: number;
}

export const outboxQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).optional().default(50),
  before: z.coerce.number().int().min(1).optional(),
});

export const outboxParamsSchema = z.object({ messageId: idParam("message") });

export interface OutboxSummary {
  id: number;
  from: string;
  to: string;
  subject: string;
  receivedAt: string;
  /** The plain-text part. */
  text: string;
  /** Links found in the plain-text part (e.g. the invitation link). */
  links: string[];
}

/** GET /api/admin/outbox */
export interface OutboxResponse {
  /** True when mail goes to the in-process fake (no SMTP_URL); otherwise the outbox only holds older messages. */
  fakeTransport: boolean;
  messages: OutboxSummary[];
  nextBefore: number | null;
}

/** GET /api/admin/outbox/:messageId */
export interface OutboxMessageDetail extends OutboxSummary {
  html: string | null;
  messageId: string | null;
  sizeBytes: number;
}

/** POST /api/admin/jobs/run: what the background jobs did when run now. */
export interface JobsRunResult {
  /** Pending invitations whose retry time had come, and were sent again. */
  invitationsAttempted: number;
  reminders: { candidates: number; sent: number; failed: number; skipped: number };
}
