/**
 * Test helpers for the server: an isolated app over a temporary SQLite file, supertest agents
 * that carry the session cookie and a CSRF token, and a listener for browser tests.
 *
 *   const t = await createTestApp();                       // empty DB, fake dist/, demo seed off
 *   const t = await createTestApp({ seedDemo: true });     // the Cinderfield demo school
 *   const s = await signIn(t.app, DEMO.student.email);     // { agent, csrfToken, user }
 *   await s.agent.post("/api/...").set("x-csrf-token", s.csrfToken).send({...});
 *   afterAll(() => t.cleanup());
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import request from "supertest";
import type TestAgent from "supertest/lib/agent";
import type { PublicUser, Role } from "../../shared/api/auth";
import { createApp, type GrainEdgeApp } from "../../server/app";
import { hashPassword } from "../../server/auth/passwords";
import { loadConfig, type Config, type Env } from "../../server/config";
import { DEMO_ADMIN, DEMO_INSTRUCTORS, DEMO_PASSWORD, DEMO_STUDENT } from "../../server/db/seed/demo";

export type App = GrainEdgeApp["app"];
export type Agent = TestAgent;

export const DEMO = {
  password: DEMO_PASSWORD,
  admin: DEMO_ADMIN,
  instructor: DEMO_INSTRUCTORS[0],
  instructor2: DEMO_INSTRUCTORS[1],
  student: DEMO_STUDENT,
} as const;

export const FAKE_INDEX_HTML = "<!doctype html><html><head><title>Grain &amp; Edge (test build)</title></head><body><div id=\"root\">fake-index</div></body></html>";

export interface TestAppOptions {
  /** Seed the demo school (default false). */
  seedDemo?: boolean;
  /** Serve this built client instead of a tiny fake dist/ (e2e tests pass the real "dist"). */
  clientDistDir?: string;
  /** Extra environment variables for loadConfig. */
  env?: Env;
  /** Adjust the parsed config (e.g. rate limits). */
  configure?: (config: Config) => Config;
}

export interface TestApp extends GrainEdgeApp {
  /** Temporary directory holding the database (and the fake dist/). */
  dir: string;
  /** Close the app and delete the temporary directory. */
  cleanup(): Promise<void>;
}

export async function createTestApp(options: TestAppOptions = {}): Promise<TestApp> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "grain-edge-test-"));
  let distDir = options.clientDistDir;
  if (!distDir) {
    distDir = path.join(dir, "dist");
    fs.mkdirSync(path.join(distDir, "assets"), { recursive: true });
    fs.writeFileSync(path.join(distDir, "index.html"), FAKE_INDEX_HTML);
    fs.writeFileSync(path.join(distDir, "assets", "app-3f9a1c.js"), "console.log('fake asset');\n");
    fs.writeFileSync(path.join(distDir, "favicon.svg"), "<svg xmlns=\"http://www.w3.org/2000/svg\"/>");
  }
  let config = loadConfig({
    NODE_ENV: "test",
    DATABASE_PATH: path.join(dir, "test.sqlite"),
    SESSION_SECRET: randomBytes(32).toString("hex"),
    SEED_DEMO: options.seedDemo ? "1" : "0",
    CLIENT_DIST_DIR: distDir, // relative paths resolve against the repository root
    LOG_LEVEL: "silent",
    ...options.env,
  });
  if (options.configure) config = options.configure(config);

  let built: GrainEdgeApp;
  try {
    built = await createApp(config);
  } catch (err) {
    fs.rmSync(dir, { recursive: true, force: true });
    throw err;
  }
  let cleaned = false;
  return {
    ...built,
    dir,
    async cleanup() {
      if (cleaned) return;
      cleaned = true;
      try {
        await built.close();
      } finally {
        fs.rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}

/** A fresh agent (cookie jar) and the CSRF token of its new session. */
export async function csrfAgent(app: App): Promise<{ agent: Agent; csrfToken: string }> {
  const agent = request.agent(app);
  const res = await agent.get("/api/auth/csrf").expect(200);
  return { agent, csrfToken: res.body.csrfToken as string };
}

/** Fetch a new CSRF token for an agent's current session (needed after sign-in and sign-out). */
export async function freshCsrf(agent: Agent): Promise<string> {
  const res = await agent.get("/api/auth/csrf").expect(200);
  return res.body.csrfToken as string;
}

/**
 * Sign in through the real API. Returns the agent, a CSRF token valid AFTER sign-in, the user and
 * the session cookie value (as the browser stores it, for replay tests).
 * Throws with the response body if the sign-in fails.
 */
export async function signIn(
  app: App,
  email: string,
  password: string = DEMO_PASSWORD,
): Promise<{ agent: Agent; csrfToken: string; user: PublicUser; cookie: string }> {
  const { agent, csrfToken: loginToken } = await csrfAgent(app);
  const res = await agent.post("/api/auth/login").set("x-csrf-token", loginToken).send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  const cookie = sessionCookie(res.headers["set-cookie"]) ?? sessionCookie(res.headers["set-cookie"], "__Host-ge.sid") ?? "";
  return { agent, csrfToken: await freshCsrf(agent), user: res.body.user as PublicUser, cookie };
}

const hashCache = new Map<string, Promise<string>>();

/** Insert a user directly (through the write queue). Password hashes are cached per password. */
export async function createUser(
  t: GrainEdgeApp,
  user: { email: string; role: Role; password?: string; displayName?: string; disabled?: boolean },
): Promise<PublicUser> {
  const password = user.password ?? DEMO_PASSWORD;
  if (!hashCache.has(password)) hashCache.set(password, hashPassword(password));
  const passwordHash = await hashCache.get(password)!;
  const row = await t.db.write((transaction) =>
    t.db.models.User.create(
      {
        email: user.email.toLowerCase(),
        displayName: user.displayName ?? user.email.split("@")[0],
        role: user.role,
        passwordHash,
        disabledAt: user.disabled ? new Date() : null,
      },
      { transaction },
    ),
  );
  return { id: row.id, email: row.email, displayName: row.displayName, role: row.role };
}

/** The session id inside a Set-Cookie header list (signed value, as the browser stores it). */
export function sessionCookie(setCookie: string | string[] | undefined, name = "ge.sid"): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const found = list.find((c) => c.startsWith(`${name}=`));
  return found?.split(";")[0].slice(name.length + 1);
}

/** Listen on an ephemeral port on 127.0.0.1 (browser tests). */
export async function listen(app: App): Promise<{ url: string; close: () => Promise<void> }> {
  const server = app.listen(0, "127.0.0.1");
  await new Promise<void>((resolve, reject) => {
    server.once("listening", resolve);
    server.once("error", reject);
  });
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    close: () =>
      new Promise<void>((resolve, reject) => {
        server.closeAllConnections();
        server.close((err) => (err ? reject(err) : resolve()));
      }),
  };
}
