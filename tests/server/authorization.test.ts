import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Role } from "../../shared/api/auth";
import { HttpError } from "../../server/errors";
import { loadOwned, owned, requireAuth, requireRole } from "../../server/middleware/authorize";
import { errorHandler } from "../../server/middleware/error-handler";
import { createLogger } from "../../server/log";
import { ROUTE_POLICY } from "../../server/policy";
import { createTestApp, createUser, csrfAgent, signIn, type Agent, type TestApp } from "../support/test-app";

const PASSWORD = "anvil-and-quench-7";
const ROLES: Role[] = ["student", "instructor", "admin"];
let t: TestApp;
const agents = {} as Record<Role, { agent: Agent; csrfToken: string }>;

beforeAll(async () => {
  t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000" } });
  for (const role of ROLES) {
    await createUser(t, { email: `${role}@authz.test`, role, password: PASSWORD });
    agents[role] = await signIn(t.app, `${role}@authz.test`, PASSWORD);
  }
});
afterAll(() => t?.cleanup());

/** Every METHOD + path registered under /api, read from Express 5's router stack. */
function registeredApiRoutes(app: TestApp["app"]): string[] {
  const out: string[] = [];
  const walk = (stack: unknown[], prefix: string) => {
    for (const layer of stack as { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: unknown[] }; rawPath?: unknown }[]) {
      if (layer.route) {
        const path = `${prefix}${layer.route.path === "/" ? "" : layer.route.path}` || "/";
        for (const method of Object.keys(layer.route.methods)) out.push(`${method.toUpperCase()} ${path}`);
      } else if (layer.handle?.stack) {
        const mount = typeof layer.rawPath === "string" && layer.rawPath !== "/" ? layer.rawPath : "";
        walk(layer.handle.stack, prefix + mount);
      }
    }
  };
  walk((app as unknown as { router: { stack: unknown[] } }).router.stack, "");
  return out.filter((r) => r.split(" ")[1].startsWith("/api/"));
}

const concrete = (path: string) => path.replace(/:[A-Za-z]+/g, "1");

function send(agent: Agent, method: string, path: string, csrfToken: string) {
  const req = agent[method.toLowerCase() as "get" | "post" | "put" | "patch" | "delete"](concrete(path));
  return method === "GET" ? req : req.set("x-csrf-token", csrfToken).send({});
}

describe("route policy table (server/policy.ts)", () => {
  it("lists every registered /api route exactly once", () => {
    const registered = registeredApiRoutes(t.app).sort();
    const listed = ROUTE_POLICY.map((r) => `${r.method} ${r.path}`).sort();
    expect(registered.length).toBeGreaterThan(5);
    expect(new Set(listed).size).toBe(listed.length);
    expect(registered.filter((r) => !listed.includes(r))).toEqual([]); // unlisted routes
    expect(listed.filter((r) => !registered.includes(r))).toEqual([]); // stale entries
  });

  it("anonymous callers get 401 on every non-public route", async () => {
    const anon = await csrfAgent(t.app);
    for (const route of ROUTE_POLICY.filter((r) => r.access !== "public")) {
      const res = await send(anon.agent, route.method, route.path, anon.csrfToken);
      expect({ route: `${route.method} ${route.path}`, status: res.status }).toEqual({
        route: `${route.method} ${route.path}`,
        status: 401,
      });
    }
  });

  it("roles outside a route's list get 403", async () => {
    let checked = 0;
    for (const route of ROUTE_POLICY) {
      if (!Array.isArray(route.access)) continue;
      for (const role of ROLES.filter((r) => !(route.access as readonly Role[]).includes(r))) {
        const { agent, csrfToken } = agents[role];
        const res = await send(agent, route.method, route.path, csrfToken);
        expect({ route: `${route.method} ${route.path}`, role, status: res.status }).toEqual({
          route: `${route.method} ${route.path}`,
          role,
          status: 403,
        });
        checked += 1;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });
});

describe("roles", () => {
  it("a student gets 403 on the admin-only audit log; the admin gets it", async () => {
    const denied = await agents.student.agent.get("/api/audit-log").expect(403);
    expect(denied.body.error.code).toBe("forbidden");
    await agents.instructor.agent.get("/api/audit-log").expect(403);
    const ok = await agents.admin.agent.get("/api/audit-log?limit=5").expect(200);
    expect(ok.body.entries.length).toBeGreaterThan(0);
    expect(ok.body.entries[0]).toHaveProperty("action");
  });

  it("a role change takes effect on the very next request", async () => {
    const user = await createUser(t, { email: "promoted@authz.test", role: "student", password: PASSWORD });
    const { agent } = await signIn(t.app, user.email, PASSWORD);
    await agent.get("/api/audit-log").expect(403);
    await t.db.write((tx) => t.db.models.User.update({ role: "admin" }, { where: { id: user.id }, transaction: tx }));
    await agent.get("/api/audit-log").expect(200);
    expect((await agent.get("/api/auth/me")).body.user.role).toBe("admin");
    await t.db.write((tx) => t.db.models.User.update({ role: "student" }, { where: { id: user.id }, transaction: tx }));
    await agent.get("/api/audit-log").expect(403);
  });

  it("the audit log query is validated", async () => {
    const res = await agents.admin.agent.get("/api/audit-log?limit=9999").expect(400);
    expect(Object.keys(res.body.error.fields)).toEqual(["limit"]);
  });
});

describe("GET /api/me/summary", () => {
  it("gives each role its own shape", async () => {
    expect((await agents.student.agent.get("/api/me/summary").expect(200)).body).toEqual({
      role: "student",
      cohorts: [],
      progress: { lessonsStarted: 0, lessonsCompleted: 0 },
      // A school account: no self-study pass section.
      selfStudy: null,
    });
    expect((await agents.instructor.agent.get("/api/me/summary").expect(200)).body).toEqual({ role: "instructor", cohorts: [] });
    const admin = (await agents.admin.agent.get("/api/me/summary").expect(200)).body;
    expect(admin.role).toBe("admin");
    expect(admin.counts.admins).toBeGreaterThanOrEqual(1);
  });
});

describe("loadOwned (object-level checks)", () => {
  // A tiny app using the helpers the way a resource router does.
  const notes = new Map([
    [1, { id: 1, ownerId: 10, text: "mine" }],
    [2, { id: 2, ownerId: 20, text: "theirs" }],
  ]);
  const app = express();
  app.use((req, _res, next) => {
    const id = Number(req.get("x-user"));
    if (id) req.user = { id, email: `${id}@x.test`, displayName: "x", role: id === 99 ? "admin" : "student" };
    next();
  });
  app.get(
    "/notes/:id",
    requireAuth,
    loadOwned("note", async (req) => notes.get(Number(req.params.id)), (user, note) => note.ownerId === user.id || user.role === "admin"),
    (_req, res) => res.json(owned(res, "note")),
  );
  app.get("/admin-only", requireRole("admin"), (_req, res) => res.json({ ok: true }));
  app.get("/explode", () => {
    throw new HttpError(418, "teapot", "no");
  });
  app.use(errorHandler(createLogger("silent")));

  it("returns the owner's record, and 404 (not 403) for someone else's or a missing one", async () => {
    expect((await request(app).get("/notes/1").set("x-user", "10").expect(200)).body.text).toBe("mine");
    const other = await request(app).get("/notes/2").set("x-user", "10").expect(404);
    const missing = await request(app).get("/notes/3").set("x-user", "10").expect(404);
    expect(other.body).toEqual(missing.body); // indistinguishable
    await request(app).get("/notes/2").set("x-user", "99").expect(200);
    await request(app).get("/notes/1").expect(401);
  });

  it("requireRole: 401 signed out, 403 wrong role", async () => {
    await request(app).get("/admin-only").expect(401);
    await request(app).get("/admin-only").set("x-user", "10").expect(403);
    await request(app).get("/admin-only").set("x-user", "99").expect(200);
  });
});
