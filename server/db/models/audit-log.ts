import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/** Who did what, when, from where (ASVS 16.2.1). Never store secrets in `details`. */
export interface AuditLogInstance extends Model<InferAttributes<AuditLogInstance>, InferCreationAttributes<AuditLogInstance>> {
  id: CreationOptional<number>;
  /** Null for anonymous actions (e.g. a failed sign-in) or after the actor was deleted. */
  actorId: number | null;
  /** Dotted verb, e.g. "auth.login", "auth.login_failed", "auth.password_changed". */
  action: string;
  targetType: string | null;
  targetId: string | null;
  details: CreationOptional<Record<string, unknown>>;
  ip: string | null;
  at: CreationOptional<Date>;
}

export const auditLogModel: ModelEntry<AuditLogInstance> = {
  define: (sequelize) =>
    sequelize.define<AuditLogInstance>(
      "AuditLog",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(64), allowNull: false },
        targetType: { type: DataTypes.STRING(40), allowNull: true },
        targetId: { type: DataTypes.STRING(64), allowNull: true },
        details: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { tableName: "AuditLogs", timestamps: false },
    ),
};
