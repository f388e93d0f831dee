/**
 * The access matrix (reliability guide §5(d)): every instructor and admin route × {anonymous,
 * student, instructor of this cohort, instructor of another cohort, admin}. Expected: 401 for
 * anonymous callers, 403 for function-level denials (wrong role), 404 for object-level denials
 * (someone else's cohort), success otherwise; and after every denied request the database is
 * unchanged (hash of every table a route could touch). Each cell gets fresh records from its
 * setup, so successful writes never disturb the next cell. A role-restricted route missing from
 * this table fails the first test.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ROUTE_POLICY } from "../../server/policy";
import { csrfAgent, type Agent } from "../support/test-app";
import { createTeachingWorld, dbSnapshot, mailSettled, signedUser, type TeachingWorld } from "./teaching-fixture";

type Actor = "anonymous" | "student" | "instructor (this cohort)" | "instructor (other cohort)" | "admin";
const ACTORS: Actor[] = ["anonymous", "student", "instructor (other cohort)", "instructor (this cohort)", "admin"];

/**
 * cohort: object-level rule on :cohortId (other instructor -> 404).
 * staff:  any instructor or admin; lists and creates are scoped to the caller (no 404 case).
 * admin:  admins only.
 * self:   signed-in "self" (self-study) accounts only; every actor here is a school account, so all get 403.
 */
type Scope = "cohort" | "staff" | "admin" | "self";

interface Cell {
  params: Record<string, number>;
  body?: unknown;
}

interface Row {
  method: "GET" | "POST" | "PATCH" | "DELETE";
  path: string;
  scope: Scope;
  /** Status for an allowed caller. */
  ok: number;
  setup?: (actor: Actor) => Promise<Cell>;
}

/**
 * Role-restricted routes whose objects belong to other features (a saved alloy, a notebook entry);
 * their object-level rules are tested with those features. Any OTHER new role-restricted route
 * must be added to ROWS, or the first test fails.
 */
const NOT_IN_THIS_MATRIX = new Set(["POST /api/alloys/:id/attach", "DELETE /api/alloys/:id/attach/:slug", "POST /api/notebook/entries/:id/review"]);

let w: TeachingWorld;
const agents = {} as Record<Actor, { agent: Agent; csrfToken: string }>;
let n = 0;
const DAY_MS = 86_400_000;

/** A fresh cohort taught by the "this cohort" instructor, with one student, one invitation and one assignment. */
async function freshCohort(options: { assignment?: boolean } = {}): Promise<{ cohortId: number; studentId: number; invitationId: number; assignmentId: number }> {
  n += 1;
  return w.t.db.write(async (transaction) => {
    const { Cohort, User, Enrollment, Invitation, Assignment } = w.t.db.models;
    const cohort = await Cohort.create({ name: `Matrix cohort ${n}`, instructorId: w.own.user.id }, { transaction });
    const student = await User.create({ email: `matrix-${n}@cinderfield.test`, displayName: `Matrix ${n}`, role: "student", passwordHash: "x" }, { transaction });
    await Enrollment.create({ cohortId: cohort.id, studentId: student.id }, { transaction });
    const invitation = await Invitation.create(
      { cohortId: cohort.id, email: `invitee-${n}@cinderfield.test`, status: "sent", expiresAt: new Date(Date.now() + DAY_MS), invitedById: w.own.user.id, linkBase: "http://127.0.0.1" },
      { transaction },
    );
    const assignment =
      options.assignment === false
        ? null
        : await Assignment.create({ cohortId: cohort.id, moduleId: w.moduleId, dueAt: new Date(Date.now() + DAY_MS), maxAttemptsPerQuiz: 2 }, { transaction });
    return { cohortId: cohort.id, studentId: student.id, invitationId: invitation.id, assignmentId: assignment?.id ?? 0 };
  });
}

async function freshUser(): Promise<number> {
  n += 1;
  const row = await w.t.db.write((transaction) =>
    w.t.db.models.User.create({ email: `target-${n}@cinderfield.test`, displayName: `Target ${n}`, role: "student", passwordHash: "x" }, { transaction }),
  );
  return row.id;
}

const dueAt = () => new Date(Date.now() + 3 * DAY_MS).toISOString();

const ROWS: Row[] = [
  { method: "GET", path: "/api/cohorts", scope: "staff", ok: 200 },
  {
    method: "POST",
    path: "/api/cohorts",
    scope: "staff",
    ok: 201,
    // Admins must name the instructor; instructors must not.
    setup: async (actor) => ({ params: {}, body: { name: `Created ${++n}`, ...(actor === "admin" ? { instructorId: w.own.user.id } : {}) } }),
  },
  { method: "GET", path: "/api/teaching/overview", scope: "staff", ok: 200 },
  { method: "GET", path: "/api/cohorts/:cohortId", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  { method: "PATCH", path: "/api/cohorts/:cohortId", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort(), body: { name: "Renamed cohort", archived: true } }) },
  { method: "DELETE", path: "/api/cohorts/:cohortId/students/:studentId", scope: "cohort", ok: 204, setup: async () => ({ params: await freshCohort() }) },
  {
    method: "POST",
    path: "/api/cohorts/:cohortId/students/:studentId/move",
    scope: "cohort",
    ok: 204,
    setup: async () => {
      const from = await freshCohort();
      const to = await freshCohort();
      return { params: from, body: { toCohortId: to.cohortId } };
    },
  },
  { method: "GET", path: "/api/cohorts/:cohortId/invitations", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  {
    method: "POST",
    path: "/api/cohorts/:cohortId/invitations",
    scope: "cohort",
    ok: 202,
    setup: async () => ({ params: await freshCohort(), body: { invitations: [{ email: `fresh-${++n}@cinderfield.test` }] } }),
  },
  { method: "POST", path: "/api/cohorts/:cohortId/invitations/:invitationId/resend", scope: "cohort", ok: 202, setup: async () => ({ params: await freshCohort() }) },
  { method: "DELETE", path: "/api/cohorts/:cohortId/invitations/:invitationId", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  {
    method: "POST",
    path: "/api/cohorts/:cohortId/roster/preview",
    scope: "cohort",
    ok: 200,
    setup: async () => ({ params: await freshCohort(), body: { csv: "name,email\nRow One,row.one@cinderfield.test\n" } }),
  },
  {
    method: "POST",
    path: "/api/cohorts/:cohortId/roster/import",
    scope: "cohort",
    ok: 202,
    setup: async () => ({ params: await freshCohort(), body: { csv: `name,email\nRow ${++n},row-${n}@cinderfield.test\n` } }),
  },
  { method: "GET", path: "/api/cohorts/:cohortId/assignments", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  {
    method: "POST",
    path: "/api/cohorts/:cohortId/assignments",
    scope: "cohort",
    ok: 201,
    setup: async () => ({ params: await freshCohort({ assignment: false }), body: { moduleSlug: "basics", dueAt: dueAt(), maxAttemptsPerQuiz: 3 } }),
  },
  {
    method: "PATCH",
    path: "/api/cohorts/:cohortId/assignments/:assignmentId",
    scope: "cohort",
    ok: 204,
    setup: async () => ({ params: await freshCohort(), body: { dueAt: dueAt(), maxAttemptsPerQuiz: 5 } }),
  },
  { method: "DELETE", path: "/api/cohorts/:cohortId/assignments/:assignmentId", scope: "cohort", ok: 204, setup: async () => ({ params: await freshCohort() }) },
  { method: "GET", path: "/api/cohorts/:cohortId/gradebook", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  { method: "GET", path: "/api/cohorts/:cohortId/gradebook.csv", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  { method: "GET", path: "/api/cohorts/:cohortId/analytics", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  { method: "GET", path: "/api/cohorts/:cohortId/students/:studentId/attempts", scope: "cohort", ok: 200, setup: async () => ({ params: await freshCohort() }) },
  { method: "GET", path: "/api/admin/users", scope: "admin", ok: 200 },
  { method: "PATCH", path: "/api/admin/users/:userId", scope: "admin", ok: 200, setup: async () => ({ params: { userId: await freshUser() }, body: { role: "instructor" } }) },
  { method: "DELETE", path: "/api/admin/users/:userId/sessions", scope: "admin", ok: 200, setup: async () => ({ params: { userId: await freshUser() } }) },
  { method: "GET", path: "/api/admin/outbox", scope: "admin", ok: 200 },
  {
    method: "GET",
    path: "/api/admin/outbox/:messageId",
    scope: "admin",
    ok: 200,
    setup: async () => {
      const row = await w.t.db.write((transaction) =>
        w.t.db.models.OutboxMessage.create({ messageId: null, fromAddress: "a@b.test", toAddress: "c@d.test", subject: "S", text: "T", html: null, sizeBytes: 1, receivedAt: new Date() }, { transaction }),
      );
      return { params: { messageId: row.id } };
    },
  },
  { method: "POST", path: "/api/admin/jobs/run", scope: "admin", ok: 200 },
  { method: "GET", path: "/api/audit-log", scope: "admin", ok: 200 },
  // The notebook review queue: staff only; each instructor sees their own students' entries.
  { method: "GET", path: "/api/notebook/review", scope: "staff", ok: 200 },
  // Renewing a self-study pass: a valid test card, so a wrongly allowed call would pay and change the database.
  { method: "POST", path: "/api/billing/renew", scope: "self", ok: 200, setup: async () => ({ params: {}, body: { cardNumber: "4242 4242 4242 4242", cardExpiry: "12/34", cardCvc: "123" } }) },
];

function expected(row: Row, actor: Actor): number {
  if (actor === "anonymous") return 401;
  if (actor === "student" || row.scope === "self") return 403;
  if (row.scope === "admin") return actor === "admin" ? row.ok : 403;
  if (row.scope === "cohort" && actor === "instructor (other cohort)") return 404;
  return row.ok;
}

function send(actor: Actor, row: Row, cell: Cell) {
  const path = row.path.replace(/:([A-Za-z]+)/g, (_m, name: string) => {
    if (!(name in cell.params)) throw new Error(`${row.path}: setup gave no ${name}`);
    return String(cell.params[name]);
  });
  const { agent, csrfToken } = agents[actor];
  const req = agent[row.method.toLowerCase() as "get" | "post" | "patch" | "delete"](path);
  return row.method === "GET" ? req : req.set("x-csrf-token", csrfToken).send((cell.body ?? {}) as object);
}

/** Tables a denied request must leave untouched (Sessions without their rolling expiry). */
async function snapshot(): Promise<string> {
  // Invitation e-mails queued by an earlier (allowed) cell are sent in the background: let them finish first.
  await mailSettled(w.t);
  const [sessions] = await w.t.db.sequelize.query("SELECT sid, userId FROM Sessions ORDER BY sid");
  const [audit] = await w.t.db.sequelize.query("SELECT id, action FROM AuditLogs ORDER BY id");
  const [outbox] = await w.t.db.sequelize.query("SELECT id FROM OutboxMessages ORDER BY id");
  return `${await dbSnapshot(w.t)}\nSessions:${JSON.stringify(sessions)}\nAuditLogs:${JSON.stringify(audit)}\nOutbox:${JSON.stringify(outbox)}`;
}

beforeAll(async () => {
  w = await createTeachingWorld();
  agents.anonymous = await csrfAgent(w.t.app);
  agents.student = w.s1;
  agents["instructor (this cohort)"] = w.own;
  agents["instructor (other cohort)"] = w.other;
  agents.admin = w.admin;
});
afterAll(() => w?.t.cleanup());

describe("access matrix", () => {
  it("covers every role-restricted route in server/policy.ts", () => {
    const restricted = ROUTE_POLICY.filter((r) => Array.isArray(r.access)).map((r) => `${r.method} ${r.path}`);
    const covered = new Set(ROWS.map((r) => `${r.method} ${r.path}`));
    expect(restricted.filter((r) => !covered.has(r) && !NOT_IN_THIS_MATRIX.has(r))).toEqual([]);
    // And the table lists no route the policy does not know.
    const listed = new Set(ROUTE_POLICY.map((r) => `${r.method} ${r.path}`));
    expect([...covered].filter((r) => !listed.has(r))).toEqual([]);
  });

  it("every cell answers as documented, and denied requests change nothing", async () => {
    const mismatches: string[] = [];
    let cells = 0;
    for (const row of ROWS) {
      for (const actor of ACTORS) {
        const cell = row.setup ? await row.setup(actor) : { params: {} };
        const want = expected(row, actor);
        const denied = want >= 400;
        const before = denied ? await snapshot() : "";
        const res = await send(actor, row, cell);
        cells += 1;
        if (res.status !== want) mismatches.push(`${row.method} ${row.path} as ${actor}: ${res.status} (want ${want}) ${JSON.stringify(res.body).slice(0, 160)}`);
        if (denied) {
          if (res.body?.error?.code === undefined) mismatches.push(`${row.method} ${row.path} as ${actor}: denial without a JSON error body`);
          if ((await snapshot()) !== before) mismatches.push(`${row.method} ${row.path} as ${actor}: the database changed on a denied request`);
        }
      }
    }
    expect(mismatches).toEqual([]);
    expect(cells).toBe(ROWS.length * ACTORS.length);
  }, 240_000);

  it("object-level denials look exactly like a missing record", async () => {
    const { cohortId } = await freshCohort();
    const theirs = await w.other.agent.get(`/api/cohorts/${cohortId}/gradebook`);
    const missing = await w.other.agent.get("/api/cohorts/987654/gradebook");
    expect(theirs.status).toBe(404);
    expect(theirs.body).toEqual(missing.body);
  });

  it("a demoted instructor loses access on the next request", async () => {
    const teacher = await signedUser(w.t, "instructor", "demoted");
    const cohort = (await teacher.agent.post("/api/cohorts").set("x-csrf-token", teacher.csrfToken).send({ name: "Soon gone" }).expect(201)).body.cohort.id;
    await teacher.agent.get(`/api/cohorts/${cohort}/gradebook`).expect(200);
    await w.admin.agent.patch(`/api/admin/users/${teacher.user.id}`).set("x-csrf-token", w.admin.csrfToken).send({ role: "student" }).expect(200);
    await teacher.agent.get(`/api/cohorts/${cohort}/gradebook`).expect(403);
  });
});
