import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { Op } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadConfig, PROJECT_ROOT } from "../../server/config";
import { DEMO_OTHER_STUDENTS } from "../../server/db/seed/demo";
import { createTestApp, DEMO, signIn, type TestApp } from "../support/test-app";

describe("loadConfig", () => {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "grain-edge-config-"));
  afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

  it("has sensible defaults", () => {
    const c = loadConfig({ SESSION_SECRET: "s".repeat(40) });
    expect(c.port).toBe(3000);
    expect(c.databasePath).toBe(path.join(PROJECT_ROOT, "data", "grain-edge.sqlite"));
    expect(c.clientDistDir).toBe(path.join(PROJECT_ROOT, "dist"));
    expect(c.seedDemo).toBe(true);
    expect(c.cookieSecure).toBe(false);
    expect(c.trustProxy).toBe(false);
    expect(c.loginRateLimit).toEqual({ windowMs: 15 * 60_000, limit: 10 });
    expect(c.session.absoluteTimeoutMs).toBe(12 * 3_600_000);
  });

  it("SEED_DEMO=0 turns the demo off; TRUST_PROXY implies secure cookies", () => {
    expect(loadConfig({ SESSION_SECRET: "s".repeat(40), SEED_DEMO: "0" }).seedDemo).toBe(false);
    const proxied = loadConfig({ SESSION_SECRET: "s".repeat(40), TRUST_PROXY: "1" });
    expect(proxied.trustProxy).toBe(1);
    expect(proxied.cookieSecure).toBe(true);
    expect(loadConfig({ SESSION_SECRET: "s".repeat(40), TRUST_PROXY: "1", COOKIE_SECURE: "0" }).cookieSecure).toBe(false);
  });

  it("generates a random session secret once and keeps it next to the database", () => {
    const env = { DATABASE_PATH: path.join(dir, "db.sqlite") };
    const first = loadConfig(env).sessionSecret;
    const second = loadConfig(env).sessionSecret;
    expect(first).toHaveLength(43); // 32 random bytes, base64url
    expect(second).toBe(first);
    const file = path.join(dir, "session-secret");
    expect(fs.statSync(file).mode & 0o777).toBe(0o600);
    const other = loadConfig({ DATABASE_PATH: path.join(dir, "elsewhere", "db.sqlite") }).sessionSecret;
    expect(other).not.toBe(first);
  });

  it("fails with one readable message naming the bad variables", () => {
    expect(() => loadConfig({ PORT: "eighty", SESSION_SECRET: "short" })).toThrow(/PORT[\s\S]*SESSION_SECRET/);
  });
});

describe("demo school seed", () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seedDemo: true, env: { LOGIN_RATE_LIMIT: "1000" } });
  });
  afterAll(() => t?.cleanup());

  it("creates the Cinderfield Forge School: 1 admin, 2 instructors, 17 students, 2 cohorts, 6 modules", async () => {
    const { User, Cohort, Module, Enrollment, Assignment, LessonProgress } = t.db.models;
    expect(await User.count({ where: { role: "admin" } })).toBe(1);
    expect(await User.count({ where: { role: "instructor" } })).toBe(2);
    expect(await User.count({ where: { role: "student" } })).toBe(1 + DEMO_OTHER_STUDENTS.length);
    expect((await Cohort.findAll({ order: [["name", "ASC"]] })).map((c) => c.name)).toEqual(["Autumn Forge Cohort", "Weekend Bladesmiths"]);
    expect((await Module.findAll({ order: [["order", "ASC"]] })).map((m) => m.slug)).toEqual([
      "iron-carbon-hardness",
      "why-stainless",
      "carbides-and-the-edge",
      "melt-to-ingot",
      "powder-route",
      "choosing-and-treating",
    ]);
    expect(await Enrollment.count()).toBeGreaterThanOrEqual(17);
    const dues = (await Assignment.findAll()).map((a) => a.dueAt.getTime());
    expect(dues.filter((d) => d < Date.now())).toHaveLength(1); // exactly one overdue
    expect(await LessonProgress.count({ where: { completedAt: { [Op.ne]: null } } })).toBeGreaterThan(0);
  });

  it("every demo role signs in with forge-demo-1 and sees its summary", async () => {
    const student = await signIn(t.app, DEMO.student.email);
    const s = (await student.agent.get("/api/me/summary").expect(200)).body;
    expect(s.role).toBe("student");
    expect(s.cohorts.map((c: { name: string }) => c.name)).toEqual(["Autumn Forge Cohort", "Weekend Bladesmiths"]);
    expect(s.cohorts[0].instructorName).toBe("Hale Emberton");
    expect(s.cohorts[0].overdueCount).toBe(1);
    expect(s.progress).toEqual({ lessonsStarted: 2, lessonsCompleted: 1 });

    const instructor = await signIn(t.app, DEMO.instructor.email);
    const i = (await instructor.agent.get("/api/me/summary").expect(200)).body;
    expect(i).toEqual({
      role: "instructor",
      cohorts: [{ id: expect.any(Number), name: "Autumn Forge Cohort", studentCount: 13, assignmentCount: 3, archived: false }],
    });
    await signIn(t.app, DEMO.instructor2.email);

    const admin = await signIn(t.app, DEMO.admin.email);
    const a = (await admin.agent.get("/api/me/summary").expect(200)).body;
    expect(a.counts).toMatchObject({ users: 20, students: 17, instructors: 2, admins: 1, cohorts: 2, activeCohorts: 2 });
  });

  it("does not seed again when users exist", async () => {
    const { seedDemoIfEmpty } = await import("../../server/db/seed/demo");
    expect(await seedDemoIfEmpty(t.db, t.logger)).toBe(false);
    expect(await t.db.models.User.count()).toBe(20);
  });

  it("SEED_DEMO=0 leaves the database empty (no default admin)", async () => {
    const empty = await createTestApp({ seedDemo: false });
    try {
      expect(await empty.db.models.User.count()).toBe(0);
    } finally {
      await empty.cleanup();
    }
  });
});
