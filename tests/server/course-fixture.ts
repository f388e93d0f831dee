/**
 * Shared setup for the lesson and quiz API tests: an app serving the fixture course
 * (tests/content/fixtures/course), a Module row for it and helpers to make cohorts
 * with attempt limits. The env var must be set before the course catalog is first loaded.
 */
import path from "node:path";
import type { PublicUser } from "../../shared/api/auth";
import { createUser, signIn, type TestApp } from "../support/test-app";

export const FIXTURE_COURSE = path.resolve(import.meta.dirname, "../content/fixtures/course");
process.env.GRAIN_EDGE_CONTENT_DIR = FIXTURE_COURSE;

let counter = 0;

export async function seedFixtureModule(t: TestApp): Promise<number> {
  const row = await t.db.write((transaction) => t.db.models.Module.create({ slug: "basics", title: "Fixture basics", order: 1 }, { transaction }));
  return row.id;
}

/** A new student, signed in. */
export async function newStudent(t: TestApp, name = "student") {
  counter += 1;
  const user = await createUser(t, { email: `${name}-${counter}@cinderfield.test`, role: "student", displayName: `Fixture ${name} ${counter}` });
  return { ...(await signIn(t.app, user.email)), user };
}

/** A cohort (owned by a new instructor) that `students` are enrolled in, with the module assigned at `limit` attempts. */
export async function cohortWithLimit(t: TestApp, moduleId: number, students: PublicUser[], limit: number | null, archived = false) {
  counter += 1;
  const instructor = await createUser(t, { email: `instructor-${counter}@cinderfield.test`, role: "instructor" });
  return t.db.write(async (transaction) => {
    const { Cohort, Enrollment, Assignment } = t.db.models;
    const cohort = await Cohort.create({ name: `Cohort ${counter}`, instructorId: instructor.id, archivedAt: archived ? new Date() : null }, { transaction });
    await Enrollment.bulkCreate(students.map((s) => ({ studentId: s.id, cohortId: cohort.id })), { transaction });
    await Assignment.create({ cohortId: cohort.id, moduleId, dueAt: new Date(Date.now() + 86_400_000), maxAttemptsPerQuiz: limit }, { transaction });
    return cohort.id;
  });
}

let keyCounter = 0;
export function newKey(): string {
  keyCounter += 1;
  return `key-${Date.now().toString(36)}-${keyCounter}-${Math.random().toString(36).slice(2, 8)}`;
}
