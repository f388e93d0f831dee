import { Router } from "express";
import { Op } from "sequelize";
import { auditLogQuerySchema, type AuditLogQuery, type AuditLogResponse } from "../../shared/api/audit";
import type { AppContext } from "../context";
import { requireRole } from "../middleware/authorize";
import { validate } from "../middleware/validate";

export function createAuditLogRouter(ctx: AppContext): Router {
  const router = Router();
  const { AuditLog, User } = ctx.db.models;

  // GET /api/audit-log?limit=50&before=123 -> AuditLogResponse (admins only)
  router.get("/", requireRole("admin"), validate({ query: auditLogQuerySchema }), async (req, res) => {
    const { limit, before } = req.query as unknown as AuditLogQuery;
    const rows = await ctx.db.read(() =>
      AuditLog.findAll({ where: before ? { id: { [Op.lt]: before } } : {}, order: [["id", "DESC"]], limit }),
    );
    const actorIds = [...new Set(rows.map((r) => r.actorId).filter((id): id is number => id !== null))];
    const actors = actorIds.length
      ? await ctx.db.read(() => User.findAll({ where: { id: { [Op.in]: actorIds } }, attributes: ["id", "email"] }))
      : [];
    const emailOf = new Map(actors.map((a) => [a.id, a.email]));
    const body: AuditLogResponse = {
      entries: rows.map((r) => ({
        id: r.id,
        at: r.at.toISOString(),
        action: r.action,
        actorId: r.actorId,
        actorEmail: r.actorId === null ? null : (emailOf.get(r.actorId) ?? null),
        targetType: r.targetType,
        targetId: r.targetId,
        ip: r.ip,
        details: r.details,
      })),
      nextBefore: rows.length === limit ? rows[rows.length - 1].id : null,
    };
    res.json(body);
  });

  return router;
}
