import { z } from "zod";

/** GET /api/audit-log (admins only): newest first, paged with `before` = the last id seen. */
export const auditLogQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).optional().default(50),
  before: z.coerce.number().int().min(1).optional(),
});
export type AuditLogQuery = z.infer<typeof auditLogQuerySchema>;

export interface AuditLogEntry {
  id: number;
  /** ISO 8601 */
  at: string;
  action: string;
  actorId: number | null;
  actorEmail: string | null;
  targetType: string | null;
  targetId: string | null;
  ip: string | null;
  details: Record<string, unknown>;
}

export interface AuditLogResponse {
  entries: AuditLogEntry[];
  /** Pass as `before` to get the next page; null at the end. */
  nextBefore: number | null;
}
