import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";

/**
 * express-session rows (the table connect-session-sequelize expects: sid, expires, data), plus
 * userId so that all sessions of one user can be ended (password change, disabling a user).
 */
export interface SessionInstance extends Model<InferAttributes<SessionInstance>, InferCreationAttributes<SessionInstance>> {
  sid: string;
  expires: Date;
  data: string;
  userId: number | null;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const sessionModel: ModelEntry<SessionInstance> = {
  define: (sequelize) =>
    sequelize.define<SessionInstance>(
      "Session",
      {
        sid: { type: DataTypes.STRING(64), primaryKey: true },
        expires: { type: DataTypes.DATE, allowNull: false },
        data: { type: DataTypes.TEXT, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Sessions" },
    ),
};
