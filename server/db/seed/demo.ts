import { hashPassword } from "../../auth/passwords";
import type { Config } from "../../config";
import type { Logger } from "../../log";
import { getCourseCatalog } from "../../services/lessons/course";
import { uploadSettings } from "../../uploads/settings";
import { UploadStore } from "../../uploads/store";
import type { Db } from "../database";
import { dayOffset, daytime, seedAppContext, seedConfig, type SeedContext } from "./demo-context";
import { seedInstructorAlloy } from "./demo-alloy";
import { seedQuizAttempts } from "./demo-attempts";
import { STUDENT_STORIES } from "./demo-history";
import { seedNotebook } from "./demo-notebook";
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SCHOOL } from "./demo-people";
import { seedLessonProgress } from "./demo-progress";
import { seedSchool } from "./demo-school";

export {
  DEMO_ADMIN,
  DEMO_AUTUMN_STUDENTS,
  DEMO_INSTRUCTORS,
  DEMO_OTHER_STUDENTS,
  DEMO_PASSWORD,
  DEMO_SCHOOL,
  DEMO_STUDENT,
  DEMO_WEEKEND_STUDENTS,
} from "./demo-people";

/**
 * The demo school: "Cinderfield Forge School", an INVENTED bladesmithing school with invented
 * people and a few weeks of history (lesson progress, graded quiz attempts, notebook entries and
 * reviews, an instructor's alloy on a lesson), so no screen is empty on first start. Runs at
 * startup only when the database has no users and SEED_DEMO is not "0"; with any user present
 * it does nothing. Everything is written in ONE queued transaction, so a failed seed leaves an
 * empty database (and the next start tries again) rather than half a school.
 * Every demo account uses DEMO_PASSWORD (printed in the README): never run it on a real deployment.
 */
export interface SeedOptions {
  /** The moment the history is dated from (default: the current time). */
  now?: Date;
  /** The app's config, so uploads land where the app serves them (default: derived from the database path). */
  config?: Config;
}

/** Seed the demo school if there are no users yet. Returns true when it seeded. */
export async function seedDemoIfEmpty(db: Db, logger: Logger, options: SeedOptions = {}): Promise<boolean> {
  if ((await db.read(() => db.models.User.count())) > 0) return false;
  const startedMs = performance.now();
  const now = options.now ?? new Date();
  const at = dayOffset(now);
  const config = await seedConfig(db, options.config);
  const ctx = seedAppContext(db, logger, config);
  // Outside the transaction: one argon2 hash (~70 ms) shared by every demo account, and the catalog.
  const [passwordHash, catalog] = await Promise.all([hashPassword(DEMO_PASSWORD), getCourseCatalog()]);
  const writtenFiles: string[] = [];

  let counts: { attempts: number; entries: number; files: number } | null;
  try {
    counts = await db.write(async (transaction) => {
      if ((await db.models.User.count({ transaction })) > 0) return null;
      const school = await seedSchool(db, transaction, passwordHash, at);
      const s: SeedContext = {
        ctx,
        db,
        catalog,
        transaction,
        when: daytime(now),
        userId: (email) => {
          const id = school.ids.get(email);
          if (id === undefined) throw new Error(`no demo user ${email}`);
          return id;
        },
        writtenFiles,
      };
      await seedLessonProgress(s, STUDENT_STORIES);
      const attempts = await seedQuizAttempts(s, STUDENT_STORIES);
      const notebook = await seedNotebook(s);
      await seedInstructorAlloy(s);
      return { attempts, ...notebook };
    });
  } catch (err) {
    // The rows rolled back; remove the photos written for them.
    await new UploadStore(uploadSettings(config).dir).remove(writtenFiles).catch(() => undefined);
    throw err;
  }

  if (!counts) return false;
  logger.info("demo school seeded", {
    school: DEMO_SCHOOL,
    users: DEMO_PEOPLE.length,
    quizAttempts: counts.attempts,
    notebookEntries: counts.entries,
    photos: counts.files,
    ms: Math.round(performance.now() - startedMs),
  });
  return true;
}
