/**
 * What every part of the demo seed shares: an AppContext for calling the real services, the
 * course catalog, daytime moments before "now", user ids and service actors by e-mail, seeded
 * random sources, and the stored files to remove if the seed's transaction rolls back.
 * The services are called inside the seed's one transaction: their queued writes join it.
 */
import { QueryTypes, type Attributes, type Model, type ModelStatic, type Transaction, type WhereOptions } from "sequelize";
import { createRandom, type RandomSource } from "../../../shared/metallurgy/random";
import { loadConfig, type Config } from "../../config";
import type { AppContext } from "../../context";
import type { Logger } from "../../log";
import type { Actor } from "../../services/actor";
import type { CourseCatalog } from "../../services/lessons/catalog";
import type { Db } from "../database";
import { DEMO_PEOPLE } from "./demo-people";

const DAY_MS = 86_400_000;

/**
 * The demo history's quiz draws come from this fixed secret instead of the server's session
 * secret, so the seeded attempts (numbers drawn, scores) are the same on every machine. Each
 * stored attempt keeps its own seed, so re-grading never needs the secret; a student's NEXT
 * attempt is drawn by the running server with its real secret.
 */
export const DEMO_DRAW_SECRET = "cinderfield-demo-history-draws-v1";

export interface SeedContext {
  /** For the services: the real db, a config whose session secret is DEMO_DRAW_SECRET. */
  ctx: AppContext;
  db: Db;
  catalog: CourseCatalog;
  transaction: Transaction;
  /** A daytime moment about `daysAgo` days before now, for what students did (see daytime()). */
  when(daysAgo: number): Date;
  userId(email: string): number;
  /** Stored upload names written so far (removed again if the seed fails). */
  writtenFiles: string[];
}

/**
 * The config for the seed's services: the app's own when given (uploads go where the app reads
 * them), else one derived from the database path exactly as loadConfig does for the app.
 */
export async function seedConfig(db: Db, config: Config | undefined): Promise<Config> {
  let base = config;
  if (!base) {
    // The file SQLite has open as "main" is the app's DATABASE_PATH.
    const [main] = await db.sequelize.query<{ file: string }>("SELECT file FROM pragma_database_list WHERE name = 'main'", { type: QueryTypes.SELECT });
    base = loadConfig({ DATABASE_PATH: main.file, SESSION_SECRET: DEMO_DRAW_SECRET, LOG_LEVEL: "silent" });
  }
  return { ...base, sessionSecret: DEMO_DRAW_SECRET };
}

export function seedAppContext(db: Db, logger: Logger, config: Config): AppContext {
  // The seed ends no sessions; nobody is signed in yet.
  return { config, db, logger, sessions: { endSessionsForUser: async () => 0 } };
}

/**
 * A demo person as the services' actor. They write the school's invented past, so the services
 * add no audit rows and send no e-mail for it (see server/services/actor.ts).
 */
export function historyActor(s: SeedContext, email: string): Actor {
  const person = DEMO_PEOPLE.find((p) => p.email === email);
  if (!person) throw new Error(`no demo person ${email}`);
  return { user: { id: s.userId(email), email, displayName: person.displayName, role: person.role }, ip: undefined, demoHistory: true };
}

/** The services stamp rows with the seed run's time; date a row from the story instead. */
export async function backdate<M extends Model>(s: SeedContext, model: ModelStatic<M>, id: number, createdAt: Date, updatedAt = createdAt): Promise<void> {
  const dates = { createdAt, updatedAt } as unknown as Partial<Attributes<M>>;
  await model.update(dates, { where: { id } as unknown as WhereOptions<Attributes<M>>, transaction: s.transaction, silent: true });
}

export function dayOffset(now: Date): (days: number) => Date {
  return (days) => new Date(now.getTime() + days * DAY_MS);
}

/**
 * Students work in the daytime: the moment `daysAgo` before now, moved into 09:00–21:00 (UTC)
 * of the same day, so the history shows no quizzes at 4 a.m. The mapping keeps the order of
 * events (it is increasing in the exact time: two attempts never swap) and never reaches now:
 * min(same day 09:00 + half the time since midnight, halfway between the exact time and now).
 */
export function daytime(now: Date): (daysAgo: number) => Date {
  const nowMs = now.getTime();
  return (daysAgo) => {
    const exact = nowMs - daysAgo * DAY_MS;
    const midnight = Math.floor(exact / DAY_MS) * DAY_MS;
    const inDaytime = midnight + 9 * 3_600_000 + (exact - midnight) / 2;
    return new Date(Math.round(Math.min(inDaytime, nowMs - (nowMs - exact) / 2)));
  };
}

/** YYYY-MM-DD (UTC) of a date, as the notebook's workedOn field wants it. */
export function isoDay(date: Date): string {
  return date.toISOString().slice(0, 10);
}

/** FNV-1a (32 bit) of a text: a stable seed per student or entry, independent of seeding order. */
export function seedOf(text: string): number {
  let hash = 0x811c9dc5;
  for (let i = 0; i < text.length; i += 1) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 0x01000193);
  }
  return hash >>> 0;
}

export function randomFor(text: string): RandomSource {
  return createRandom(seedOf(text));
}

/** A uniformly chosen element. */
export function pick<T>(random: RandomSource, items: readonly T[]): T {
  return items[Math.min(items.length - 1, Math.floor(random() * items.length))];
}

/** `count` distinct indices below `n`, chosen uniformly (partial Fisher–Yates). */
export function chooseIndices(random: RandomSource, n: number, count: number): number[] {
  const pool = Array.from({ length: n }, (_, i) => i);
  const out: number[] = [];
  for (let i = 0; i < Math.min(count, n); i += 1) {
    const j = i + Math.floor(random() * (n - i));
    [pool[i], pool[j]] = [pool[j], pool[i]];
    out.push(pool[i]);
  }
  return out;
}
