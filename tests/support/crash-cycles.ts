/**
 * kill -9 recovery cycles (reliability guide §5b, goal 1), shared by
 * tests/server/crash-recovery.test.ts (a few cycles) and bench/crash-cycles.ts (many):
 *
 *   start the real server (child process) on a temporary database holding N students (created
 *   directly, in no cohort, so no quiz has an attempt limit for them);
 *   each cycle: N students each stream quiz-attempt submissions (one in flight per student,
 *   a new idempotency key each), the client records which were acknowledged (2xx);
 *   SIGKILL at a seeded random moment 0.3–3 s in; restart on the same files; retry every
 *   unacknowledged key with the same body; then check in the database file that every key sent
 *   is stored exactly once (acknowledged ones with the id the server returned), nothing else,
 *   and that `PRAGMA integrity_check` / `foreign_key_check` are clean.
 *
 * Why one submission in flight per student: quiz draws are numbered (drawId = attempts so far + 1)
 * and the idempotency check comes before the draw check, so a retry of a request that committed
 * gets the stored attempt (200) and one that did not commit still has the right drawId (201).
 */
import http from "node:http";
import {
  checkDatabaseFile,
  createStudentsDirectly,
  makeDataDir,
  openSqlite,
  requestJson,
  signInOverHttp,
  startServer,
  type ServerProcess,
  type Session,
} from "./server-process";

/** Any quiz works: the students are in no cohort, so no attempt limit applies. */
export const CRASH_QUIZ_ID = "powder-route-1";
const STUDENT_PASSWORD = "crash-cycle-passphrase-3";
/** No demo school: the students are created directly (fast), and nothing else writes meanwhile but the app's own jobs. */
const SERVER_ENV = { SEED_DEMO: "0" };

/** mulberry32: small seeded PRNG, so a failing run can be replayed from its logged seed. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Submission {
  key: string;
  drawId: number;
}

interface Student {
  email: string;
  userId: number;
  session: Session;
  /** Attempts this student has stored at the quiz, as far as the client knows. */
  stored: number;
  /** Keys acknowledged with 2xx -> the attempt id the server returned. */
  acknowledged: Map<string, number>;
  /** Keys sent whose answer never came (in flight at the kill); retried after the restart. */
  pending: Submission[];
}

export interface CycleReport {
  cycle: number;
  killAfterMs: number;
  acknowledged: number;
  unacknowledged: number;
  /** Unacknowledged keys that turned out to be committed (the retry got 200 with the stored attempt). */
  committedButUnacknowledged: number;
  /** Non-2xx answers while streaming or retrying (should be 0). */
  errors: string[];
  restartToReadyMs: number;
  missing: number;
  duplicates: number;
  unexpectedRows: number;
  integrity: string;
  foreignKeyViolations: number;
}

export interface CrashRunReport {
  seed: number;
  students: number;
  cycles: CycleReport[];
  totalAcknowledged: number;
  totalRows: number;
  finalExit: { code: number | null; signal: string | null };
}

export interface CrashRunOptions {
  cycles: number;
  seed: number;
  /** Students streaming at once. */
  students?: number;
  /** Kill window, ms after streaming starts. */
  killWindowMs?: [number, number];
  log?: (line: string) => void;
}

const postAttempt = (port: number, agent: http.Agent, s: Student, sub: Submission) =>
  requestJson(port, "POST", `/api/quizzes/${CRASH_QUIZ_ID}/attempts`, {
    session: s.session,
    agent,
    body: { idempotencyKey: sub.key, drawId: sub.drawId, answers: {} },
  });

export async function runCrashCycles(options: CrashRunOptions): Promise<CrashRunReport> {
  const { cycles, seed, students: studentCount = 6, killWindowMs = [300, 3000], log = () => undefined } = options;
  const random = seededRandom(seed);
  const keyPrefix = `crash-${seed}-`;
  const data = makeDataDir("grain-edge-crash-");
  let server: ServerProcess | undefined;
  const reports: CycleReport[] = [];
  try {
    const people = await createStudentsDirectly(data.databasePath, studentCount, STUDENT_PASSWORD);
    server = await startServer(data, SERVER_ENV);
    log(`seed ${seed}: server ready in ${server.readyMs.toFixed(0)} ms on port ${server.port}`);

    const students: Student[] = [];
    for (const p of people) {
      const session = await signInOverHttp(server.port, p.email, STUDENT_PASSWORD);
      const view = await requestJson(server.port, "GET", `/api/quizzes/${CRASH_QUIZ_ID}`, { session });
      if (view.status !== 200) throw new Error(`quiz view: ${view.status} ${JSON.stringify(view.body)}`);
      students.push({
        email: p.email,
        userId: p.id,
        session,
        stored: (view.body as { drawId: number }).drawId - 1,
        acknowledged: new Map(),
        pending: [],
      });
    }
    let keyCounter = 0;
    const newKey = (s: Student) => `${keyPrefix}${s.userId}-${++keyCounter}`;

    for (let cycle = 1; cycle <= cycles; cycle++) {
      const killAfterMs = Math.round(killWindowMs[0] + random() * (killWindowMs[1] - killWindowMs[0]));
      const errors: string[] = [];
      const agent = new http.Agent({ keepAlive: true, maxSockets: studentCount });
      let stop = false;
      let acknowledged = 0;
      const port = server.port;

      // Stream: one submission in flight per student, until the kill.
      const streams = students.map(async (s) => {
        while (!stop) {
          const sub = { key: newKey(s), drawId: s.stored + 1 };
          s.pending.push(sub);
          let res;
          try {
            res = await postAttempt(port, agent, s, sub);
          } catch {
            return; // connection reset by the kill: stays pending
          }
          if (res.status === 201 || res.status === 200) {
            s.pending.pop();
            s.acknowledged.set(sub.key, (res.body as { id: number }).id);
            s.stored += 1;
            acknowledged += 1;
          } else {
            s.pending.pop();
            errors.push(`stream ${s.email} ${sub.key}: ${res.status} ${JSON.stringify(res.body)}`);
            return;
          }
        }
      });
      await new Promise((r) => setTimeout(r, killAfterMs));
      stop = true;
      server.child.kill("SIGKILL");
      const exit = await server.exited;
      await Promise.all(streams);
      agent.destroy();
      if (exit.signal !== "SIGKILL") errors.push(`server exited by itself before the kill: ${JSON.stringify(exit)}`);

      // Restart on the same files and retry what was never acknowledged.
      server = await startServer(data, SERVER_ENV);
      const restartToReadyMs = server.readyMs;
      let unacknowledged = 0;
      let committedButUnacknowledged = 0;
      for (const s of students) {
        for (const sub of s.pending.splice(0)) {
          unacknowledged += 1;
          const res = await postAttempt(server.port, http.globalAgent, s, sub);
          if (res.status === 200 || res.status === 201) {
            if (res.status === 200) committedButUnacknowledged += 1;
            s.acknowledged.set(sub.key, (res.body as { id: number }).id);
            s.stored += 1;
          } else {
            errors.push(`retry ${s.email} ${sub.key}: ${res.status} ${JSON.stringify(res.body)}`);
          }
        }
      }

      const check = await checkStored(data.databasePath, students, keyPrefix);
      const fileCheck = await checkDatabaseFile(data.databasePath);
      const report: CycleReport = {
        cycle,
        killAfterMs,
        acknowledged,
        unacknowledged,
        committedButUnacknowledged,
        errors,
        restartToReadyMs: Math.round(restartToReadyMs),
        ...check,
        integrity: fileCheck.integrity.join("; "),
        foreignKeyViolations: fileCheck.foreignKeyViolations,
      };
      reports.push(report);
      log(
        `cycle ${cycle}: kill at ${killAfterMs} ms, ${acknowledged} acknowledged, ${unacknowledged} retried ` +
          `(${committedButUnacknowledged} had committed), missing ${check.missing}, duplicates ${check.duplicates}, ` +
          `unexpected ${check.unexpectedRows}, integrity ${report.integrity}, fk ${report.foreignKeyViolations}, ` +
          `restart ${report.restartToReadyMs} ms${errors.length ? `, errors: ${errors.join(" | ")}` : ""}`,
      );
    }

    // A clean stop at the end: SIGTERM, exit 0.
    server.child.kill("SIGTERM");
    const finalExit = await server.exited;
    server = undefined;
    const db = await openSqlite(data.databasePath);
    const [{ n }] = await db.all<{ n: number }>("SELECT COUNT(*) AS n FROM QuizAttempts WHERE idempotencyKey LIKE ?", [`${keyPrefix}%`]);
    await db.close();
    return {
      seed,
      students: studentCount,
      cycles: reports,
      totalAcknowledged: students.reduce((sum, s) => sum + s.acknowledged.size, 0),
      totalRows: n,
      finalExit,
    };
  } finally {
    if (server && server.child.exitCode === null && server.child.signalCode === null) {
      server.child.kill("SIGKILL");
      await server.exited;
    }
    data.remove();
  }
}

/** Every key the clients hold is stored exactly once with the id they were given; no other rows. */
async function checkStored(file: string, students: Student[], keyPrefix: string): Promise<{ missing: number; duplicates: number; unexpectedRows: number }> {
  const db = await openSqlite(file);
  try {
    // Only this run's keys: the demo seed may hold attempts of its own.
    const rows = await db.all<{ id: number; userId: number; idempotencyKey: string }>(
      "SELECT id, userId, idempotencyKey FROM QuizAttempts WHERE idempotencyKey LIKE ?",
      [`${keyPrefix}%`],
    );
    const byKey = new Map<string, number[]>();
    for (const r of rows) {
      const k = `${r.userId}/${r.idempotencyKey}`;
      byKey.set(k, [...(byKey.get(k) ?? []), r.id]);
    }
    let missing = 0;
    let duplicates = 0;
    const known = new Set<string>();
    for (const s of students) {
      for (const [key, id] of s.acknowledged) {
        known.add(`${s.userId}/${key}`);
        const ids = byKey.get(`${s.userId}/${key}`) ?? [];
        if (!ids.includes(id)) missing += 1;
        if (ids.length > 1) duplicates += ids.length - 1;
      }
    }
    const unexpectedRows = rows.filter((r) => !known.has(`${r.userId}/${r.idempotencyKey}`)).length;
    return { missing, duplicates, unexpectedRows };
  } finally {
    await db.close();
  }
}
