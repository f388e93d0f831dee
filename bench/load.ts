/**
 * `npm run bench:load [-- SECONDS]`: load figures for quiz submissions (reliability guide §5a,
 * goal 2), stored in bench/results.json under "load" (other sections are kept).
 *
 * Setup: a temporary SQLite database with 200 students, created directly with a CHEAP argon2 hash
 * (1 MiB, 1 pass: sign-in verification reads the parameters from the hash, so 200 sign-ins take
 * seconds; the product's own hashes are never this weak). The real server runs as a child process
 * (`node --import tsx server/index.ts`, NODE_ENV=production) and the 200 students sign in over HTTP.
 *
 * Runs: autocannon at 10 and 50 connections for SECONDS (default 10) each, every request a
 * POST /api/quizzes/powder-route-1/attempts with a new idempotency key for one student (a student
 * is used by one connection at a time, because quiz draws are numbered). Reported per run: req/s,
 * latency p50/p97.5/p99/max, non-2xx, errors/timeouts, then from the database file: rows vs
 * acknowledged, acknowledged keys missing, duplicates, rows no client saw acknowledged (requests
 * cut off at the end of the run), the server's error log lines and RSS.
 *
 * Load generator and server share the 2-core machine; loopback only; bounded by duration.
 */
import fs from "node:fs";
import autocannon, { type RawRequest } from "autocannon";
import { CRASH_QUIZ_ID as QUIZ_ID } from "../tests/support/crash-cycles";
import { createStudentsDirectly, makeDataDir, openSqlite, signInOverHttp, startServer, type Session } from "../tests/support/server-process";
import { machineNote, mergeResults } from "./merge-results";

const STUDENTS = 200;
const CONNECTIONS = [10, 50];
const seconds = Number(process.argv[2] ?? 10);
if (!Number.isInteger(seconds) || seconds < 1 || seconds > 120) throw new Error("SECONDS must be an integer from 1 to 120");
const PASSWORD = "load-bench-passphrase-7";

interface Student {
  userId: number;
  session: Session;
  stored: number;
}

const data = makeDataDir("grain-edge-load-");
let server: Awaited<ReturnType<typeof startServer>> | undefined;

function rssMb(pid: number): number | null {
  try {
    const kb = Number(/VmRSS:\s+(\d+)/.exec(fs.readFileSync(`/proc/${pid}/status`, "utf8"))?.[1]);
    return Math.round(kb / 1024);
  } catch {
    return null;
  }
}

async function storedCounts(): Promise<Map<number, number>> {
  const db = await openSqlite(data.databasePath);
  const rows = await db.all<{ userId: number; n: number }>("SELECT userId, COUNT(*) AS n FROM QuizAttempts WHERE quizId = ? GROUP BY userId", [QUIZ_ID]);
  await db.close();
  return new Map(rows.map((r) => [r.userId, r.n]));
}

/** Requests cut off at the end of a run may still be in the server's write queue: wait until the counts stop changing. */
async function settledCounts(): Promise<Map<number, number>> {
  let previous = await storedCounts();
  for (let i = 0; i < 20; i++) {
    await new Promise((r) => setTimeout(r, 500));
    const next = await storedCounts();
    if ([...next].every(([id, n]) => previous.get(id) === n) && next.size === previous.size) return next;
    previous = next;
  }
  return previous;
}

async function run(connections: number, students: Student[]) {
  const runId = `c${connections}`;
  const counts = await settledCounts();
  for (const s of students) s.stored = counts.get(s.userId) ?? 0; // requests cut off last run may have committed
  const free = [...students];
  const acknowledged = new Set<string>();
  let keyCounter = 0;
  let noFreeStudent = 0;
  const errorLinesBefore = server!.output().split("\n").filter((l) => l.includes('"level":"error"')).length;

  const result = await autocannon({
    url: `http://127.0.0.1:${server!.port}`,
    connections,
    duration: seconds,
    timeout: 10,
    requests: [
      {
        setupRequest(req, context): RawRequest {
          const s = free.shift();
          if (!s) {
            noFreeStudent += 1;
            return { ...req, method: "GET", path: "/api/health", headers: {}, body: undefined };
          }
          const key = `load-${runId}-${s.userId}-${++keyCounter}`;
          context.student = s;
          context.key = key;
          return {
            ...req,
            method: "POST",
            path: `/api/quizzes/${QUIZ_ID}/attempts`,
            headers: { "content-type": "application/json", cookie: s.session.cookie, "x-csrf-token": s.session.csrfToken },
            body: JSON.stringify({ idempotencyKey: key, drawId: s.stored + 1, answers: {} }),
          };
        },
        onResponse(status, _body, context) {
          const s = context.student as Student | undefined;
          if (!s) return;
          if (status === 201 || status === 200) {
            s.stored += 1;
            acknowledged.add(`${s.userId}/${context.key as string}`);
          }
          free.push(s);
        },
      },
    ],
  });

  // What the database holds for this run's keys (once the writes still queued have landed).
  await settledCounts();
  const db = await openSqlite(data.databasePath);
  const rows = await db.all<{ userId: number; idempotencyKey: string; n: number }>(
    "SELECT userId, idempotencyKey, COUNT(*) AS n FROM QuizAttempts WHERE idempotencyKey LIKE ? GROUP BY userId, idempotencyKey",
    [`load-${runId}-%`],
  );
  await db.close();
  const stored = new Set(rows.map((r) => `${r.userId}/${r.idempotencyKey}`));
  const missing = [...acknowledged].filter((k) => !stored.has(k)).length;
  const duplicates = rows.reduce((n, r) => n + (r.n - 1), 0);
  const unacknowledgedRows = rows.filter((r) => !acknowledged.has(`${r.userId}/${r.idempotencyKey}`)).length;
  const errorLines = server!.output().split("\n").filter((l) => l.includes('"level":"error"'));
  const status5xx = Object.entries(result.statusCodeStats ?? {})
    .filter(([code]) => code.startsWith("5"))
    .reduce((n, [, v]) => n + Number(v.count), 0);

  return {
    connections,
    durationS: result.duration,
    requestsPerSecond: Math.round(result.requests.average * 10) / 10,
    acknowledgedPerSecond: Math.round((acknowledged.size / result.duration) * 10) / 10,
    latencyMs: { p50: result.latency.p50, p97_5: result.latency.p97_5, p99: result.latency.p99, max: result.latency.max, mean: Math.round(result.latency.mean * 10) / 10 },
    non2xx: result.non2xx,
    status5xx,
    statusCodes: Object.fromEntries(Object.entries(result.statusCodeStats ?? {}).map(([k, v]) => [k, Number(v.count)])),
    errors: result.errors,
    timeouts: result.timeouts,
    acknowledged: acknowledged.size,
    rows: rows.length,
    missing,
    duplicates,
    unacknowledgedRows,
    busyLogLines: errorLines.filter((l) => /SQLITE_BUSY|SequelizeTimeoutError/.test(l)).length,
    serverErrorLogLines: errorLines.length - errorLinesBefore,
    serverRssMb: rssMb(server!.child.pid!),
    fallbackHealthRequests: noFreeStudent,
  };
}

try {
  const t0 = performance.now();
  const created = await createStudentsDirectly(data.databasePath, STUDENTS, PASSWORD);
  server = await startServer(data, { SEED_DEMO: "0" });
  const students: Student[] = [];
  // Sign in 8 at a time (cheap hashes; the server still caps argon2 at 2 at once).
  for (let i = 0; i < created.length; i += 8) {
    const batch = created.slice(i, i + 8);
    const sessions = await Promise.all(batch.map((u) => signInOverHttp(server!.port, u.email, PASSWORD)));
    students.push(...batch.map((u, j) => ({ userId: u.id, session: sessions[j], stored: 0 })));
  }
  console.log(`setup: ${STUDENTS} students signed in, ${Math.round(performance.now() - t0)} ms`);

  const runs = [];
  for (const c of CONNECTIONS) {
    const r = await run(c, students);
    console.log(
      `${c} connections: ${r.requestsPerSecond} req/s, p50 ${r.latencyMs.p50} ms, p97.5 ${r.latencyMs.p97_5} ms, p99 ${r.latencyMs.p99} ms, ` +
        `non-2xx ${r.non2xx}, errors ${r.errors}, acknowledged ${r.acknowledged}, rows ${r.rows}, missing ${r.missing}, duplicates ${r.duplicates}`,
    );
    runs.push(r);
  }

  server.child.kill("SIGTERM");
  const exit = await server.exited;
  server = undefined;
  const section = {
    machine: machineNote(),
    students: STUDENTS,
    secondsPerRun: seconds,
    runs,
    sigtermExit: exit,
    description:
      "autocannon 9 on loopback against the real server (child process, NODE_ENV=production, SQLite WAL, synchronous=FULL); every request is a quiz submission with a new idempotency key for one of 200 signed-in students; load generator and server share the 2 cores.",
  };
  mergeResults("load", section);
  console.log(JSON.stringify(section, null, 2));
} finally {
  if (server && server.child.exitCode === null) {
    server.child.kill("SIGKILL");
    await server.exited;
  }
  data.remove();
}
