import fs from "node:fs";
import path from "node:path";
import { QueryTypes } from "sequelize";
import sqlite3 from "sqlite3";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createApp } from "../../server/app";
import { MIGRATIONS } from "../../server/db/migrations";
import { createTestApp, createUser, type TestApp } from "../support/test-app";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t?.cleanup());

const pragma = async (name: string, transaction?: unknown) => {
  const rows = await t.db.sequelize.query<Record<string, unknown>>(`PRAGMA ${name}`, {
    type: QueryTypes.SELECT,
    transaction: transaction as never,
  });
  return Object.values(rows[0])[0];
};

describe("connection pragmas", () => {
  it("a plain sqlite3 connection does NOT have them by default (so the checks below mean something)", async () => {
    const raw = new sqlite3.Database(path.join(t.dir, "test.sqlite"));
    const get = (sql: string) =>
      new Promise<Record<string, unknown>>((resolve, reject) => raw.get(sql, (err, row) => (err ? reject(err) : resolve(row as never))));
    expect(Object.values(await get("PRAGMA foreign_keys"))[0]).toBe(0);
    expect(Object.values(await get("PRAGMA busy_timeout"))[0]).not.toBe(5000);
    await new Promise((r) => raw.close(r));
  });

  it("the shared connection has busy_timeout, synchronous=FULL and foreign_keys", async () => {
    expect(await pragma("busy_timeout")).toBe(5000);
    expect(await pragma("synchronous")).toBe(2); // 2 = FULL
    expect(await pragma("foreign_keys")).toBe(1);
    expect(await pragma("journal_mode")).toBe("wal");
  });

  it("a write transaction's connection (the queue's own, not the shared reader) has them too", async () => {
    const seen = await t.db.write(async (transaction) => ({
      busy: await pragma("busy_timeout", transaction),
      sync: await pragma("synchronous", transaction),
      fk: await pragma("foreign_keys", transaction),
      // Proof that this really is a different connection from the readers' "default" one.
      inTx: await t.db.sequelize
        .query("SELECT 1 AS one", { type: QueryTypes.SELECT, transaction })
        .then(() => (transaction as unknown as { connection: { uuid?: string } }).connection.uuid),
    }));
    expect(seen.busy).toBe(5000);
    expect(seen.sync).toBe(2);
    expect(seen.fk).toBe(1);
    expect(seen.inTx).toBeTruthy();
    expect(seen.inTx).not.toBe("default");
  });

  it("a transaction opened directly with sequelize.transaction (outside the queue) has them as well", async () => {
    const fk = await t.db.sequelize.transaction(async (transaction) => pragma("foreign_keys", transaction));
    expect(fk).toBe(1);
  });
});

describe("write queue", () => {
  it("runs 16 concurrent read-modify-write transactions without SQLITE_BUSY or lost updates", async () => {
    await t.db.sequelize.query("CREATE TABLE counter (id INTEGER PRIMARY KEY, n INTEGER NOT NULL)");
    await t.db.write((tx) => t.db.sequelize.query("INSERT INTO counter (id, n) VALUES (1, 0)", { transaction: tx }));
    const spans: [number, number][] = [];
    const results = await Promise.allSettled(
      Array.from({ length: 16 }, () =>
        t.db.write(async (tx) => {
          const start = performance.now();
          const [{ n }] = await t.db.sequelize.query<{ n: number }>("SELECT n FROM counter WHERE id = 1", {
            type: QueryTypes.SELECT,
            transaction: tx,
          });
          await new Promise((r) => setTimeout(r, 5)); // widen the race window
          await t.db.sequelize.query("UPDATE counter SET n = ? WHERE id = 1", { replacements: [n + 1], transaction: tx });
          spans.push([start, performance.now()]);
        }),
      ),
    );
    expect(results.filter((r) => r.status === "rejected")).toEqual([]);
    const [{ n }] = await t.db.sequelize.query<{ n: number }>("SELECT n FROM counter WHERE id = 1", { type: QueryTypes.SELECT });
    expect(n).toBe(16);
    // Strictly one after another.
    spans.sort((a, b) => a[0] - b[0]);
    for (let i = 1; i < spans.length; i++) expect(spans[i][0]).toBeGreaterThanOrEqual(spans[i - 1][1]);
    expect(t.db.writeQueueDepth).toBe(0);
  });

  it("rolls back a write that throws, and keeps going", async () => {
    await expect(
      t.db.write(async (tx) => {
        await t.db.sequelize.query("UPDATE counter SET n = 1000 WHERE id = 1", { transaction: tx });
        throw new Error("changed my mind");
      }),
    ).rejects.toThrow("changed my mind");
    const [{ n }] = await t.db.sequelize.query<{ n: number }>("SELECT n FROM counter WHERE id = 1", { type: QueryTypes.SELECT });
    expect(n).toBe(16);
    await t.db.write((tx) => t.db.sequelize.query("UPDATE counter SET n = n + 1 WHERE id = 1", { transaction: tx }));
  });

  it("a nested write joins the outer transaction, and a query that forgets { transaction } still uses it", async () => {
    const outcome = await Promise.race([
      t.db.write(async () => {
        // No transaction passed: picked up from the async context instead of deadlocking on the lock.
        await t.db.sequelize.query("UPDATE counter SET n = n + 1 WHERE id = 1");
        await t.db.write((inner) => t.db.sequelize.query("UPDATE counter SET n = n + 1 WHERE id = 1", { transaction: inner }));
        return "done";
      }),
      new Promise((r) => setTimeout(() => r("deadlocked"), 4000)),
    ]);
    expect(outcome).toBe("done");
    const [{ n }] = await t.db.sequelize.query<{ n: number }>("SELECT n FROM counter WHERE id = 1", { type: QueryTypes.SELECT });
    expect(n).toBe(19);
  });
});

describe("the write queue's connection", () => {
  // Sequelize opens and closes a connection per transaction; the queue keeps one open instead
  // (opening one cost as much as the commit's fsync, halving write throughput).
  const probeRows = (tx: unknown) =>
    t.db.sequelize.query<{ n: number }>("SELECT count(*) AS n FROM temp.writer_probe", { type: QueryTypes.SELECT, transaction: tx as never });

  it("is the same connection from one write to the next (a TEMP table, private to a connection, survives)", async () => {
    await t.db.write((tx) => t.db.sequelize.query("CREATE TEMP TABLE writer_probe (x INTEGER)", { transaction: tx }));
    await t.db.write((tx) => t.db.sequelize.query("INSERT INTO temp.writer_probe VALUES (1)", { transaction: tx }));
    const [{ n }] = await t.db.write((tx) => probeRows(tx));
    expect(n).toBe(1);
    // Readers use their own connection: the TEMP table does not exist there.
    await expect(t.db.sequelize.query("SELECT count(*) FROM temp.writer_probe", { type: QueryTypes.SELECT })).rejects.toThrow(/no such table/);
  });

  it("is replaced by a fresh one after a commit fails, and writes go on", async () => {
    const connectionOf = (tx: unknown) => (tx as { connection: object }).connection;
    const before = await t.db.write(async (tx) => connectionOf(tx));
    // A commit that fails leaves the connection in an unknown state: Sequelize destroys it.
    await expect(
      t.db.write(async (tx) => {
        await t.db.sequelize.query("COMMIT", { transaction: tx }); // ends the transaction early, so Sequelize's COMMIT fails
      }),
    ).rejects.toThrow();
    const after = await t.db.write(async (tx) => connectionOf(tx));
    expect(after).not.toBe(before);
    await expect(t.db.write((tx) => probeRows(tx))).rejects.toThrow(/no such table/); // the TEMP table went with the old one
    await t.db.write((tx) => t.db.sequelize.query("UPDATE counter SET n = n + 1 WHERE id = 1", { transaction: tx }));
    const [{ n }] = await t.db.sequelize.query<{ n: number }>("SELECT n FROM counter WHERE id = 1", { type: QueryTypes.SELECT });
    expect(n).toBe(20);
  });
});

describe("schema", () => {
  it("applies the migrations at startup and records them", async () => {
    const rows = await t.db.sequelize.query<{ name: string }>("SELECT name FROM SequelizeMeta ORDER BY name", { type: QueryTypes.SELECT });
    expect(rows.map((r) => r.name)).toEqual(MIGRATIONS.map((m) => m.name).sort());
    expect(rows.map((r) => r.name)).toContain("0001-initial");
    const tables = await t.db.sequelize.getQueryInterface().showAllTables();
    for (const table of ["Users", "Cohorts", "Enrollments", "Modules", "Assignments", "LessonProgress", "QuizAttempts", "AuditLogs", "Sessions"]) {
      expect(tables).toContain(table);
    }
  });

  it("does not re-apply migrations on the next start", async () => {
    const again = await createApp({ ...t.config });
    try {
      expect(again.db.appliedMigrations).toEqual([]);
    } finally {
      await again.close();
    }
  });

  it("enforces foreign keys: an enrollment in a missing cohort fails", async () => {
    const student = await createUser(t, { email: "fk@cinderfield.test", role: "student" });
    await expect(
      t.db.write((tx) => t.db.models.Enrollment.create({ studentId: student.id, cohortId: 999_999 }, { transaction: tx })),
    ).rejects.toThrow(/FOREIGN KEY constraint failed/);
  });

  it("enforces unique pairs and valid roles", async () => {
    const instructor = await createUser(t, { email: "teach@cinderfield.test", role: "instructor" });
    const student = await createUser(t, { email: "learn@cinderfield.test", role: "student" });
    const cohort = await t.db.write((tx) => t.db.models.Cohort.create({ name: "Test Cohort", instructorId: instructor.id }, { transaction: tx }));
    await t.db.write((tx) => t.db.models.Enrollment.create({ studentId: student.id, cohortId: cohort.id }, { transaction: tx }));
    await expect(
      t.db.write((tx) => t.db.models.Enrollment.create({ studentId: student.id, cohortId: cohort.id }, { transaction: tx })),
    ).rejects.toMatchObject({ name: "SequelizeUniqueConstraintError" });
    const roleError = await t.db
      .write((tx) => t.db.sequelize.query("UPDATE Users SET role = 'superuser' WHERE id = ?", { replacements: [student.id], transaction: tx }))
      .then(() => null, (err: { parent?: Error }) => err);
    // Sequelize wraps the trigger's SQLITE_CONSTRAINT; the original message is on `parent`.
    expect(roleError?.parent?.message).toMatch(/invalid role/);
  });

  it("QuizAttempt idempotency keys are unique per user", async () => {
    const student = await createUser(t, { email: "quiz@cinderfield.test", role: "student" });
    const attempt = {
      userId: student.id,
      quizId: "iron-and-carbon-quiz",
      idempotencyKey: "k-123",
      answers: { q1: 0 },
      score: 1,
      maxScore: 2,
      graded: [],
      submittedAt: new Date(),
      seed: 42,
    };
    await t.db.write((tx) => t.db.models.QuizAttempt.create(attempt, { transaction: tx }));
    await expect(t.db.write((tx) => t.db.models.QuizAttempt.create(attempt, { transaction: tx }))).rejects.toMatchObject({
      name: "SequelizeUniqueConstraintError",
    });
  });
});

describe("startup checks", () => {
  it("refuses a database file that is not SQLite", async () => {
    const bad = path.join(t.dir, "not-a-db.sqlite");
    fs.writeFileSync(bad, "this is not a database ".repeat(200));
    await expect(createApp({ ...t.config, databasePath: bad })).rejects.toThrow();
  });

  it("reports a recent SQLite (WAL-reset fix)", () => {
    const [major, minor] = t.db.sqliteVersion.split(".").map(Number);
    expect(major * 1000 + minor).toBeGreaterThanOrEqual(3052);
  });
});
