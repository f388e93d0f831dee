/**
 * SIGTERM (reliability guide §5b, Express graceful-shutdown advice): the real server in a child
 * process stops accepting connections, lets the request in flight finish (its write is stored and
 * answered), drops idle keep-alive connections, closes the teaching runtime and the database, and
 * exits 0.
 *
 * "In flight" is made deterministic without timing: the submission is sent with
 * `Expect: 100-continue`, so the server has parsed its headers (and answered 100) before SIGTERM,
 * and its body is sent only after the server has logged "shutting down".
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import http from "node:http";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { createApp } from "../../server/app";
import { loadConfig } from "../../server/config";
import type { Logger } from "../../server/log";
import { teachingRuntimeOf } from "../../server/mail/runtime";
import { CRASH_QUIZ_ID } from "../support/crash-cycles";
import {
  checkDatabaseFile,
  createStudentsDirectly,
  makeDataDir,
  openSqlite,
  requestJson,
  signInOverHttp,
  startServer,
  type ServerProcess,
} from "../support/server-process";

const data = makeDataDir("grain-edge-shutdown-");
let server: ServerProcess | undefined;
afterAll(async () => {
  if (server && server.child.exitCode === null && server.child.signalCode === null) {
    server.child.kill("SIGKILL");
    await server.exited;
  }
  data.remove();
});

describe("SIGTERM", () => {
  it("finishes the request in flight, refuses new connections, and exits 0", { timeout: 120_000 }, async () => {
    const [student] = await createStudentsDirectly(data.databasePath, 1, "tallow-brine-ember-47");
    server = await startServer(data, { SEED_DEMO: "0" });
    const { port } = server;
    const session = await signInOverHttp(port, student.email, "tallow-brine-ember-47");
    const view = await requestJson(port, "GET", `/api/quizzes/${CRASH_QUIZ_ID}`, { session });
    expect(view.status).toBe(200);
    const drawId = (view.body as { drawId: number }).drawId;

    // An idle keep-alive connection must not hold the shutdown up.
    const keepAlive = new http.Agent({ keepAlive: true });
    expect((await requestJson(port, "GET", "/api/health", { agent: keepAlive })).status).toBe(200);

    // A submission whose headers the server has read but whose body has not arrived yet, on a
    // keep-alive connection as a browser would send it (the server must close it once answered).
    const busy = new http.Agent({ keepAlive: true });
    const body = Buffer.from(JSON.stringify({ idempotencyKey: "shutdown-in-flight-1", drawId, answers: {} }));
    const req = http.request({
      host: "127.0.0.1",
      port,
      method: "POST",
      path: `/api/quizzes/${CRASH_QUIZ_ID}/attempts`,
      agent: busy,
      headers: {
        "content-type": "application/json",
        "content-length": String(body.length),
        cookie: session.cookie,
        "x-csrf-token": session.csrfToken,
        expect: "100-continue",
      },
    });
    const response = new Promise<{ status: number; json: { id: number; quizId: string } }>((resolve, reject) => {
      req.on("response", (res) => {
        let text = "";
        res.on("data", (c: Buffer) => (text += c.toString("utf8")));
        res.on("end", () => resolve({ status: res.statusCode ?? 0, json: JSON.parse(text) }));
      });
      req.on("error", reject);
    });
    response.catch(() => undefined); // awaited below; keeps an early failure from also being "unhandled"
    await new Promise<void>((resolve, reject) => {
      req.once("continue", resolve);
      req.once("error", reject);
      req.flushHeaders();
    });

    server.child.kill("SIGTERM");
    await server.waitForOutput('"msg":"shutting down"');

    // The listening socket is closed: a new connection is refused.
    await expect(requestJson(port, "GET", "/api/health")).rejects.toMatchObject({ code: "ECONNREFUSED" });

    // The request in flight completes and is answered with the stored attempt.
    req.end(body);
    const answered = await response;
    expect(answered.status).toBe(201);
    expect(answered.json.quizId).toBe(CRASH_QUIZ_ID);

    const exit = await server.exited;
    keepAlive.destroy();
    busy.destroy();
    expect(exit).toEqual({ code: 0, signal: null });
    expect(server.output()).toContain('"msg":"stopped"');
    expect(server.output()).not.toContain("forced exit");

    // Stored exactly once, and the file is clean after the shutdown.
    const db = await openSqlite(data.databasePath);
    const rows = await db.all<{ id: number }>("SELECT id FROM QuizAttempts WHERE idempotencyKey = ?", ["shutdown-in-flight-1"]);
    await db.close();
    expect(rows).toEqual([{ id: answered.json.id }]);
    const file = await checkDatabaseFile(data.databasePath);
    expect(file).toEqual({ integrity: ["ok"], foreignKeyViolations: 0 });
  });
});

describe("createApp's close()", () => {
  it("stops the teaching runtime (jobs, mailer, in-process SMTP fake) before closing the database", { timeout: 60_000 }, async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "grain-edge-close-"));
    const lines: { msg: string; fields?: Record<string, unknown> }[] = [];
    const record = (msg: string, fields?: Record<string, unknown>) => void lines.push({ msg, fields });
    const logger: Logger = { info: record, warn: record, error: record };
    try {
      const config = loadConfig({
        NODE_ENV: "test",
        DATABASE_PATH: path.join(dir, "close.sqlite"),
        SESSION_SECRET: randomBytes(32).toString("hex"),
        SEED_DEMO: "0",
        CLIENT_DIST_DIR: path.join(dir, "dist"),
      });
      const app = await createApp(config, { logger });
      const runtime = teachingRuntimeOf(app.db)!;
      expect(runtime).toBeDefined();

      // One message through the fake starts it; it lands in the outbox.
      const mail = { to: { address: "wren.ostby@cinderfield.test" }, subject: "Close test", text: "Hello", html: "<p>Hello</p>" };
      await runtime.mailer.send(mail);
      await runtime.invitations.idle();
      expect(await app.db.models.OutboxMessage.count()).toBe(1);
      const port = lines.find((l) => /SMTP fake/.test(l.msg))?.fields?.port as number;
      expect(port).toBeGreaterThan(0);

      await app.close();

      // The mailer refuses new mail, the fake no longer listens, and the database is closed.
      await expect(runtime.mailer.send(mail)).rejects.toThrow(/closed/);
      await expect(
        new Promise((resolve, reject) => net.connect(port, "127.0.0.1").once("connect", resolve).once("error", reject)),
      ).rejects.toMatchObject({ code: "ECONNREFUSED" });
      await expect(app.db.sequelize.query("SELECT 1")).rejects.toThrow();
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
