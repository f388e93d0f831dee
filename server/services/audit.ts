import type { Transaction } from "sequelize";
import type { Db } from "../db/database";

export interface AuditEntry {
  actorId: number | null;
  /** Dotted verb, e.g. "auth.login". */
  action: string;
  targetType?: string | null;
  targetId?: string | number | null;
  /** Never passwords, hashes, tokens or session ids. */
  details?: Record<string, unknown>;
  ip?: string | null;
}

/** Append an audit row; call inside `db.write` so it commits (or not) with the change it records. */
export async function recordAudit(db: Db, entry: AuditEntry, transaction: Transaction): Promise<void> {
  await db.models.AuditLog.create(
    {
      actorId: entry.actorId,
      action: entry.action,
      targetType: entry.targetType ?? null,
      targetId: entry.targetId === undefined || entry.targetId === null ? null : String(entry.targetId),
      details: entry.details ?? {},
      ip: entry.ip ?? null,
    },
    { transaction },
  );
}
