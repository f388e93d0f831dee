import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, createUser, csrfAgent, sessionCookie, signIn, type TestApp } from "../support/test-app";

const PASSWORD = "anvil-and-quench-7";
let t: TestApp;

beforeAll(async () => {
  // A high per-IP limit so this file's many sign-ins are not rate limited (rate-limit.test.ts covers it).
  t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000" } });
  await createUser(t, { email: "smith@cinderfield.test", role: "student", password: PASSWORD, displayName: "Ada Smithfield" });
});
afterAll(() => t?.cleanup());

/** Sessions table row for a signed cookie value "s:<sid>.<signature>". */
async function sessionRowExists(cookieValue: string): Promise<boolean> {
  const sid = decodeURIComponent(cookieValue).replace(/^s:/, "").split(".")[0];
  return (await t.db.models.Session.count({ where: { sid } })) > 0;
}

describe("POST /api/auth/login", () => {
  it("signs in with the right password and returns only public fields", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .send({ email: "smith@cinderfield.test", password: PASSWORD })
      .expect(200);
    expect(res.body).toEqual({
      user: { id: expect.any(Number), email: "smith@cinderfield.test", displayName: "Ada Smithfield", role: "student" },
    });
    const me = await agent.get("/api/auth/me").expect(200);
    expect(me.body.user.email).toBe("smith@cinderfield.test");
  });

  it("matches e-mail case-insensitively", async () => {
    await signIn(t.app, "Smith@Cinderfield.TEST", PASSWORD);
  });

  it("gives the same 401 for an unknown e-mail and a wrong password", async () => {
    const attempt = async (email: string, password: string) => {
      const { agent, csrfToken } = await csrfAgent(t.app);
      const started = performance.now();
      const res = await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email, password });
      return { res, ms: performance.now() - started };
    };
    const wrong = await attempt("smith@cinderfield.test", "not-the-password");
    const unknown = await attempt("nobody@cinderfield.test", "not-the-password");
    expect(wrong.res.status).toBe(401);
    expect(unknown.res.status).toBe(401);
    expect(unknown.res.body).toEqual(wrong.res.body);
    expect(wrong.res.body.error.code).toBe("invalid_credentials");

    // Timing: the unknown e-mail must also pay for an argon2 verification (~70 ms), so it cannot be
    // told apart from a wrong password by a much faster answer. Medians of 3, loose bound for CI noise.
    const median = (xs: number[]) => xs.sort((a, b) => a - b)[1];
    const wrongMs: number[] = [];
    const unknownMs: number[] = [];
    for (let i = 0; i < 3; i++) {
      wrongMs.push((await attempt("smith@cinderfield.test", `wrong-${i}-password`)).ms);
      unknownMs.push((await attempt(`ghost${i}@cinderfield.test`, `wrong-${i}-password`)).ms);
    }
    expect(median(unknownMs)).toBeGreaterThan(median(wrongMs) * 0.4);
    // Reset the failure counter so later tests start clean.
    await t.db.write((tx) => t.db.models.User.update({ failedLoginCount: 0 }, { where: {}, transaction: tx }));
  });

  it("regenerates the session id at sign-in (no session fixation) and kills the old one", async () => {
    const anon = request.agent(t.app);
    const first = await anon.get("/api/auth/csrf").expect(200);
    const sid0 = sessionCookie(first.headers["set-cookie"]);
    expect(sid0).toBeDefined();
    const login = await anon
      .post("/api/auth/login")
      .set("x-csrf-token", first.body.csrfToken)
      .send({ email: "smith@cinderfield.test", password: PASSWORD })
      .expect(200);
    const sid1 = sessionCookie(login.headers["set-cookie"]);
    expect(sid1).toBeDefined();
    expect(sid1).not.toBe(sid0);
    expect(await sessionRowExists(sid0!)).toBe(false);
    expect(await sessionRowExists(sid1!)).toBe(true);
    // The old cookie is not signed in.
    await request(t.app).get("/api/auth/me").set("Cookie", `ge.sid=${sid0}`).expect(401);
    await request(t.app).get("/api/auth/me").set("Cookie", `ge.sid=${sid1}`).expect(200);
  });

  it("sets a hardened session cookie", async () => {
    const anon = request.agent(t.app);
    const res = await anon.get("/api/auth/csrf").expect(200);
    const cookie = (res.headers["set-cookie"] as unknown as string[]).find((c) => c.startsWith("ge.sid="))!;
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).toMatch(/; Path=\//);
    expect(cookie).toMatch(/; Expires=/);
    expect(cookie).not.toMatch(/Domain=/i);
    expect(cookie).not.toMatch(/; Secure/i); // plain http in this config
  });

  it("uses a Secure __Host- cookie over HTTPS", async () => {
    const secure = await createTestApp({ env: { COOKIE_SECURE: "1", TRUST_PROXY: "1" } });
    try {
      const res = await request(secure.app).get("/api/auth/csrf").set("X-Forwarded-Proto", "https").expect(200);
      const cookie = (res.headers["set-cookie"] as unknown as string[])[0];
      expect(cookie).toMatch(/^__Host-ge\.sid=/);
      expect(cookie).toMatch(/; Secure/i);
      expect(cookie).toMatch(/; Path=\//);
      expect(cookie).not.toMatch(/Domain=/i);
    } finally {
      await secure.cleanup();
    }
  });
});

describe("signed-out and sign-out", () => {
  it("GET /api/auth/me is 401 when signed out", async () => {
    const res = await request(t.app).get("/api/auth/me").expect(401);
    expect(res.body.error.code).toBe("unauthenticated");
  });

  it("logout ends the session on the server: the old cookie gets 401", async () => {
    const { agent, csrfToken, cookie } = await signIn(t.app, "smith@cinderfield.test", PASSWORD);
    const me = await agent.get("/api/auth/me").expect(200);
    expect(me.body.user.email).toBe("smith@cinderfield.test");
    expect(await sessionRowExists(cookie)).toBe(true);
    const out = await agent.post("/api/auth/logout").set("x-csrf-token", csrfToken).expect(204);
    expect(String(out.headers["set-cookie"])).toMatch(/ge\.sid=;/); // cleared
    expect(await sessionRowExists(cookie)).toBe(false);
    await request(t.app).get("/api/auth/me").set("Cookie", `ge.sid=${cookie}`).expect(401);
    await agent.get("/api/auth/me").expect(401);
  });

  it("an absolute timeout signs the session out whatever the activity", async () => {
    const short = await createTestApp({ configure: (c) => ({ ...c, session: { ...c.session, absoluteTimeoutMs: 800 } }) });
    try {
      await createUser(short, { email: "brief@cinderfield.test", role: "student", password: PASSWORD });
      const { agent } = await signIn(short.app, "brief@cinderfield.test", PASSWORD);
      await agent.get("/api/auth/me").expect(200);
      await new Promise((r) => setTimeout(r, 1000));
      await agent.get("/api/auth/me").expect(401);
    } finally {
      await short.cleanup();
    }
  });

  it("an inactivity timeout expires idle sessions but activity keeps them alive", async () => {
    // Cookie Expires has 1 s resolution, so the idle timeout here must be a few seconds.
    const short = await createTestApp({ configure: (c) => ({ ...c, session: { ...c.session, idleTimeoutMs: 2500 } }) });
    try {
      await createUser(short, { email: "idle@cinderfield.test", role: "student", password: PASSWORD });
      const { agent } = await signIn(short.app, "idle@cinderfield.test", PASSWORD);
      for (let i = 0; i < 4; i++) {
        await new Promise((r) => setTimeout(r, 800)); // 3.2 s of activity in total, > idle timeout
        await agent.get("/api/auth/me").expect(200);
      }
      await new Promise((r) => setTimeout(r, 3500));
      await agent.get("/api/auth/me").expect(401);
    } finally {
      await short.cleanup();
    }
  });
});

describe("POST /api/auth/password", () => {
  it("changes the password, keeps this session, ends the others, and audits it", async () => {
    const user = await createUser(t, { email: "changer@cinderfield.test", role: "student", password: PASSWORD });
    const here = await signIn(t.app, user.email, PASSWORD);
    const elsewhere = await signIn(t.app, user.email, PASSWORD);

    const newPassword = "tempered-at-200C-twice";
    await here.agent
      .post("/api/auth/password")
      .set("x-csrf-token", here.csrfToken)
      .send({ currentPassword: PASSWORD, newPassword })
      .expect(204);

    await here.agent.get("/api/auth/me").expect(200);
    await elsewhere.agent.get("/api/auth/me").expect(401);
    const { agent, csrfToken } = await csrfAgent(t.app);
    await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: user.email, password: PASSWORD }).expect(401);
    await signIn(t.app, user.email, newPassword);

    const audit = await t.db.models.AuditLog.findOne({ where: { action: "auth.password_changed", actorId: user.id } });
    expect(audit).not.toBeNull();
    expect(JSON.stringify(audit!.details)).not.toContain(newPassword);
  });

  it("rejects a wrong current password and a too-common or too-short new one, naming the field", async () => {
    const user = await createUser(t, { email: "careful@cinderfield.test", role: "student", password: PASSWORD });
    const { agent, csrfToken } = await signIn(t.app, user.email, PASSWORD);

    const wrong = await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: "not-my-password", newPassword: "quench-in-warm-oil" })
      .expect(400);
    expect(Object.keys(wrong.body.error.fields)).toEqual(["currentPassword"]);

    const common = await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: PASSWORD, newPassword: "Password123" })
      .expect(400);
    expect(Object.keys(common.body.error.fields)).toEqual(["newPassword"]);
    expect(common.body.error.fields.newPassword[0]).toMatch(/common/i);

    const short = await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: PASSWORD, newPassword: "short" })
      .expect(400);
    expect(short.body.error.fields.newPassword[0]).toMatch(/at least 8/);
  });

  it("accepts long passwords exactly as typed (no truncation)", async () => {
    const long = `${"k".repeat(100)}-edge`; // 105 characters
    const user = await createUser(t, { email: "longpass@cinderfield.test", role: "student", password: long });
    await signIn(t.app, user.email, long);
    const { agent, csrfToken } = await csrfAgent(t.app);
    // Same first 100 characters, different tail: must fail.
    await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .send({ email: user.email, password: `${"k".repeat(100)}-EDGE` })
      .expect(401);
  });

  it("requires sign-in", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    await agent
      .post("/api/auth/password")
      .set("x-csrf-token", csrfToken)
      .send({ currentPassword: PASSWORD, newPassword: "quench-in-warm-oil" })
      .expect(401);
  });
});

describe("disabled users", () => {
  it("cannot sign in (same answer as a wrong password) and their open sessions stop working", async () => {
    const user = await createUser(t, { email: "leaving@cinderfield.test", role: "student", password: PASSWORD });
    const { agent } = await signIn(t.app, user.email, PASSWORD);
    await agent.get("/api/auth/me").expect(200);

    await t.db.write((tx) => t.db.models.User.update({ disabledAt: new Date() }, { where: { id: user.id }, transaction: tx }));
    await agent.get("/api/auth/me").expect(401);

    const { agent: again, csrfToken } = await csrfAgent(t.app);
    const res = await again.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: user.email, password: PASSWORD }).expect(401);
    expect(res.body.error.code).toBe("invalid_credentials");
  });
});

describe("audit log", () => {
  it("records sign-in successes and failures with ip, without passwords", async () => {
    const user = await createUser(t, { email: "audited@cinderfield.test", role: "student", password: PASSWORD });
    await signIn(t.app, user.email, PASSWORD);
    const { agent, csrfToken } = await csrfAgent(t.app);
    await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: user.email, password: "guess-number-one" }).expect(401);

    const ok = await t.db.models.AuditLog.findOne({ where: { action: "auth.login", actorId: user.id } });
    expect(ok?.ip).toMatch(/127\.0\.0\.1|::1/);
    const failed = await t.db.models.AuditLog.findAll({ where: { action: "auth.login_failed", targetId: String(user.id) } });
    expect(failed).toHaveLength(1);
    expect(failed[0].details).toMatchObject({ email: user.email, reason: "wrong_password" });
    expect(JSON.stringify(failed[0].details)).not.toContain("guess-number-one");
  });
});
