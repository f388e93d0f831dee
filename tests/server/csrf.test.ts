import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestApp, createUser, csrfAgent, signIn, type TestApp } from "../support/test-app";

const PASSWORD = "anvil-and-quench-7";
const EMAIL = "csrf@cinderfield.test";
let t: TestApp;

beforeAll(async () => {
  t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000" } });
  await createUser(t, { email: EMAIL, role: "student", password: PASSWORD });
});
afterAll(() => t?.cleanup());

describe("CSRF protection on unsafe requests", () => {
  it("GET /api/auth/csrf returns a long random token in JSON", async () => {
    const res = await request(t.app).get("/api/auth/csrf").expect(200);
    expect(res.body.csrfToken).toMatch(/^[0-9a-f]{64}$/); // 32 random bytes
  });

  it("sign-in without a token is refused with 403 csrf_failed", async () => {
    const agent = request.agent(t.app);
    await agent.get("/api/auth/csrf").expect(200); // has a session, but sends no header
    const res = await agent.post("/api/auth/login").send({ email: EMAIL, password: PASSWORD }).expect(403);
    expect(res.body.error.code).toBe("csrf_failed");
  });

  it("a token from another session is refused", async () => {
    const victim = await csrfAgent(t.app);
    const attacker = await csrfAgent(t.app);
    await victim.agent
      .post("/api/auth/login")
      .set("x-csrf-token", attacker.csrfToken)
      .send({ email: EMAIL, password: PASSWORD })
      .expect(403);
  });

  it("without any session, even a well-formed token is refused", async () => {
    const { csrfToken } = await csrfAgent(t.app);
    await request(t.app).post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: EMAIL, password: PASSWORD }).expect(403);
  });

  it("the pre-sign-in token stops working after sign-in (session regenerated)", async () => {
    const { agent, csrfToken: before } = await csrfAgent(t.app);
    await agent.post("/api/auth/login").set("x-csrf-token", before).send({ email: EMAIL, password: PASSWORD }).expect(200);
    const res = await agent.post("/api/auth/logout").set("x-csrf-token", before).expect(403);
    expect(res.body.error.code).toBe("csrf_failed");
    await agent.get("/api/auth/me").expect(200); // still signed in: the refused logout did nothing
  });

  it("a signed-in unsafe request needs the token too", async () => {
    const { agent, csrfToken } = await signIn(t.app, EMAIL, PASSWORD);
    await agent.post("/api/auth/password").send({ currentPassword: PASSWORD, newPassword: "a-fresh-edge-2" }).expect(403);
    await agent.post("/api/auth/logout").expect(403);
    await agent.get("/api/auth/me").expect(200);
    await agent.post("/api/auth/logout").set("x-csrf-token", csrfToken).expect(204);
  });
});

describe("cross-site requests", () => {
  it("are refused by Origin even with a valid token", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .set("Origin", "https://evil.example")
      .send({ email: EMAIL, password: PASSWORD })
      .expect(403);
    expect(res.body.error.code).toBe("csrf_failed");
    await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).set("Origin", "null").send({ email: EMAIL, password: PASSWORD }).expect(403);
  });

  it("are refused by Sec-Fetch-Site", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    for (const site of ["cross-site", "same-site"]) {
      await agent
        .post("/api/auth/login")
        .set("x-csrf-token", csrfToken)
        .set("Sec-Fetch-Site", site)
        .send({ email: EMAIL, password: PASSWORD })
        .expect(403);
    }
  });

  it("trusts Sec-Fetch-Site: same-origin (the Vite dev proxy rewrites Host, not Origin)", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    await agent
      .post("/api/auth/login")
      .set("Origin", "http://localhost:5173")
      .set("Sec-Fetch-Site", "same-origin")
      .set("x-csrf-token", csrfToken)
      .send({ email: EMAIL, password: PASSWORD })
      .expect(200);
  });

  it("accepts configured extra origins when Sec-Fetch-Site is absent", async () => {
    const dev = await createTestApp({ env: { ALLOWED_ORIGINS: "http://localhost:5173" } });
    try {
      const { agent, csrfToken } = await csrfAgent(dev.app);
      const ok = await agent.post("/api/auth/logout").set("Origin", "http://localhost:5173").set("x-csrf-token", csrfToken);
      expect(ok.status).toBe(204);
      const { agent: a2, csrfToken: t2 } = await csrfAgent(dev.app);
      await a2.post("/api/auth/logout").set("Origin", "http://localhost:9999").set("x-csrf-token", t2).expect(403);
    } finally {
      await dev.cleanup();
    }
  });

  it("same-origin requests with the token pass", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    await agent
      .post("/api/auth/login")
      .set("Host", "grain.test")
      .set("Origin", "http://grain.test")
      .set("Sec-Fetch-Site", "same-origin")
      .set("x-csrf-token", csrfToken)
      .send({ email: EMAIL, password: PASSWORD })
      .expect(200);
  });
});
