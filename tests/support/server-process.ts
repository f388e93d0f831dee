/**
 * The real server as a child process, started the way `npm start` / `npm run serve` start it
 * (`node --import tsx server/index.ts`, no npm in between so signals reach the server itself),
 * on a temporary data directory and an ephemeral port on 127.0.0.1. Used by the crash-recovery
 * and shutdown tests and by bench/crash-cycles.ts and bench/load.ts.
 *
 * Also: a tiny HTTP/1.1 JSON client with one session cookie (node:http, no hidden headers), and a
 * direct SQLite connection for checks the API cannot make (integrity, rows per key).
 */
import { spawn, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import os from "node:os";
import path from "node:path";
import argon2 from "argon2";
import sqlite3 from "sqlite3";
import { PROJECT_ROOT } from "../../server/config";
import { openDatabase } from "../../server/db/database";
import { createLogger } from "../../server/log";

export interface DataDir {
  dir: string;
  databasePath: string;
  distDir: string;
  /** The same secret on every start, so sessions and quiz draws survive restarts. */
  sessionSecret: string;
  remove(): void;
}

export function makeDataDir(prefix = "grain-edge-proc-"): DataDir {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), prefix));
  const distDir = path.join(dir, "dist");
  fs.mkdirSync(distDir, { recursive: true });
  fs.writeFileSync(path.join(distDir, "index.html"), "<!doctype html><title>test build</title>");
  return {
    dir,
    databasePath: path.join(dir, "grain-edge.sqlite"),
    distDir,
    sessionSecret: randomBytes(32).toString("hex"),
    remove: () => fs.rmSync(dir, { recursive: true, force: true }),
  };
}

export interface ServerProcess {
  child: ChildProcess;
  port: number;
  /** Milliseconds from spawn to the "listening" log line. */
  readyMs: number;
  /** Everything the process printed so far (stdout and stderr). */
  output(): string;
  /** Resolves when the process has exited. */
  exited: Promise<{ code: number | null; signal: NodeJS.Signals | null }>;
  /** Resolves when a printed line contains `text` (rejects if the process exits first). */
  waitForOutput(text: string, timeoutMs?: number): Promise<void>;
}

export async function startServer(data: DataDir, env: Record<string, string> = {}, readyTimeoutMs = 90_000): Promise<ServerProcess> {
  const started = performance.now();
  const child = spawn(process.execPath, ["--import", "tsx", "server/index.ts"], {
    cwd: PROJECT_ROOT,
    env: {
      PATH: process.env.PATH ?? "",
      HOME: process.env.HOME ?? os.tmpdir(),
      NODE_ENV: "production",
      HOST: "127.0.0.1",
      PORT: "0",
      DATABASE_PATH: data.databasePath,
      CLIENT_DIST_DIR: data.distDir,
      SESSION_SECRET: data.sessionSecret,
      SEED_DEMO: "1",
      LOG_LEVEL: "info",
      LOGIN_RATE_LIMIT: "100000",
      ...env,
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let out = "";
  const listeners = new Set<() => void>();
  const onData = (chunk: Buffer) => {
    out += chunk.toString("utf8");
    for (const l of listeners) l();
  };
  child.stdout!.on("data", onData);
  child.stderr!.on("data", onData);
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) => {
    child.once("exit", (code, signal) => {
      resolve({ code, signal });
      for (const l of listeners) l();
    });
  });
  let hasExited = false;
  void exited.then(() => (hasExited = true));

  const waitForOutput = (text: string, timeoutMs = 30_000) =>
    new Promise<void>((resolve, reject) => {
      const check = () => {
        if (out.includes(text)) return done(resolve);
        if (hasExited || child.exitCode !== null || child.signalCode !== null) {
          done(() => reject(new Error(`server exited before printing ${JSON.stringify(text)}:\n${out.slice(-3000)}`)));
        }
      };
      const timer = setTimeout(() => done(() => reject(new Error(`no ${JSON.stringify(text)} within ${timeoutMs} ms:\n${out.slice(-3000)}`))), timeoutMs);
      const done = (fn: () => void) => {
        clearTimeout(timer);
        listeners.delete(check);
        fn();
      };
      listeners.add(check);
      check();
    });

  try {
    await waitForOutput('"msg":"listening"', readyTimeoutMs);
  } catch (err) {
    child.kill("SIGKILL");
    throw err;
  }
  const line = out.split("\n").find((l) => l.includes('"msg":"listening"'))!;
  const port = (JSON.parse(line) as { port: number }).port;
  return { child, port, readyMs: performance.now() - started, output: () => out, exited, waitForOutput };
}

/**
 * Create `count` students (in no cohort, so no quiz has an attempt limit for them) directly in the
 * database file, before the server starts (migrations run here). Their password hash is a CHEAP
 * argon2id (1 MiB, 1 pass) so that signing many of them in takes seconds: sign-in reads the
 * parameters from the stored hash. Test and bench data only; the product never hashes like this.
 */
export async function createStudentsDirectly(databasePath: string, count: number, password: string): Promise<{ id: number; email: string }[]> {
  const db = await openDatabase({ storage: databasePath, logger: createLogger("silent") });
  try {
    const passwordHash = await argon2.hash(password, { type: argon2.argon2id, memoryCost: 1024, timeCost: 1, parallelism: 1 });
    const rows = await db.write((transaction) =>
      db.models.User.bulkCreate(
        Array.from({ length: count }, (_, i) => ({
          email: `student-${String(i + 1).padStart(3, "0")}@cinderfield.test`,
          displayName: `Test Student ${i + 1}`,
          role: "student" as const,
          passwordHash,
        })),
        { transaction, returning: true },
      ),
    );
    return rows.map((r) => ({ id: r.id, email: r.email }));
  } finally {
    await db.close();
  }
}

// ---- HTTP ---------------------------------------------------------------------------------------

export interface JsonResponse {
  status: number;
  headers: http.IncomingHttpHeaders;
  body: unknown;
}

/** One user's cookie jar (the session cookie only) and CSRF token. */
export interface Session {
  cookie: string;
  csrfToken: string;
}

export function requestJson(
  port: number,
  method: string,
  urlPath: string,
  options: { session?: Session; body?: unknown; agent?: http.Agent; timeoutMs?: number } = {},
): Promise<JsonResponse> {
  const payload = options.body === undefined ? undefined : Buffer.from(JSON.stringify(options.body));
  return new Promise((resolve, reject) => {
    const req = http.request(
      {
        host: "127.0.0.1",
        port,
        method,
        path: urlPath,
        agent: options.agent ?? false,
        headers: {
          accept: "application/json",
          ...(payload ? { "content-type": "application/json", "content-length": String(payload.length) } : {}),
          ...(options.session?.cookie ? { cookie: options.session.cookie } : {}),
          ...(options.session?.csrfToken && method !== "GET" ? { "x-csrf-token": options.session.csrfToken } : {}),
        },
        timeout: options.timeoutMs ?? 30_000,
      },
      (res) => {
        const chunks: Buffer[] = [];
        res.on("data", (c: Buffer) => chunks.push(c));
        res.on("error", reject);
        res.on("end", () => {
          const text = Buffer.concat(chunks).toString("utf8");
          let body: unknown = text;
          try {
            body = text ? JSON.parse(text) : undefined;
          } catch {
            /* not JSON: keep the text */
          }
          resolve({ status: res.statusCode ?? 0, headers: res.headers, body });
        });
      },
    );
    req.on("timeout", () => req.destroy(new Error("request timed out")));
    req.on("error", reject);
    req.end(payload);
  });
}

function cookieFrom(res: JsonResponse, previous = ""): string {
  const set = res.headers["set-cookie"] ?? [];
  const found = set.map((c) => c.split(";")[0]).find((c) => c.startsWith("ge.sid="));
  return found ?? previous;
}

/** Sign in through the real API: csrf -> login -> csrf again (the session was regenerated). */
export async function signInOverHttp(port: number, email: string, password: string): Promise<Session> {
  const first = await requestJson(port, "GET", "/api/auth/csrf");
  const pre: Session = { cookie: cookieFrom(first), csrfToken: (first.body as { csrfToken: string }).csrfToken };
  const login = await requestJson(port, "POST", "/api/auth/login", { session: pre, body: { email, password } });
  if (login.status !== 200) throw new Error(`sign-in as ${email} failed: ${login.status} ${JSON.stringify(login.body)}`);
  const cookie = cookieFrom(login, pre.cookie);
  const again = await requestJson(port, "GET", "/api/auth/csrf", { session: { cookie, csrfToken: "" } });
  return { cookie: cookieFrom(again, cookie), csrfToken: (again.body as { csrfToken: string }).csrfToken };
}

// ---- SQLite -------------------------------------------------------------------------------------

/** A plain sqlite3 connection (another process may be running the server on the same file). */
export async function openSqlite(file: string): Promise<{ all<T>(sql: string, params?: unknown[]): Promise<T[]>; close(): Promise<void> }> {
  const db = await new Promise<sqlite3.Database>((resolve, reject) => {
    const d = new sqlite3.Database(file, (err) => (err ? reject(err) : resolve(d)));
  });
  db.configure("busyTimeout", 5000);
  return {
    all: <T>(sql: string, params: unknown[] = []) =>
      new Promise<T[]>((resolve, reject) => db.all(sql, params, (err, rows) => (err ? reject(err) : resolve(rows as T[])))),
    close: () => new Promise<void>((resolve, reject) => db.close((err) => (err ? reject(err) : resolve()))),
  };
}

/** `PRAGMA integrity_check` and `PRAGMA foreign_key_check` of a database file. */
export async function checkDatabaseFile(file: string): Promise<{ integrity: string[]; foreignKeyViolations: number }> {
  const db = await openSqlite(file);
  try {
    const integrity = (await db.all<{ integrity_check: string }>("PRAGMA integrity_check")).map((r) => r.integrity_check);
    const fk = await db.all("PRAGMA foreign_key_check");
    return { integrity, foreignKeyViolations: fk.length };
  } finally {
    await db.close();
  }
}
