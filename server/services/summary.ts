import { Op, fn, col } from "sequelize";
import type { PublicUser } from "../../shared/api/auth";
import { latestPassValidUntil } from "../billing/passes";
import type { AdminSummary, InstructorSummary, MeSummary, StudentSummary } from "../../shared/api/me";
import type { Db } from "../db/database";

/** Count rows per cohort id with one grouped query. */
async function countByCohort(db: Db, model: "Enrollment" | "Assignment", cohortIds: number[]): Promise<Map<number, number>> {
  if (cohortIds.length === 0) return new Map();
  const rows = (await (db.models[model] as typeof db.models.Enrollment).findAll({
    attributes: ["cohortId", [fn("COUNT", col("id")), "n"]],
    where: { cohortId: { [Op.in]: cohortIds } },
    group: ["cohortId"],
    raw: true,
  })) as unknown as { cohortId: number; n: number }[];
  return new Map(rows.map((r) => [r.cohortId, Number(r.n)]));
}

async function studentSummary(db: Db, user: PublicUser, now: Date): Promise<StudentSummary> {
  const { Enrollment, Cohort, User, Assignment, LessonProgress } = db.models;
  const enrollments = await Enrollment.findAll({
    where: { studentId: user.id },
    include: [
      {
        model: Cohort,
        as: "cohort",
        where: { archivedAt: null },
        include: [{ model: User, as: "instructor", attributes: ["displayName"] }],
      },
    ],
    order: [[{ model: Cohort, as: "cohort" }, "name", "ASC"]],
  });
  const cohortIds = enrollments.map((e) => e.cohortId);
  const studentCounts = await countByCohort(db, "Enrollment", cohortIds);
  const assignments = cohortIds.length
    ? await Assignment.findAll({ where: { cohortId: { [Op.in]: cohortIds } }, attributes: ["cohortId", "dueAt"], raw: true })
    : [];

  const cohorts = enrollments.map((e) => {
    const mine = assignments.filter((a) => a.cohortId === e.cohortId);
    const upcoming = mine.map((a) => new Date(a.dueAt)).filter((d) => d > now).sort((a, b) => a.getTime() - b.getTime());
    return {
      id: e.cohortId,
      name: e.cohort!.name,
      instructorName: e.cohort!.instructor?.displayName ?? "",
      studentCount: studentCounts.get(e.cohortId) ?? 0,
      assignmentCount: mine.length,
      overdueCount: mine.filter((a) => new Date(a.dueAt) <= now).length,
      nextDueAt: upcoming[0]?.toISOString() ?? null,
    };
  });

  const [lessonsStarted, lessonsCompleted, account] = await Promise.all([
    LessonProgress.count({ where: { userId: user.id } }),
    LessonProgress.count({ where: { userId: user.id, completedAt: { [Op.ne]: null } } }),
    User.findByPk(user.id, { attributes: ["kind"] }),
  ]);
  const selfStudy = account?.kind === "self" ? { passValidUntil: (await latestPassValidUntil(db, user.id))?.toISOString() ?? null } : null;
  return { role: "student", cohorts, progress: { lessonsStarted, lessonsCompleted }, selfStudy };
}

async function instructorSummary(db: Db, user: PublicUser): Promise<InstructorSummary> {
  const cohorts = await db.models.Cohort.findAll({ where: { instructorId: user.id }, order: [["name", "ASC"]] });
  const ids = cohorts.map((c) => c.id);
  const [students, assignments] = await Promise.all([
    countByCohort(db, "Enrollment", ids),
    countByCohort(db, "Assignment", ids),
  ]);
  return {
    role: "instructor",
    cohorts: cohorts.map((c) => ({
      id: c.id,
      name: c.name,
      studentCount: students.get(c.id) ?? 0,
      assignmentCount: assignments.get(c.id) ?? 0,
      archived: c.archivedAt !== null,
    })),
  };
}

async function adminSummary(db: Db): Promise<AdminSummary> {
  const { User, Cohort } = db.models;
  const [users, students, instructors, admins, disabledUsers, cohorts, activeCohorts] = await Promise.all([
    User.count(),
    User.count({ where: { role: "student" } }),
    User.count({ where: { role: "instructor" } }),
    User.count({ where: { role: "admin" } }),
    User.count({ where: { disabledAt: { [Op.ne]: null } } }),
    Cohort.count(),
    Cohort.count({ where: { archivedAt: null } }),
  ]);
  return { role: "admin", counts: { users, students, instructors, admins, disabledUsers, cohorts, activeCohorts } };
}

/** GET /api/me/summary: what each home page shows first. Only the caller's own data. */
export function getMeSummary(db: Db, user: PublicUser, now = new Date()): Promise<MeSummary> {
  return db.read((): Promise<MeSummary> => {
    switch (user.role) {
      case "student":
        return studentSummary(db, user, now);
      case "instructor":
        return instructorSummary(db, user);
      case "admin":
        return adminSummary(db);
    }
  });
}
