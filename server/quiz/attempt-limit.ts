/**
 * How many attempts a student may make at each quiz of a module: the smallest
 * `maxAttemptsPerQuiz` among the assignments of that module to the student's active
 * cohorts; null (no limit) when none of them sets one.
 */
import { Op, type Transaction } from "sequelize";
import type { Db } from "../db/database";

export async function attemptLimit(db: Db, userId: number, moduleSlug: string, transaction?: Transaction): Promise<number | null> {
  const { Module, Enrollment, Cohort, Assignment } = db.models;
  const module = await Module.findOne({ where: { slug: moduleSlug }, attributes: ["id"], transaction });
  if (!module) return null;
  const enrollments = await Enrollment.findAll({
    where: { studentId: userId },
    attributes: ["cohortId"],
    include: [{ model: Cohort, as: "cohort", attributes: [], where: { archivedAt: null } }],
    transaction,
  });
  if (enrollments.length === 0) return null;
  const limits = await Assignment.findAll({
    where: {
      moduleId: module.id,
      cohortId: { [Op.in]: enrollments.map((e) => e.cohortId) },
      maxAttemptsPerQuiz: { [Op.ne]: null },
    },
    attributes: ["maxAttemptsPerQuiz"],
    transaction,
  });
  const values = limits.map((a) => a.maxAttemptsPerQuiz).filter((n): n is number => typeof n === "number");
  return values.length ? Math.min(...values) : null;
}
