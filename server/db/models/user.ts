import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
} from "sequelize";
import type { ModelEntry } from "./entry";
import { ROLES, type Role } from "../../../shared/api/auth";
import type { Models } from "./index";

export interface UserInstance extends Model<InferAttributes<UserInstance>, InferCreationAttributes<UserInstance>> {
  id: CreationOptional<number>;
  /** Stored lower-case; unique. */
  email: string;
  displayName: string;
  /** argon2id PHC string. Never serialised to clients. */
  passwordHash: string;
  role: Role;
  /** "school" (demo seed, admin, invitation) or "self" (bought a self-study pass; see server/billing/). */
  kind: CreationOptional<"school" | "self">;
  disabledAt: CreationOptional<Date | null>;
  /** Consecutive failed sign-ins; drives the per-account delay (no hard lockout). */
  failedLoginCount: CreationOptional<number>;
  lastFailedLoginAt: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
}

export const userModel: ModelEntry<UserInstance> = {
  define: (sequelize) =>
    sequelize.define<UserInstance>(
      "User",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        displayName: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(255), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
        kind: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "school", validate: { isIn: [["school", "self"]] } },
        disabledAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        failedLoginCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastFailedLoginAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Users" },
    ),
  associate: (m: Models) => {
    m.User.hasMany(m.Enrollment, { foreignKey: "studentId", as: "enrollments" });
    m.User.hasMany(m.Cohort, { foreignKey: "instructorId", as: "taughtCohorts" });
  },
};
