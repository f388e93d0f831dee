import { DataTypes } from "sequelize";
import type { Migration } from "./types";

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  createdAt: { type: DataTypes.DATE, allowNull: false },
  updatedAt: { type: DataTypes.DATE, allowNull: false },
};
const fk = (table: string, onDelete: "CASCADE" | "RESTRICT" | "SET NULL", allowNull = false) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: "id" },
  onDelete,
  onUpdate: "CASCADE",
});

/** Users, cohorts, enrollments, modules, assignments, progress, quiz attempts, audit log, sessions. */
export const initial: Migration = {
  name: "0001-initial",
  async up({ queryInterface: qi, transaction }) {
    await qi.createTable(
      "Users",
      {
        id,
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        displayName: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(255), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false },
        disabledAt: { type: DataTypes.DATE, allowNull: true },
        failedLoginCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        lastFailedLoginAt: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    // The CHECK keeps the role column honest even for raw SQL writes.
    await qi.sequelize.query(
      `CREATE TRIGGER users_role_check BEFORE INSERT ON Users
       WHEN NEW.role NOT IN ('student','instructor','admin')
       BEGIN SELECT RAISE(ABORT, 'invalid role'); END;`,
      { transaction },
    );
    await qi.sequelize.query(
      `CREATE TRIGGER users_role_check_update BEFORE UPDATE OF role ON Users
       WHEN NEW.role NOT IN ('student','instructor','admin')
       BEGIN SELECT RAISE(ABORT, 'invalid role'); END;`,
      { transaction },
    );

    await qi.createTable(
      "Cohorts",
      {
        id,
        name: { type: DataTypes.STRING(120), allowNull: false },
        instructorId: fk("Users", "RESTRICT"),
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("Cohorts", ["instructorId"], { transaction });

    await qi.createTable(
      "Enrollments",
      { id, studentId: fk("Users", "CASCADE"), cohortId: fk("Cohorts", "CASCADE"), ...timestamps },
      { transaction },
    );
    await qi.addIndex("Enrollments", ["studentId", "cohortId"], { unique: true, transaction });
    await qi.addIndex("Enrollments", ["cohortId"], { transaction });

    await qi.createTable(
      "Modules",
      {
        id,
        slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        title: { type: DataTypes.STRING(160), allowNull: false },
        order: { type: DataTypes.INTEGER, allowNull: false },
        ...timestamps,
      },
      { transaction },
    );

    await qi.createTable(
      "Assignments",
      {
        id,
        cohortId: fk("Cohorts", "CASCADE"),
        moduleId: fk("Modules", "RESTRICT"),
        dueAt: { type: DataTypes.DATE, allowNull: false },
        maxAttemptsPerQuiz: { type: DataTypes.INTEGER, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("Assignments", ["cohortId", "moduleId"], { unique: true, transaction });

    await qi.createTable(
      "LessonProgress",
      {
        id,
        userId: fk("Users", "CASCADE"),
        lessonSlug: { type: DataTypes.STRING(120), allowNull: false },
        openedAt: { type: DataTypes.DATE, allowNull: false },
        sectionsReached: { type: DataTypes.JSON, allowNull: false, defaultValue: "[]" },
        checksAnswered: { type: DataTypes.JSON, allowNull: false, defaultValue: "{}" },
        completedAt: { type: DataTypes.DATE, allowNull: true },
        lastSection: { type: DataTypes.STRING(120), allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("LessonProgress", ["userId", "lessonSlug"], { unique: true, transaction });

    await qi.createTable(
      "QuizAttempts",
      {
        id,
        userId: fk("Users", "CASCADE"),
        quizId: { type: DataTypes.STRING(120), allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(64), allowNull: false },
        answers: { type: DataTypes.JSON, allowNull: false },
        score: { type: DataTypes.FLOAT, allowNull: false },
        maxScore: { type: DataTypes.FLOAT, allowNull: false },
        graded: { type: DataTypes.JSON, allowNull: false },
        submittedAt: { type: DataTypes.DATE, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("QuizAttempts", ["userId", "idempotencyKey"], { unique: true, transaction });
    await qi.addIndex("QuizAttempts", ["userId", "quizId"], { transaction });

    await qi.createTable(
      "AuditLogs",
      {
        id,
        actorId: fk("Users", "SET NULL", true),
        action: { type: DataTypes.STRING(64), allowNull: false },
        targetType: { type: DataTypes.STRING(40), allowNull: true },
        targetId: { type: DataTypes.STRING(64), allowNull: true },
        details: { type: DataTypes.JSON, allowNull: false, defaultValue: "{}" },
        ip: { type: DataTypes.STRING(64), allowNull: true },
        at: { type: DataTypes.DATE, allowNull: false },
      },
      { transaction },
    );
    await qi.addIndex("AuditLogs", ["at"], { transaction });

    await qi.createTable(
      "Sessions",
      {
        sid: { type: DataTypes.STRING(64), primaryKey: true, allowNull: false },
        expires: { type: DataTypes.DATE, allowNull: false },
        data: { type: DataTypes.TEXT, allowNull: false },
        userId: fk("Users", "CASCADE", true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex("Sessions", ["expires"], { transaction });
    await qi.addIndex("Sessions", ["userId"], { transaction });
  },

  async down({ queryInterface: qi, transaction }) {
    for (const table of [
      "Sessions", "AuditLogs", "QuizAttempts", "LessonProgress", "Assignments", "Modules", "Enrollments", "Cohorts", "Users",
    ]) {
      await qi.dropTable(table, { transaction });
    }
  },
};
