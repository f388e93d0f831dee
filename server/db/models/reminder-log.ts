import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/**
 * One row per reminder a student should get: UNIQUE(userId, assignmentId, kind), so running the
 * reminder job twice (or two overlapping runs) never e-mails anyone twice.
 */
export interface ReminderLogInstance extends Model<InferAttributes<ReminderLogInstance>, InferCreationAttributes<ReminderLogInstance>> {
  id: CreationOptional<number>;
  userId: number;
  assignmentId: number;
  /** e.g. "due-soon" */
  kind: string;
  claimedAt: CreationOptional<Date | null>;
  sentAt: CreationOptional<Date | null>;
  attempts: CreationOptional<number>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const reminderLogModel: ModelEntry<ReminderLogInstance> = {
  define: (sequelize) =>
    sequelize.define<ReminderLogInstance>(
      "ReminderLog",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        assignmentId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(32), allowNull: false },
        claimedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        sentAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "ReminderLogs", indexes: [{ unique: true, fields: ["userId", "assignmentId", "kind"] }] },
    ),
};
