/**
 * The demo school's frame: accounts, modules, the two cohorts, their members and assignments,
 * and the demo student's own progress. The history of the other students (lesson progress,
 * quiz attempts, notebook entries) is added afterwards through the real services.
 */
import type { Transaction } from "sequelize";
import { MODULES } from "../../../content/manifest";
import type { Db } from "../database";
import { DEMO_AUTUMN_STUDENTS, DEMO_INSTRUCTORS, DEMO_PEOPLE, DEMO_STUDENT, DEMO_WEEKEND_STUDENTS } from "./demo-people";

export interface DemoSchool {
  /** User id by e-mail. */
  ids: Map<string, number>;
  autumnCohortId: number;
  weekendCohortId: number;
}

export async function seedSchool(db: Db, transaction: Transaction, passwordHash: string, at: (days: number) => Date): Promise<DemoSchool> {
  const { User, Cohort, Enrollment, Module, Assignment, LessonProgress } = db.models;

  // One hash for every account: they share the demo password, and argon2 is the seed's main cost.
  const users = await User.bulkCreate(
    DEMO_PEOPLE.map((p) => ({ ...p, passwordHash })),
    { transaction, returning: true },
  );
  const ids = new Map(users.map((u) => [u.email, u.id]));
  const idOf = (email: string) => ids.get(email)!;

  const modules = await Module.bulkCreate(
    MODULES.map((m, i) => ({ slug: m.slug, title: m.title, order: i + 1 })),
    { transaction, returning: true },
  );
  const moduleId = (slug: string) => modules.find((m) => m.slug === slug)!.id;

  // The cohorts started some weeks ago, so the progress chart has a history to draw.
  const autumn = await Cohort.create(
    { name: "Autumn Forge Cohort", instructorId: idOf(DEMO_INSTRUCTORS[0].email), createdAt: at(-18) },
    { transaction },
  );
  const weekend = await Cohort.create(
    { name: "Weekend Bladesmiths", instructorId: idOf(DEMO_INSTRUCTORS[1].email), createdAt: at(-12) },
    { transaction },
  );

  await Enrollment.bulkCreate(
    [
      ...DEMO_AUTUMN_STUDENTS.map((s) => ({ studentId: idOf(s.email), cohortId: autumn.id })),
      ...DEMO_WEEKEND_STUDENTS.map((s) => ({ studentId: idOf(s.email), cohortId: weekend.id })),
    ],
    { transaction },
  );

  await Assignment.bulkCreate(
    [
      // One overdue, so the "past due" state is visible (students finish it on time, late or not yet).
      { cohortId: autumn.id, moduleId: moduleId("iron-carbon-hardness"), dueAt: at(-3), maxAttemptsPerQuiz: 3, createdAt: at(-17) },
      { cohortId: autumn.id, moduleId: moduleId("why-stainless"), dueAt: at(6), maxAttemptsPerQuiz: 3, createdAt: at(-17) },
      { cohortId: autumn.id, moduleId: moduleId("carbides-and-the-edge"), dueAt: at(20), maxAttemptsPerQuiz: 3, createdAt: at(-10) },
      { cohortId: weekend.id, moduleId: moduleId("iron-carbon-hardness"), dueAt: at(4), maxAttemptsPerQuiz: null, createdAt: at(-10) },
      { cohortId: weekend.id, moduleId: moduleId("melt-to-ingot"), dueAt: at(25), maxAttemptsPerQuiz: null, createdAt: at(-10) },
    ],
    { transaction },
  );

  // The demo student finished the first lesson and opened the second (README and tests rely on this).
  const student = idOf(DEMO_STUDENT.email);
  await LessonProgress.bulkCreate(
    [
      {
        userId: student,
        lessonSlug: "iron-and-carbon",
        openedAt: at(-9),
        sectionsReached: ["two-coupons", "iron-changes-crystal", "iron-carbide", "the-diagram", "lever-rule", "austenitizing", "try-it", "limits"],
        checksAnswered: { "c-capacity": { choice: 0, correct: true }, "c-lever": { choice: 1, correct: false } },
        completedAt: at(-8),
        lastSection: "limits",
      },
      {
        userId: student,
        lessonSlug: "hardening-and-tempering",
        openedAt: at(-2),
        sectionsReached: [],
        checksAnswered: {},
        completedAt: null,
        lastSection: null,
      },
    ],
    { transaction },
  );

  return { ids, autumnCohortId: autumn.id, weekendCohortId: weekend.id };
}
