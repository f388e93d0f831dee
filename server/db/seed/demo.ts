import { MODULES } from "../../../content/manifest";
import type { Role } from "../../../shared/api/auth";
import { hashPassword } from "../../auth/passwords";
import type { Logger } from "../../log";
import type { Db } from "../database";

/**
 * The demo school: "Cinderfield Forge School", an INVENTED bladesmithing school with invented
 * people, so no screen is empty on first start. Runs at startup only when the database has no
 * users and SEED_DEMO is not "0". Every demo account uses the password below (printed in the
 * README) — never run the demo seed on a real deployment; use `npm run create-admin` instead.
 */
export const DEMO_PASSWORD = "forge-demo-1";
export const DEMO_SCHOOL = "Cinderfield Forge School";

interface DemoPerson {
  email: string;
  displayName: string;
  role: Role;
}

export const DEMO_ADMIN: DemoPerson = { email: "admin@grain-edge.test", displayName: "Odile Varrick", role: "admin" };
export const DEMO_INSTRUCTORS: DemoPerson[] = [
  { email: "instructor@grain-edge.test", displayName: "Hale Emberton", role: "instructor" },
  { email: "instructor2@grain-edge.test", displayName: "Sefa Cardell", role: "instructor" },
];
export const DEMO_STUDENT: DemoPerson = { email: "student@grain-edge.test", displayName: "Ruth Kettleby", role: "student" };

const OTHER_STUDENTS: [string, string][] = [
  ["mara.quillon", "Mara Quillon"],
  ["tobin.ashgrove", "Tobin Ashgrove"],
  ["ines.forthwell", "Ines Forthwell"],
  ["dario.penhallow", "Dario Penhallow"],
  ["wren.ostby", "Wren Ostby"],
  ["kofi.brannagh", "Kofi Brannagh"],
  ["lumi.harrowgate", "Lumi Harrowgate"],
  ["ezra.coldwater", "Ezra Coldwater"],
  ["priya.tallisker", "Priya Tallisker"],
  ["jonas.villemont", "Jonas Villemont"],
  ["anouk.stennet", "Anouk Stennet"],
  ["caleb.morrow-finch", "Caleb Morrow-Finch"],
];
export const DEMO_OTHER_STUDENTS: DemoPerson[] = OTHER_STUDENTS.map(([local, displayName]) => ({
  email: `${local}@grain-edge.test`,
  displayName,
  role: "student",
}));

const DAY_MS = 86_400_000;

/** Seed the demo school if there are no users yet. Returns true when it seeded. */
export async function seedDemoIfEmpty(db: Db, logger: Logger, now = new Date()): Promise<boolean> {
  const { User, Cohort, Enrollment, Module, Assignment, LessonProgress } = db.models;
  if ((await db.read(() => User.count())) > 0) return false;
  // Hash once outside the write transaction (~70 ms) and reuse it for every demo account.
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const at = (days: number) => new Date(now.getTime() + days * DAY_MS);

  const seeded = await db.write(async (transaction) => {
    if ((await User.count({ transaction })) > 0) return false;

    const people = [DEMO_ADMIN, ...DEMO_INSTRUCTORS, DEMO_STUDENT, ...DEMO_OTHER_STUDENTS];
    const users = await User.bulkCreate(
      people.map((p) => ({ ...p, passwordHash })),
      { transaction, returning: true },
    );
    const byEmail = new Map(users.map((u) => [u.email, u]));
    const idOf = (email: string) => byEmail.get(email)!.id;

    const modules = await Module.bulkCreate(
      MODULES.map((m, i) => ({ slug: m.slug, title: m.title, order: i + 1 })),
      { transaction, returning: true },
    );
    const moduleId = (slug: string) => modules.find((m) => m.slug === slug)!.id;

    const autumn = await Cohort.create(
      { name: "Autumn Forge Cohort", instructorId: idOf(DEMO_INSTRUCTORS[0].email) },
      { transaction },
    );
    const weekend = await Cohort.create(
      { name: "Weekend Bladesmiths", instructorId: idOf(DEMO_INSTRUCTORS[1].email) },
      { transaction },
    );

    // The demo student is in both cohorts; the others are split 8 / 6 with some overlap.
    const autumnStudents = [DEMO_STUDENT, ...DEMO_OTHER_STUDENTS.slice(0, 8)];
    const weekendStudents = [DEMO_STUDENT, ...DEMO_OTHER_STUDENTS.slice(6, 12)];
    await Enrollment.bulkCreate(
      [
        ...autumnStudents.map((s) => ({ studentId: idOf(s.email), cohortId: autumn.id })),
        ...weekendStudents.map((s) => ({ studentId: idOf(s.email), cohortId: weekend.id })),
      ],
      { transaction },
    );

    await Assignment.bulkCreate(
      [
        // One overdue, so the "past due" state is visible.
        { cohortId: autumn.id, moduleId: moduleId("iron-carbon-hardness"), dueAt: at(-3), maxAttemptsPerQuiz: 3 },
        { cohortId: autumn.id, moduleId: moduleId("why-stainless"), dueAt: at(6), maxAttemptsPerQuiz: 3 },
        { cohortId: autumn.id, moduleId: moduleId("carbides-and-the-edge"), dueAt: at(20), maxAttemptsPerQuiz: 3 },
        { cohortId: weekend.id, moduleId: moduleId("iron-carbon-hardness"), dueAt: at(4), maxAttemptsPerQuiz: null },
        { cohortId: weekend.id, moduleId: moduleId("melt-to-ingot"), dueAt: at(25), maxAttemptsPerQuiz: null },
      ],
      { transaction },
    );

    // A little progress: the demo student finished the first lesson and is part-way into the second.
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
        ...DEMO_OTHER_STUDENTS.slice(0, 5).map((s, i) => ({
          userId: idOf(s.email),
          lessonSlug: "iron-and-carbon",
          openedAt: at(-6 + i),
          sectionsReached: ["two-coupons", "iron-changes-crystal"],
          checksAnswered: { "c-capacity": { choice: i % 2 === 0 ? 0 : 2, correct: i % 2 === 0 } },
          completedAt: null,
          lastSection: "iron-changes-crystal",
        })),
      ],
      { transaction },
    );
    return true;
  });

  if (seeded) logger.info("demo school seeded", { school: DEMO_SCHOOL, users: 4 + DEMO_OTHER_STUDENTS.length });
  return seeded;
}
