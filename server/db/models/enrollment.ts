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
import type { CohortInstance } from "./cohort";
import type { UserInstance } from "./user";

/** A student in a cohort; UNIQUE(studentId, cohortId). */
export interface EnrollmentInstance
  extends Model<InferAttributes<EnrollmentInstance>, InferCreationAttributes<EnrollmentInstance>> {
  id: CreationOptional<number>;
  studentId: number;
  cohortId: number;
  createdAt: CreationOptional<Date>;
  updatedAt: CreationOptional<Date>;
  student?: NonAttribute<UserInstance>;
  cohort?: NonAttribute<CohortInstance>;
}

export const enrollmentModel: ModelEntry<EnrollmentInstance> = {
  define: (sequelize) =>
    sequelize.define<EnrollmentInstance>(
      "Enrollment",
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        studentId: { type: DataTypes.INTEGER, allowNull: false },
        cohortId: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { tableName: "Enrollments", indexes: [{ unique: true, fields: ["studentId", "cohortId"] }] },
    ),
  associate: (m: Models) => {
    m.Enrollment.belongsTo(m.User, { foreignKey: "studentId", as: "student" });
    m.Enrollment.belongsTo(m.Cohort, { foreignKey: "cohortId", as: "cohort" });
  },
};
