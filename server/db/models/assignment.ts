import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Model,
  type NonAttribute,
} from "sequelize";
import type { ModelEntry } from "./entry";
import type { Models } from "./index";
import type { ModuleInstance } from "./module";

/** A module assigned to a cohort with a due date; UNIQUE(cohortId, moduleId). */
export interface AssignmentInstance
  extends Model<InferAttributes<AssignmentInstance>, InferCreationAttributes<AssignmentInstance>> {
  id: CreationOptional<number>;
  cohortId: number;
  moduleId: number;
  dueAt: Date;
  /** Null = unlimited attempts per quiz in this module. */
  maxAttemptsPerQuiz: CreationOptional<number | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  module?: NonAttribute<ModuleInstance>;
}

export const assignmentModel: ModelEntry<AssignmentInstance> = {
  define: (sequelize) =>
    sequelize.define<AssignmentInstance>(
      "Assignment",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        cohortId: { type: DataTypes.INTEGER, allowNull: false },
        moduleId: { type: DataTypes.INTEGER, allowNull: false },
        dueAt: { type: DataTypes.DATE, allowNull: false },
        maxAttemptsPerQuiz: { type: DataTypes.INTEGER, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Assignments", indexes: [{ unique: true, fields: ["cohortId", "moduleId"] }] },
    ),
  associate: (m: Models) => {
    m.Assignment.belongsTo(m.Cohort, { foreignKey: "cohortId", as: "cohort" });
    m.Assignment.belongsTo(m.Module, { foreignKey: "moduleId", as: "module" });
  },
};
