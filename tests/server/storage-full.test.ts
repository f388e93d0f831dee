/**
 * Storage full (reliability guide §5b "Disk full", goal 3), without root or a small file system:
 *   - the database: `PRAGMA max_page_count` makes SQLite answer SQLITE_FULL once the file would
 *     grow past it. It is a per-connection setting and Sequelize opens a new connection for every
 *     transaction, so the test applies it on EVERY connection handed out (as server/db/pragmas.ts
 *     does for the real pragmas), else the queued write transactions would never see it;
 *   - the uploads directory: the upload store's disk seam (`uploadDisk.writeFile`) writes half of
 *     the bytes and then fails with ENOSPC, as a full disk does.
 * Expected: 507 `{ error: { code: "storage_full" } }` without a stack trace, the process keeps
 * serving, no half-written row and no orphan file, and writes resume once there is room again.
 */
import fs from "node:fs";
import path from "node:path";
import { QueryTypes } from "sequelize";
import express from "express";
import request from "supertest";
import sharp from "sharp";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import type { Db } from "../../server/db/database";
import { createLogger } from "../../server/log";
import { errorHandler } from "../../server/middleware/error-handler";
import { uploadDisk } from "../../server/uploads/store";
import { CRASH_QUIZ_ID } from "../support/crash-cycles";
import { newCouponEntry } from "./notebook-fixture";
import { createTestApp, createUser, signIn, type Agent, type TestApp } from "../support/test-app";

interface RawConnection {
  exec(sql: string, cb: (err: Error | null) => void): void;
}

/** Apply `PRAGMA max_page_count` to every connection the app's Sequelize hands out (null = no cap). */
function pageCap(db: Db): { set(maxPages: number | null): void } {
  const manager = db.sequelize.connectionManager as unknown as { getConnection(options?: unknown): Promise<RawConnection> };
  const original = manager.getConnection.bind(manager);
  let cap: number | null = null;
  manager.getConnection = async (options?: unknown) => {
    const connection = await original(options);
    // 1073741823 is SQLite's default maximum page count.
    await new Promise<void>((resolve, reject) =>
      connection.exec(`PRAGMA max_page_count = ${cap ?? 1_073_741_823}`, (err) => (err ? reject(err) : resolve())),
    );
    return connection;
  };
  return { set: (maxPages) => (cap = maxPages) };
}

const pageCount = async (db: Db) =>
  (await db.sequelize.query<{ page_count: number }>("PRAGMA page_count", { type: QueryTypes.SELECT }))[0].page_count;
const integrity = async (db: Db) =>
  (await db.sequelize.query<{ integrity_check: string }>("PRAGMA integrity_check", { type: QueryTypes.SELECT })).map((r) => r.integrity_check);

let t: TestApp;
let cap: { set(maxPages: number | null): void };
let student: { agent: Agent; csrfToken: string; user: { id: number } };
let uploadsDir: string;

beforeAll(async () => {
  // A student of no cohort: no attempt limit at any quiz, whatever the demo school assigns.
  t = await createTestApp();
  cap = pageCap(t.db);
  await createUser(t, { email: "tallow.brine@cinderfield.test", role: "student", password: "anvil-and-quench-7" });
  student = await signIn(t.app, "tallow.brine@cinderfield.test", "anvil-and-quench-7");
  uploadsDir = path.join(t.dir, "uploads");
});
afterAll(() => t?.cleanup());
afterEach(() => cap.set(null));

const submit = (key: string, drawId: number) =>
  student.agent
    .post(`/api/quizzes/${CRASH_QUIZ_ID}/attempts`)
    .set("x-csrf-token", student.csrfToken)
    .send({ idempotencyKey: key, drawId, answers: {} });

const storedKeys = async () =>
  (await t.db.models.QuizAttempt.findAll({ where: { userId: student.user.id, quizId: CRASH_QUIZ_ID }, attributes: ["idempotencyKey"] })).map(
    (r) => r.idempotencyKey,
  );

function expectStorageFull(res: { status: number; body: unknown; text: string; headers: Record<string, string> }) {
  expect(res.status).toBe(507);
  expect(res.body).toEqual({ error: { code: "storage_full", message: expect.stringMatching(/storage is full/) } });
  expect(res.headers["retry-after"]).toBe("60");
  expect(res.text).not.toMatch(/SQLITE|ENOSPC|at .*\.ts|node_modules/);
}

describe("database full (SQLITE_FULL)", () => {
  it("answers 507 storage_full, keeps no half-written attempt, keeps serving, and resumes when there is room", async () => {
    const seeded = (await storedKeys()).length; // the demo history may hold attempts already
    const view = await student.agent.get(`/api/quizzes/${CRASH_QUIZ_ID}`).expect(200);
    cap.set((await pageCount(t.db)) + 4);
    const acknowledged: string[] = [];
    let full: { key: string; drawId: number; res: Awaited<ReturnType<typeof submit>> } | undefined;
    // Each stored attempt holds its graded questions (a few kB), so 4 pages fill within a few dozen.
    for (let i = 1; i <= 200 && !full; i++) {
      const key = `full-db-${i}`;
      const drawId = view.body.drawId + acknowledged.length;
      const res = await submit(key, drawId);
      if (res.status === 201) acknowledged.push(key);
      else full = { key, drawId, res };
    }
    expect(full, "the page cap was never reached").toBeDefined();
    expectStorageFull(full!.res);
    expect(acknowledged.length).toBeGreaterThan(0);

    // Nothing half-written: exactly the acknowledged attempts, and a sound file.
    expect((await storedKeys()).filter((k) => k.startsWith("full-db-")).sort()).toEqual([...acknowledged].sort());
    expect(await storedKeys()).toHaveLength(seeded + acknowledged.length);
    expect(await integrity(t.db)).toEqual(["ok"]);

    // Still serving: health and reads answer while the database is full.
    await student.agent.get("/api/health").expect(200, { ok: true });
    const history = await student.agent.get(`/api/quizzes/${CRASH_QUIZ_ID}/attempts`).expect(200);
    expect(history.body.attempts).toHaveLength(seeded + acknowledged.length);
    // A second write is refused the same way (the failure did not wedge the write queue).
    expectStorageFull(await submit(full!.key, full!.drawId));

    // Room again: the refused submission goes through with its own key, once.
    cap.set(null);
    const retried = await submit(full!.key, full!.drawId);
    expect(retried.status).toBe(201);
    expect((await storedKeys()).filter((k) => k === full!.key)).toHaveLength(1);
    expect(await storedKeys()).toHaveLength(seeded + acknowledged.length + 1);
  });
});

// ---- uploads ------------------------------------------------------------------------------------

const pdf = (tag: string) =>
  Buffer.from(
    `%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\n% ${tag}\ntrailer << /Root 1 0 R >>\n%%EOF\n`,
    "latin1",
  );
const photo = () => sharp({ create: { width: 640, height: 480, channels: 3, background: { r: 192, g: 138, b: 69 } } }).png().toBuffer();

const newEntry = () => newCouponEntry(student, "Storage test coupon");

const upload = (entryId: number, data: Buffer, filename: string) =>
  student.agent.post(`/api/notebook/entries/${entryId}/files`).set("x-csrf-token", student.csrfToken).attach("file", data, { filename, contentType: "application/octet-stream" });

const listUploads = () => (fs.existsSync(uploadsDir) ? fs.readdirSync(uploadsDir).sort() : []);
const fileRows = () => t.db.models.NotebookFile.findAll({ where: { userId: student.user.id } });

/** Swap the disk seam: the n-th write (1-based) and later ones write half their bytes, then fail with ENOSPC. */
function diskFullFrom(nthWrite: number): () => void {
  const real = uploadDisk.writeFile;
  let writes = 0;
  uploadDisk.writeFile = async (file, data, options) => {
    writes += 1;
    if (writes < nthWrite) return real(file, data, options);
    await real(file, data.subarray(0, Math.floor(data.length / 2)), options);
    throw Object.assign(new Error(`ENOSPC: no space left on device, write '${file}'`), { code: "ENOSPC", errno: -28, syscall: "write" });
  };
  return () => {
    uploadDisk.writeFile = real;
  };
}

describe("uploads directory full (ENOSPC)", () => {
  let restore: (() => void) | undefined;
  afterEach(() => {
    restore?.();
    restore = undefined;
  });

  it("a PDF whose write fails part-way: 507, no row, no partial file; the same upload works once there is room", async () => {
    const entryId = await newEntry();
    const rowsBefore = (await fileRows()).length;
    const filesBefore = listUploads();

    restore = diskFullFrom(1);
    expectStorageFull(await upload(entryId, pdf("a"), "report.pdf"));
    expect(await fileRows()).toHaveLength(rowsBefore);
    expect(listUploads()).toEqual(filesBefore);

    restore();
    restore = undefined;
    const ok = await upload(entryId, pdf("a"), "report.pdf");
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    const rows = await fileRows();
    expect(rows).toHaveLength(rowsBefore + 1);
    expect(listUploads()).toEqual([...filesBefore, rows.at(-1)!.storedName].sort());
  });

  it("a photo whose thumbnail write fails after the main image was written: 507, no row, neither file left", async () => {
    const entryId = await newEntry();
    const rowsBefore = (await fileRows()).length;
    const filesBefore = listUploads();

    restore = diskFullFrom(2);
    expectStorageFull(await upload(entryId, await photo(), "coupon.png"));
    expect(await fileRows()).toHaveLength(rowsBefore);
    expect(listUploads()).toEqual(filesBefore);
    await student.agent.get("/api/health").expect(200);
  });

  it("a database that fills while the files are on disk: 507 and the written files are removed", async () => {
    const entries = [await newEntry(), await newEntry(), await newEntry()]; // 20 files each at most
    cap.set((await pageCount(t.db)) + 1);
    let refused: Awaited<ReturnType<typeof upload>> | undefined;
    // Each stored upload adds a row and an audit entry; a page or so fills within a few dozen.
    for (let i = 0; i < 60 && !refused; i++) {
      const res = await upload(entries[Math.floor(i / 20)], pdf(`fill-${i}`), `fill-${i}.pdf`);
      if (res.status !== 201) refused = res;
      // At every step: the directory holds exactly the files of stored rows (any user's).
      const rows = await t.db.models.NotebookFile.findAll();
      expect(listUploads()).toEqual(rows.flatMap((r) => (r.thumbName ? [r.storedName, r.thumbName] : [r.storedName])).sort());
    }
    expect(refused, "the page cap was never reached").toBeDefined();
    expectStorageFull(refused!);
    expect(await integrity(t.db)).toEqual(["ok"]);
  });
});

describe("the error handler's storage mapping", () => {
  // Errors as sqlite3 / Sequelize / node:fs raise them: the code sits on the error, or on .parent.
  const cases: [string, object, number, string][] = [
    ["SQLITE_FULL from Sequelize", { name: "SequelizeDatabaseError", parent: { code: "SQLITE_FULL" } }, 507, "storage_full"],
    ["ENOSPC from node:fs", { code: "ENOSPC", errno: -28 }, 507, "storage_full"],
    ["EDQUOT (disk quota)", { code: "EDQUOT" }, 507, "storage_full"],
    ["SQLITE_READONLY (read-only remount)", { name: "SequelizeDatabaseError", original: { code: "SQLITE_READONLY" } }, 503, "storage_unavailable"],
    ["SQLITE_IOERR", { code: "SQLITE_IOERR" }, 503, "storage_unavailable"],
    ["EROFS from node:fs", { code: "EROFS" }, 503, "storage_unavailable"],
    ["SQLITE_BUSY stays a plain 503", { code: "SQLITE_BUSY" }, 503, "service_unavailable"],
    ["an unknown error stays 500", { code: "EWHATEVER" }, 500, "internal_error"],
  ];
  const app = express();
  app.get("/boom/:i", (req) => {
    throw Object.assign(new Error("low-level detail /var/data/grain-edge.sqlite"), cases[Number(req.params.i)][1]);
  });
  app.use(errorHandler(createLogger("silent")));

  it.each(cases.map((c, i) => [c[0], c[2], c[3], i] as const))("%s -> %i %s", async (_name, status, code, i) => {
    const res = await request(app).get(`/boom/${i}`);
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    expect(res.text).not.toContain("/var/data");
    if (status === 503 || status === 507) expect(Number(res.headers["retry-after"])).toBeGreaterThan(0);
  });
});
