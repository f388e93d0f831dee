import express from "express";
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { HttpError } from "../../server/errors";
import { errorHandler } from "../../server/middleware/error-handler";
import { createLogger } from "../../server/log";
import { createTestApp, csrfAgent, FAKE_INDEX_HTML, type TestApp } from "../support/test-app";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t?.cleanup());

describe("GET /api/health", () => {
  it("answers { ok: true } once the database answers, never cached", async () => {
    const res = await request(t.app).get("/api/health").expect(200);
    expect(res.body).toEqual({ ok: true });
    expect(res.headers["cache-control"]).toBe("no-store");
    // Health checks must not create sessions.
    expect(res.headers["set-cookie"]).toBeUndefined();
  });

  it("answers 503 with the JSON error shape when the database is gone", async () => {
    const other = await createTestApp();
    await other.db.sequelize.close();
    const res = await request(other.app).get("/api/health").expect(503);
    expect(res.body.error.code).toBe("service_unavailable");
    expect(res.headers["retry-after"]).toBe("5");
    await other.cleanup().catch(() => undefined);
  });
});

describe("security headers", () => {
  it("sends a CSP the Vite build satisfies, without upgrade-insecure-requests on plain http", async () => {
    const res = await request(t.app).get("/");
    const csp = res.headers["content-security-policy"];
    for (const directive of [
      "default-src 'self'",
      "script-src 'self'",
      "style-src 'self' 'unsafe-inline'",
      "img-src 'self' data: blob:",
      "font-src 'self' data:",
      "worker-src 'self' blob:",
      "connect-src 'self'",
      "object-src 'none'",
      "base-uri 'none'",
      "frame-ancestors 'none'",
      "form-action 'self'",
    ]) {
      expect(csp).toContain(directive);
    }
    expect(csp).not.toContain("upgrade-insecure-requests");
    expect(res.headers["strict-transport-security"]).toBeUndefined();
    expect(res.headers["x-powered-by"]).toBeUndefined();
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
    expect(res.headers["referrer-policy"]).toBe("no-referrer");
  });

  it("adds HSTS and upgrade-insecure-requests when served over HTTPS", async () => {
    const secure = await createTestApp({ env: { COOKIE_SECURE: "1", TRUST_PROXY: "1" } });
    try {
      const res = await request(secure.app).get("/").set("X-Forwarded-Proto", "https");
      expect(res.headers["content-security-policy"]).toContain("upgrade-insecure-requests");
      expect(res.headers["strict-transport-security"]).toMatch(/max-age=31536000/);
    } finally {
      await secure.cleanup();
    }
  });
});

describe("errors", () => {
  it("unknown /api routes give a JSON 404, for any method", async () => {
    const get = await request(t.app).get("/api/no-such-thing").expect(404);
    expect(get.headers["content-type"]).toMatch(/application\/json/);
    expect(get.body).toEqual({ error: { code: "not_found", message: expect.any(String) } });

    const { agent, csrfToken } = await csrfAgent(t.app);
    const post = await agent.post("/api/no-such-thing").set("x-csrf-token", csrfToken).send({}).expect(404);
    expect(post.body.error.code).toBe("not_found");
  });

  it("validation errors name the failing fields", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .send({ email: "not-an-email", password: "" })
      .expect(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "password"]);
    expect(res.body.error.fields.email[0]).toMatch(/e-mail/i);
  });

  it("a missing body reports the missing fields, not 'expected object'", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).expect(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["email", "password"]);
  });

  it("rejects bodies over 100 kB with 413", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .send({ email: "a@b.test", password: "x".repeat(101 * 1024) })
      .expect(413);
    expect(res.body.error.code).toBe("payload_too_large");
  });

  it("rejects malformed JSON with 400 invalid_json", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent
      .post("/api/auth/login")
      .set("x-csrf-token", csrfToken)
      .set("Content-Type", "application/json")
      .send('{"email": "a@b.test",')
      .expect(400);
    expect(res.body.error.code).toBe("invalid_json");
  });

  it("rejects non-JSON bodies on JSON routes with 415", async () => {
    const { agent, csrfToken } = await csrfAgent(t.app);
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x"]) {
      const res = await agent
        .post("/api/auth/login")
        .set("x-csrf-token", csrfToken)
        .set("Content-Type", type)
        .send("email=a%40b.test&password=hunter22")
        .expect(415);
      expect(res.body.error.code).toBe("unsupported_media_type");
    }
  });

  it("the last-resort handler answers 500 without a stack trace or the error text", async () => {
    const app = express();
    app.get("/boom", () => {
      throw new Error("secret internal detail");
    });
    app.get("/teapot", () => {
      throw new HttpError(409, "conflict", "Already there.");
    });
    app.use(errorHandler(createLogger("silent")));
    const res = await request(app).get("/boom").expect(500);
    expect(res.body).toEqual({ error: { code: "internal_error", message: expect.any(String) } });
    expect(res.text).not.toContain("secret internal detail");
    expect(res.text).not.toMatch(/at .*\.ts:\d+/);
    const conflict = await request(app).get("/teapot").expect(409);
    expect(conflict.body).toEqual({ error: { code: "conflict", message: "Already there." } });
  });
});

describe("the client app", () => {
  it("serves index.html for any non-API GET path", async () => {
    for (const path of ["/", "/sign-in", "/learn", "/teach/cohorts/1", "/no/such/page"]) {
      const res = await request(t.app).get(path).expect(200);
      expect(res.text).toBe(FAKE_INDEX_HTML);
      expect(res.headers["cache-control"]).toBe("no-cache");
    }
  });

  it("serves hashed assets with a long cache lifetime", async () => {
    const res = await request(t.app).get("/assets/app-3f9a1c.js").expect(200);
    expect(res.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
    expect(res.text).toContain("fake asset");
  });

  it("answers 503 with a hint when the client has not been built", async () => {
    const unbuilt = await createTestApp({ clientDistDir: "/nonexistent-grain-edge-dist" });
    try {
      const res = await request(unbuilt.app).get("/learn").expect(503);
      expect(res.text).toMatch(/npm run build/);
    } finally {
      await unbuilt.cleanup();
    }
  });
});
