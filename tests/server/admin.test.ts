/**
 * School admin: the users list, role changes that apply on the next request, disabling a user
 * (every session row deleted, sign-in refused), ending sessions, the outbox with invitation
 * links, running the jobs now, and the audit trail of these actions.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { AdminUsersResponse, OutboxResponse } from "../../shared/api/admin";
import { csrfAgent, signIn } from "../support/test-app";
import { createTeachingWorld, mailSettled, PASSWORD, signedUser, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const patchUser = (id: number, body: object) => w.admin.agent.patch(`/api/admin/users/${id}`).set("x-csrf-token", w.admin.csrfToken).send(body);
const sessionsOf = (userId: number) => w.t.db.models.Session.count({ where: { userId } });

describe("GET /api/admin/users", () => {
  it("lists accounts with role, status, last sign-in and cohort counts; filters and searches", async () => {
    const all = (await w.admin.agent.get("/api/admin/users").expect(200)).body as AdminUsersResponse;
    expect(all.total).toBe(7);
    const own = all.users.find((u) => u.id === w.own.user.id)!;
    expect(own).toMatchObject({ role: "instructor", disabled: false, cohortsTaught: 1, cohortsEnrolled: 0 });
    expect(own.lastSignInAt).not.toBeNull();
    expect(all.users.find((u) => u.id === w.s1.user.id)!.cohortsEnrolled).toBe(1);
    expect(JSON.stringify(all)).not.toMatch(/passwordHash|argon2/);

    const students = (await w.admin.agent.get("/api/admin/users?role=student").expect(200)).body as AdminUsersResponse;
    expect(students.users.every((u) => u.role === "student")).toBe(true);
    expect(students.total).toBe(4);
    const search = (await w.admin.agent.get(`/api/admin/users?q=${encodeURIComponent(w.s1.user.email.slice(0, 6).toUpperCase())}`).expect(200)).body as AdminUsersResponse;
    expect(search.users.map((u) => u.id)).toEqual([w.s1.user.id]);
    // LIKE wildcards in the search are literal.
    expect(((await w.admin.agent.get("/api/admin/users?q=%25").expect(200)).body as AdminUsersResponse).total).toBe(0);
    await w.admin.agent.get("/api/admin/users?role=wizard").expect(400);
  });
});

describe("PATCH /api/admin/users/:id", () => {
  it("a role change takes effect on the user's very next request", async () => {
    const u = await signedUser(w.t, "student", "promoted");
    await u.agent.get("/api/cohorts").expect(403);
    const res = await patchUser(u.user.id, { role: "instructor" }).expect(200);
    expect(res.body.user.role).toBe("instructor");
    await u.agent.get("/api/cohorts").expect(200);
    await patchUser(u.user.id, { role: "student" }).expect(200);
    await u.agent.get("/api/cohorts").expect(403);
    const audit = await w.t.db.models.AuditLog.findAll({ where: { action: "admin.role_changed", targetId: String(u.user.id) } });
    expect(audit.map((a) => a.details)).toEqual([{ from: "student", to: "instructor" }, { from: "instructor", to: "student" }]);
  });

  it("disabling a user deletes all their session rows, signs them out and refuses sign-in; enabling restores it", async () => {
    const u = await signedUser(w.t, "student", "disabled");
    const second = await signIn(w.t.app, u.user.email, PASSWORD);
    expect(await sessionsOf(u.user.id)).toBe(2);
    const res = await patchUser(u.user.id, { disabled: true }).expect(200);
    expect(res.body).toMatchObject({ user: { disabled: true }, sessionsEnded: 2 });
    expect(await sessionsOf(u.user.id)).toBe(0);
    await u.agent.get("/api/auth/me").expect(401);
    await second.agent.get("/api/auth/me").expect(401);
    const login = await csrfAgent(w.t.app);
    await login.agent.post("/api/auth/login").set("x-csrf-token", login.csrfToken).send({ email: u.user.email, password: PASSWORD }).expect(401);

    await patchUser(u.user.id, { disabled: false }).expect(200);
    await signIn(w.t.app, u.user.email, PASSWORD);
    const actions = (await w.t.db.models.AuditLog.findAll({ where: { targetId: String(u.user.id), targetType: "user" } })).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(["admin.user_disabled", "admin.user_enabled"]));
  });

  it("refuses changes to the admin's own account, and unknown fields", async () => {
    const self = await patchUser(w.admin.user.id, { role: "student" }).expect(409);
    expect(self.body.error.code).toBe("cannot_change_self");
    await patchUser(w.s1.user.id, { role: "admin", email: "x@y.test" }).expect(400);
    await patchUser(w.s1.user.id, {}).expect(400);
    await patchUser(999999, { disabled: true }).expect(404);
    expect((await w.t.db.models.User.findByPk(w.s1.user.id))!.role).toBe("student");
  });
});

describe("DELETE /api/admin/users/:id/sessions", () => {
  it("signs the user out everywhere without disabling the account", async () => {
    const u = await signedUser(w.t, "student", "everywhere");
    const res = await w.admin.agent.delete(`/api/admin/users/${u.user.id}/sessions`).set("x-csrf-token", w.admin.csrfToken).expect(200);
    expect(res.body.sessionsEnded).toBe(1);
    await u.agent.get("/api/auth/me").expect(401);
    await signIn(w.t.app, u.user.email, PASSWORD);
  });
});

describe("the outbox", () => {
  it("shows the fake's messages newest first with the invitation link, and the HTML part on request", async () => {
    await w.own.agent.post(`/api/cohorts/${w.cohortA}/invitations`).set("x-csrf-token", w.own.csrfToken).send({ invitations: [{ email: "new.face@cinderfield.test" }] }).expect(202);
    await mailSettled(w.t);
    const list = (await w.admin.agent.get("/api/admin/outbox").expect(200)).body as OutboxResponse;
    expect(list.fakeTransport).toBe(true);
    expect(list.messages[0]).toMatchObject({ to: "new.face@cinderfield.test", subject: "You are invited to Autumn Forge Cohort on Grain & Edge" });
    expect(list.messages[0].links).toHaveLength(1);
    expect(list.messages[0].links[0]).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    const detail = await w.admin.agent.get(`/api/admin/outbox/${list.messages[0].id}`).expect(200);
    expect(detail.body.html).toContain("Join the cohort");
    await w.admin.agent.get("/api/admin/outbox/999999").expect(404);
  });

  it("is for admins only", async () => {
    await w.own.agent.get("/api/admin/outbox").expect(403);
    await w.s1.agent.get("/api/admin/outbox").expect(403);
  });
});

describe("POST /api/admin/jobs/run", () => {
  it("runs the retry and reminder jobs now and reports what they did", async () => {
    const res = await w.admin.agent.post("/api/admin/jobs/run").set("x-csrf-token", w.admin.csrfToken).expect(200);
    expect(res.body.reminders).toMatchObject({ candidates: 2, sent: 2 }); // s1 and s2: due in 2 days, nothing done
    expect(res.body.invitationsAttempted).toBe(0);
  });
});

describe("the audit log", () => {
  it("records sign-ins, role changes, invitations and grade exports", async () => {
    await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook.csv`).expect(200);
    const res = await w.admin.agent.get("/api/audit-log?limit=200").expect(200);
    const actions = new Set(res.body.entries.map((e: { action: string }) => e.action));
    for (const action of ["auth.login", "admin.role_changed", "invitation.created", "grades.exported", "admin.user_disabled"]) {
      expect(actions, action).toContain(action);
    }
  });
});
