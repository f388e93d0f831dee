import { afterEach, describe, expect, it } from "vitest";
import { createTestApp, createUser, csrfAgent, type TestApp } from "../support/test-app";

const PASSWORD = "anvil-and-quench-7";
let t: TestApp | undefined;
afterEach(async () => {
  await t?.cleanup();
  t = undefined;
});

async function login(app: TestApp["app"], email: string, password: string) {
  const { agent, csrfToken } = await csrfAgent(app);
  return agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email, password });
}

describe("per-IP sign-in rate limit", () => {
  it("answers 429 with Retry-After on the 11th failure in the window; successes are not counted", async () => {
    t = await createTestApp(); // default: 10 failures / 15 min
    await createUser(t, { email: "real@cinderfield.test", role: "student", password: PASSWORD });

    // Successes in between do not use up the allowance.
    for (let i = 0; i < 3; i++) expect((await login(t.app, "real@cinderfield.test", PASSWORD)).status).toBe(200);
    // Different unknown e-mails, so the per-account delay never triggers: only the IP limit.
    for (let i = 0; i < 10; i++) {
      expect((await login(t.app, `nobody${i}@cinderfield.test`, "wrong-password")).status).toBe(401);
    }
    const limited = await login(t.app, "nobody-else@cinderfield.test", "wrong-password");
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe("rate_limited");
    expect(Number(limited.headers["retry-after"])).toBeGreaterThan(0);
    expect(Number(limited.headers["retry-after"])).toBeLessThanOrEqual(15 * 60);
    // Now even the right password is refused from this address until the window passes.
    expect((await login(t.app, "real@cinderfield.test", PASSWORD)).status).toBe(429);
  });
});

describe("per-account failure delay (no hard lockout)", () => {
  it("after 5 failures the account must wait, then works again; unknown e-mails behave the same", async () => {
    t = await createTestApp({
      env: { LOGIN_RATE_LIMIT: "1000" },
      configure: (c) => ({ ...c, accountThrottle: { freeFailures: 5, baseDelayMs: 10_000, maxDelayMs: 60_000 } }),
    });
    await createUser(t, { email: "target@cinderfield.test", role: "student", password: PASSWORD });

    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 6; i++) {
      known.push((await login(t.app, "target@cinderfield.test", `wrong-${i}-pass`)).status);
      unknown.push((await login(t.app, "phantom@cinderfield.test", `wrong-${i}-pass`)).status);
    }
    expect(known).toEqual([401, 401, 401, 401, 401, 429]);
    expect(unknown).toEqual(known); // no enumeration through the delay

    // During the delay even the right password is refused (without checking it)...
    const throttled = await login(t.app, "target@cinderfield.test", PASSWORD);
    expect(throttled.status).toBe(429);
    expect(Number(throttled.headers["retry-after"])).toBeGreaterThanOrEqual(1);
    // ...and after it the owner gets in, which resets the counter. (Move the last failure 11 s
    // into the past rather than sleeping.)
    await t.db.write((tx) =>
      t!.db.models.User.update(
        { lastFailedLoginAt: new Date(Date.now() - 11_000) },
        { where: { email: "target@cinderfield.test" }, transaction: tx },
      ),
    );
    expect((await login(t.app, "target@cinderfield.test", PASSWORD)).status).toBe(200);
    const user = await t.db.models.User.findOne({ where: { email: "target@cinderfield.test" } });
    expect(user!.failedLoginCount).toBe(0);
  });
});
