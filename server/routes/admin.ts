import { Router } from "express";
import { Op, col, fn, type WhereOptions } from "sequelize";
import {
  ADMIN_USERS_PAGE_SIZE,
  adminUsersQuerySchema,
  outboxParamsSchema,
  outboxQuerySchema,
  updateUserRequestSchema,
  userParamsSchema,
  type AdminUser,
  type AdminUsersQuery,
  type AdminUsersResponse,
  type OutboxMessageDetail,
  type OutboxResponse,
  type OutboxSummary,
  type UpdateUserRequest,
  type UpdateUserResponse,
} from "../../shared/api/admin";
import type { AppContext } from "../context";
import type { Db } from "../db/database";
import type { OutboxMessageInstance, UserInstance } from "../db/models";
import { HttpError, notFound } from "../errors";
import type { TeachingRuntime } from "../mail/runtime";
import { extractLinks } from "../mail/parse";
import { currentUser, requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";
import { recordAudit } from "../services/audit";

const iso = (d: Date | string) => new Date(d).toISOString();

async function toAdminUsers(db: Db, users: UserInstance[]): Promise<AdminUser[]> {
  const ids = users.map((u) => u.id);
  if (ids.length === 0) return [];
  const { AuditLog, Cohort, Enrollment } = db.models;
  const [signIns, taught, enrolled] = await Promise.all([
    AuditLog.findAll({ attributes: ["actorId", [fn("MAX", col("at")), "last"]], where: { action: "auth.login", actorId: { [Op.in]: ids } }, group: ["actorId"], raw: true }),
    Cohort.findAll({ attributes: ["instructorId", [fn("COUNT", col("id")), "n"]], where: { instructorId: { [Op.in]: ids } }, group: ["instructorId"], raw: true }),
    Enrollment.findAll({ attributes: ["studentId", [fn("COUNT", col("id")), "n"]], where: { studentId: { [Op.in]: ids } }, group: ["studentId"], raw: true }),
  ]);
  const lastSignIn = new Map((signIns as unknown as { actorId: number; last: string }[]).map((r) => [r.actorId, r.last]));
  const taughtBy = new Map((taught as unknown as { instructorId: number; n: number }[]).map((r) => [r.instructorId, Number(r.n)]));
  const enrolledIn = new Map((enrolled as unknown as { studentId: number; n: number }[]).map((r) => [r.studentId, Number(r.n)]));
  return users.map((u) => ({
    id: u.id,
    email: u.email,
    displayName: u.displayName,
    role: u.role,
    disabled: u.disabledAt !== null,
    createdAt: iso(u.createdAt),
    lastSignInAt: lastSignIn.has(u.id) ? iso(lastSignIn.get(u.id)!) : null,
    cohortsTaught: taughtBy.get(u.id) ?? 0,
    cohortsEnrolled: enrolledIn.get(u.id) ?? 0,
  }));
}

const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;

function toOutboxSummary(row: OutboxMessageInstance): OutboxSummary {
  return { id: row.id, from: row.fromAddress, to: row.toAddress, subject: row.subject, receivedAt: iso(row.receivedAt), text: row.text, links: extractLinks(row.text) };
}

/**
 * /api/admin (admins only): accounts (list, change role, disable = end all sessions, end
 * sessions), the outbox of the in-process mail fake, and running the background jobs now.
 * An admin cannot change or disable their own account here, so the school always keeps one.
 */
export function createAdminRouter(ctx: AppContext, rt: TeachingRuntime): Router {
  const router = Router();
  const admin = requireRole("admin");
  const { db } = ctx;
  const { User, Session, OutboxMessage } = db.models;

  // GET /api/admin/users?q=&role=&status=&page= -> AdminUsersResponse
  router.get("/users", admin, validate({ query: adminUsersQuerySchema }), async (req, res) => {
    const { q, role, status, page } = req.query as unknown as AdminUsersQuery;
    const where: WhereOptions = {};
    const and: WhereOptions[] = [];
    if (q) and.push({ [Op.or]: [{ email: { [Op.like]: likePattern(q.toLowerCase()) } }, { displayName: { [Op.like]: likePattern(q) } }] });
    if (role) and.push({ role });
    if (status === "disabled") and.push({ disabledAt: { [Op.ne]: null } });
    if (status === "active") and.push({ disabledAt: null });
    if (and.length) Object.assign(where, { [Op.and]: and });
    const body: AdminUsersResponse = await db.read(async () => {
      const { rows, count } = await User.findAndCountAll({
        where,
        order: [["role", "ASC"], ["displayName", "ASC"], ["id", "ASC"]],
        limit: ADMIN_USERS_PAGE_SIZE,
        offset: (page - 1) * ADMIN_USERS_PAGE_SIZE,
      });
      return { users: await toAdminUsers(db, rows), total: count, page, pageSize: ADMIN_USERS_PAGE_SIZE };
    });
    res.json(body);
  });

  // PATCH /api/admin/users/:userId {role?, disabled?} -> UpdateUserResponse. Disabling ends every session of the user.
  router.patch("/users/:userId", admin, validate({ params: userParamsSchema, body: updateUserRequestSchema }), async (req, res) => {
    const me = currentUser(req);
    const userId = Number(req.params.userId);
    const change = req.body as UpdateUserRequest;
    if (userId === me.id) throw new HttpError(409, "cannot_change_self", "You cannot change your own role or disable your own account.");
    const { row, sessionsEnded } = await db.write(async (transaction) => {
      const user = await User.findByPk(userId, { transaction });
      if (!user) throw notFound("That user");
      let ended = 0;
      if (change.role !== undefined && change.role !== user.role) {
        await recordAudit(db, { actorId: me.id, action: "admin.role_changed", targetType: "user", targetId: user.id, details: { from: user.role, to: change.role }, ip: req.ip }, transaction);
        user.role = change.role;
      }
      if (change.disabled !== undefined && change.disabled !== (user.disabledAt !== null)) {
        user.disabledAt = change.disabled ? new Date() : null;
        if (change.disabled) ended = await Session.destroy({ where: { userId: user.id }, transaction });
        await recordAudit(
          db,
          { actorId: me.id, action: change.disabled ? "admin.user_disabled" : "admin.user_enabled", targetType: "user", targetId: user.id, details: change.disabled ? { sessionsEnded: ended } : {}, ip: req.ip },
          transaction,
        );
      }
      await user.save({ transaction });
      return { row: user, sessionsEnded: ended };
    });
    const [user] = await db.read(() => toAdminUsers(db, [row]));
    const body: UpdateUserResponse = { user, sessionsEnded };
    res.json(body);
  });

  // DELETE /api/admin/users/:userId/sessions -> { sessionsEnded } (sign the user out everywhere)
  router.delete("/users/:userId/sessions", admin, validate({ params: userParamsSchema }), async (req, res) => {
    const me = currentUser(req);
    const userId = Number(req.params.userId);
    if (userId === me.id) throw new HttpError(409, "cannot_change_self", "Sign out from the menu to end your own session.");
    const sessionsEnded = await db.write(async (transaction) => {
      if (!(await User.findByPk(userId, { transaction }))) throw notFound("That user");
      const ended = await Session.destroy({ where: { userId }, transaction });
      await recordAudit(db, { actorId: me.id, action: "admin.sessions_ended", targetType: "user", targetId: userId, details: { sessionsEnded: ended }, ip: req.ip }, transaction);
      return ended;
    });
    res.json({ sessionsEnded });
  });

  // GET /api/admin/outbox?limit=&before= -> OutboxResponse (newest first)
  router.get("/outbox", admin, validate({ query: outboxQuerySchema }), async (req, res) => {
    const { limit, before } = req.query as unknown as { limit: number; before?: number };
    const rows = await db.read(() =>
      OutboxMessage.findAll({ where: before ? { id: { [Op.lt]: before } } : {}, order: [["id", "DESC"]], limit }),
    );
    const body: OutboxResponse = {
      fakeTransport: rt.mailer.fakeTransport,
      messages: rows.map(toOutboxSummary),
      nextBefore: rows.length === limit ? rows[rows.length - 1].id : null,
    };
    res.json(body);
  });

  // GET /api/admin/outbox/:messageId -> OutboxMessageDetail
  router.get("/outbox/:messageId", admin, validate({ params: outboxParamsSchema }), async (req, res) => {
    const row = await db.read(() => OutboxMessage.findByPk(Number(req.params.messageId)));
    if (!row) throw notFound("That message");
    const body: OutboxMessageDetail = { ...toOutboxSummary(row), html: row.html, messageId: row.messageId, sizeBytes: row.sizeBytes };
    res.json(body);
  });

  // POST /api/admin/jobs/run -> JobsResult: retry pending invitations and send due reminders now.
  router.post("/jobs/run", admin, async (req, res) => {
    const result = await rt.runJobs();
    await db.write((t) => recordAudit(db, { actorId: currentUser(req).id, action: "admin.jobs_run", details: { ...result.reminders, invitationsAttempted: result.invitationsAttempted }, ip: req.ip }, t));
    res.json(result);
  });

  return router;
}
