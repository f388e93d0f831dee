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
import type { UserInstance } from "./user";

export interface CohortInstance extends Model<InferAttributes<CohortInstance>, InferCreationAttributes<CohortInstance>> {
  id: CreationOptional<number>;
  name: string;
  instructorId: number;
  archivedAt: CreationOptional<Date | null>;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  instructor?: NonAttribute<UserInstance>;
}

export const cohortModel: ModelEntry<CohortInstance> = {
  define: (sequelize) =>
    sequelize.define<CohortInstance>(
      "Cohort",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        instructorId: { type: DataTypes.INTEGER, allowNull: false },
        archivedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Cohorts" },
    ),
  associate: (m: Models) => {
    m.Cohort.belongsTo(m.User, { foreignKey: "instructorId", as: "instructor" });
    m.Cohort.hasMany(m.Enrollment, { foreignKey: "cohortId", as: "enrollments" });
    m.Cohort.hasMany(m.Assignment, { foreignKey: "cohortId", as: "assignments" });
  },
};
