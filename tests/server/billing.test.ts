/**
 * Self-study pass purchase against the in-process fake payment service (server/billing/):
 * success signs in and activates a pass; a decline leaves no account and the same e-mail can
 * retry; webhooks are verified (bad signature = 400, nothing changes) and idempotent (a replay
 * adds nothing); "self" accounts without a valid pass cannot sign in / use lessons and quizzes;
 * a signed-in "self" account renews (early = extends from the current end, lapsed = from now).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import Stripe from "stripe";
import type { ModulesResponse } from "../../shared/api/lessons";
import type { MeSummary } from "../../shared/api/me";
import { formatMoney, isPassActive, luhnValid, purchasePassRequestSchema } from "../../shared/api/billing";
import { billingRuntimeOf } from "../../server/billing/runtime";
import { passValidUntil } from "../../server/billing/passes";
import { createTestApp, createUser, csrfAgent, freshCsrf, signIn, type TestApp } from "../support/test-app";
import { newStudent, seedFixtureModule } from "./course-fixture";

const PASSWORD = "tempered-spine-41";
const CARD_OK = "4242 4242 4242 4242";
const CARD_DECLINED = "4000 0000 0000 0002";
let t: TestApp;
let lessonSlug: string;
let quizId: string;
let n = 0;

beforeAll(async () => {
  t = await createTestApp({ env: { LOGIN_RATE_LIMIT: "1000" } });
  await seedFixtureModule(t);
  const s = await newStudent(t);
  const { modules } = (await s.agent.get("/api/modules").expect(200)).body as ModulesResponse;
  const lesson = modules[0].lessons.find((l) => l.quizId)!;
  lessonSlug = lesson.slug;
  quizId = lesson.quizId!;
});
afterAll(() => t?.cleanup());

function buyer(overrides: Record<string, unknown> = {}) {
  n += 1;
  return { displayName: `Wren Ashdown ${n}`, email: `wren-${n}@self.test`, password: PASSWORD, cardNumber: CARD_OK, cardExpiry: "12/34", cardCvc: "123", ...overrides };
}

async function purchase(body: Record<string, unknown>) {
  const { agent, csrfToken } = await csrfAgent(t.app);
  const res = await agent.post("/api/billing/purchase").set("x-csrf-token", csrfToken).send(body);
  return { agent, res };
}

const counts = async () => ({
  users: await t.db.models.User.count(),
  passes: await t.db.models.StudyPass.count(),
  events: await t.db.models.BillingEvent.count(),
});

const fake = async () => (await billingRuntimeOf(t.db)!.client()).fake!;

describe("shared helpers", () => {
  it("a pass is active strictly before its end date, and never when unpaid", () => {
    const now = Date.parse("2026-12-02T12:00:00Z");
    expect(isPassActive("2026-12-02T12:00:01Z", now)).toBe(true);
    expect(isPassActive("2026-12-02T12:00:00Z", now)).toBe(false);
    expect(isPassActive(null, now)).toBe(false);
  });

  it("Luhn: test cards pass, a one-digit typo fails", () => {
    expect(luhnValid("4242424242424242")).toBe(true);
    expect(luhnValid("4000000000000002")).toBe(true);
    expect(luhnValid("4242424242424241")).toBe(false);
  });
  it("formats minor units and adds calendar months in UTC", () => {
    expect(formatMoney(3900, "eur")).toBe("€39.00");
    expect(passValidUntil(new Date("2026-12-02T05:00:00Z"), 12).toISOString()).toBe("2027-12-02T05:00:00.000Z");
  });
  it("the schema strips spaces from the card number and keeps the password policy", () => {
    const parsed = purchasePassRequestSchema.parse(buyer());
    expect(parsed.cardNumber).toBe("4242424242424242");
    expect(purchasePassRequestSchema.safeParse(buyer({ password: "short" })).success).toBe(false);
  });
});

describe("GET /api/billing/offer", () => {
  it("describes the pass from the configuration, in test mode", async () => {
    const res = await request(t.app).get("/api/billing/offer").expect(200);
    expect(res.body).toEqual({ name: "Self-study pass", amountMinor: 3900, currency: "eur", months: 12, testMode: true });
  });
});

describe("POST /api/billing/purchase", () => {
  it("success: creates a self account with a paid pass, signs in, and the webhook was handled once", async () => {
    const body = buyer();
    const before = await counts();
    const { agent, res } = await purchase(body);
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: body.email, displayName: body.displayName, role: "student" });
    expect(JSON.stringify(res.body)).not.toContain("4242");

    const user = await t.db.models.User.findOne({ where: { email: body.email } });
    expect(user!.kind).toBe("self");
    const passes = await t.db.models.StudyPass.findAll({ where: { userId: user!.id } });
    expect(passes).toHaveLength(1);
    expect(passes[0]).toMatchObject({ status: "succeeded", amountMinor: 3900, currency: "eur" });
    expect(passes[0].providerPaymentId).toMatch(/^pi_/);
    const daysValid = (passes[0].validUntil!.getTime() - Date.now()) / 86_400_000;
    expect(daysValid).toBeGreaterThan(360);
    expect(daysValid).toBeLessThan(367);

    // The fake delivered payment_intent.succeeded to the app's webhook route, which recorded it.
    const event = await t.db.models.BillingEvent.findOne({ where: { providerPaymentId: passes[0].providerPaymentId } });
    expect(event).toMatchObject({ type: "payment_intent.succeeded" });
    expect(["activated", "already_active"]).toContain(event!.outcome);
    expect(await counts()).toEqual({ users: before.users + 1, passes: before.passes + 1, events: before.events + 1 });

    // Signed in on the new (regenerated) session; lessons and quizzes are open.
    expect((await agent.get("/api/auth/me").expect(200)).body.user.email).toBe(body.email);
    const csrf = await freshCsrf(agent);
    expect((await agent.get(`/api/lessons/${lessonSlug}/progress`)).status).toBe(200);
    expect((await agent.get(`/api/quizzes/${quizId}`)).status).toBe(200);
    expect((await agent.post("/api/auth/logout").set("x-csrf-token", csrf)).status).toBe(204);

    // ... and can sign in again with the chosen password.
    expect((await signIn(t.app, body.email, PASSWORD)).user.email).toBe(body.email);
    // Never stored: no column anywhere holds the card number.
    const dump = JSON.stringify(await t.db.sequelize.query("SELECT * FROM StudyPasses, BillingEvents, AuditLogs"));
    expect(dump).not.toContain("4242424242424242");
  });

  it("decline: 402 with the provider's message, no account left; the same e-mail then succeeds", async () => {
    const body = buyer({ cardNumber: CARD_DECLINED });
    const before = await counts();
    const { agent, res } = await purchase(body);
    expect(res.status).toBe(402);
    expect(res.body.error.code).toBe("payment_declined");
    expect(res.body.error.message).toMatch(/^Your card was declined\..*No account was created/);
    expect(res.body.error.fields).toEqual({ cardNumber: ["Your card was declined."] });
    expect(await counts()).toEqual(before);
    expect(await t.db.models.User.findOne({ where: { email: body.email } })).toBeNull();
    expect((await agent.get("/api/auth/me")).status).toBe(401);
    const login = await (async () => {
      const a = await csrfAgent(t.app);
      return a.agent.post("/api/auth/login").set("x-csrf-token", a.csrfToken).send({ email: body.email, password: PASSWORD });
    })();
    expect(login.status).toBe(401);

    const retry = await purchase({ ...body, cardNumber: CARD_OK });
    expect(retry.res.status).toBe(201);
    expect(await counts()).toEqual({ users: before.users + 1, passes: before.passes + 1, events: before.events + 1 });
  });

  it("an expired card is declined with its own message", async () => {
    const { res } = await purchase(buyer({ cardExpiry: "01/20" }));
    expect(res.status).toBe(402);
    expect(res.body.error.message).toMatch(/^Your card has expired\./);
  });

  it("an e-mail with a usable account is refused before any payment", async () => {
    const school = await createUser(t, { email: `school-${n}@cinderfield.test`, role: "student" });
    const before = await counts();
    const deliveries = (await fake()).deliveries.length;
    const { res } = await purchase(buyer({ email: school.email.toUpperCase() }));
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("account_exists");
    expect(Object.keys(res.body.error.fields)).toEqual(["email"]);
    expect(await counts()).toEqual(before);
    expect((await fake()).deliveries.length).toBe(deliveries);
  });

  it("a sign-up left pending (server stopped mid-purchase) blocks the e-mail for 15 minutes, then can be replaced", async () => {
    const body = buyer();
    const stale = await t.db.write(async (tx) => {
      const u = await t.db.models.User.create({ email: body.email, displayName: "Stale", role: "student", kind: "self", passwordHash: "x" }, { transaction: tx });
      await t.db.models.StudyPass.create({ userId: u.id, providerPaymentId: `pi_stale_${n}`, amountMinor: 3900, currency: "eur" }, { transaction: tx });
      return u;
    });
    const blocked = await purchase(body);
    expect(blocked.res.status).toBe(409);
    expect(blocked.res.body.error.code).toBe("payment_in_progress");

    await t.db.sequelize.query(`UPDATE StudyPasses SET updatedAt = datetime('now', '-20 minutes') WHERE userId = ${stale.id}`);
    const replaced = await purchase(body);
    expect(replaced.res.status).toBe(201);
    expect(replaced.res.body.user.id).not.toBe(stale.id);
    expect(await t.db.models.StudyPass.count({ where: { providerPaymentId: `pi_stale_${n}` } })).toBe(0);
    expect(await t.db.models.User.count({ where: { email: body.email } })).toBe(1);
  });

  it("validation errors name the fields", async () => {
    const { res } = await purchase({ displayName: "", email: "not-an-email", password: "password", cardNumber: "4242 4242 4242 4241", cardExpiry: "13/30", cardCvc: "12" });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(Object.keys(res.body.error.fields).sort()).toEqual(["cardCvc", "cardExpiry", "cardNumber", "displayName", "email", "password"]);
    expect(res.body.error.fields.cardNumber).toEqual(["Check the card number: it has a typing mistake."]);
    const missing = await purchase({});
    expect(Object.keys(missing.res.body.error.fields).sort()).toEqual(["cardCvc", "cardExpiry", "cardNumber", "displayName", "email", "password"]);
  });

  it("needs the CSRF token, and is refused when signed in", async () => {
    const anon = request.agent(t.app);
    expect((await anon.post("/api/billing/purchase").send(buyer())).status).toBe(403);
    const s = await newStudent(t);
    const res = await s.agent.post("/api/billing/purchase").set("x-csrf-token", s.csrfToken).send(buyer());
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("signed_in");
  });

  it("is rate limited per IP", async () => {
    const limited = await createTestApp({ env: { LOGIN_RATE_LIMIT: "2" } });
    try {
      const { agent, csrfToken } = await csrfAgent(limited.app);
      const statuses: number[] = [];
      for (let i = 0; i < 3; i += 1) statuses.push((await agent.post("/api/billing/purchase").set("x-csrf-token", csrfToken).send({})).status);
      expect(statuses).toEqual([400, 400, 429]);
    } finally {
      await limited.cleanup();
    }
  });
});

describe("POST /api/billing/webhook", () => {
  it("a replayed event (same id, valid signature) adds nothing", async () => {
    const { res } = await purchase(buyer());
    expect(res.status).toBe(201);
    const last = (await fake()).deliveries.at(-1)!;
    expect(last.status).toBe(200);
    const before = await counts();
    const validUntil = (await t.db.models.StudyPass.findOne({ where: { userId: res.body.user.id } }))!.validUntil;
    const replay = await request(t.app).post("/api/billing/webhook").set("content-type", "application/json").set("stripe-signature", last.signature).send(last.payload);
    expect(replay.status).toBe(200);
    expect(replay.body).toEqual({ received: true, outcome: "duplicate" });
    expect(await counts()).toEqual(before);
    expect((await t.db.models.StudyPass.findOne({ where: { userId: res.body.user.id } }))!.validUntil).toEqual(validUntil);
  });

  it("a bad signature is refused with 400 and nothing changes", async () => {
    const { fake: f, webhookSecret } = await billingRuntimeOf(t.db)!.client();
    // A pending pass that a forged event would try to activate.
    const user = await t.db.write((tx) => t.db.models.User.create({ email: `pending-${n}@self.test`, displayName: "Pending", role: "student", kind: "self", passwordHash: "x" }, { transaction: tx }));
    await t.db.write((tx) => t.db.models.StudyPass.create({ userId: user.id, providerPaymentId: "pi_forged", amountMinor: 3900, currency: "eur" }, { transaction: tx }));
    const payload = JSON.stringify({ id: "evt_forged", object: "event", type: "payment_intent.succeeded", data: { object: { id: "pi_forged", object: "payment_intent", amount: 3900, amount_received: 3900, currency: "eur" } } });
    const before = await counts();
    const send = (signature: string | undefined, body = payload) => {
      const r = request(t.app).post("/api/billing/webhook").set("content-type", "application/json");
      return (signature ? r.set("stripe-signature", signature) : r).send(body);
    };
    const wrongSecret = Stripe.webhooks.generateTestHeaderString({ payload, secret: "whsec_not_the_right_one" });
    const tampered = Stripe.webhooks.generateTestHeaderString({ payload: payload.replace("3900", "3901"), secret: webhookSecret });
    for (const res of [await send(wrongSecret), await send(tampered), await send(undefined), await send("t=1,v1=00")]) {
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe("invalid_signature");
    }
    expect(await counts()).toEqual(before);
    expect((await t.db.models.StudyPass.findOne({ where: { providerPaymentId: "pi_forged" } }))!.status).toBe("pending");
    expect(f).toBeDefined();

    // The same payload correctly signed does activate it (so the refusals above were about the signature).
    const good = await send(Stripe.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }));
    expect(good.body).toEqual({ received: true, outcome: "activated" });
    expect((await t.db.models.StudyPass.findOne({ where: { providerPaymentId: "pi_forged" } }))!.status).toBe("succeeded");
  });
});

describe("self accounts without a valid pass", () => {
  async function selfUser(pass: "none" | "expired") {
    n += 1;
    const user = await createUser(t, { email: `self-${n}@self.test`, role: "student", password: PASSWORD });
    await t.db.write(async (tx) => {
      await t.db.models.User.update({ kind: "self" }, { where: { id: user.id }, transaction: tx });
      if (pass === "expired") {
        await t.db.models.StudyPass.create({ userId: user.id, providerPaymentId: `pi_old_${n}`, amountMinor: 3900, currency: "eur", status: "succeeded", paidAt: new Date("2024-01-01"), validUntil: new Date("2025-01-01") }, { transaction: tx });
      }
    });
    return user;
  }

  it("cannot sign in before any payment succeeded (clear message)", async () => {
    const user = await selfUser("none");
    const { agent, csrfToken } = await csrfAgent(t.app);
    const res = await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: user.email, password: PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("payment_incomplete");
    expect(res.body.error.message).toMatch(/payment .* has not gone through/);
    // A wrong password still gets the ordinary answer (the message reveals nothing without it).
    const wrong = await agent.post("/api/auth/login").set("x-csrf-token", csrfToken).send({ email: user.email, password: "not-the-password" });
    expect(wrong.status).toBe(401);
  });

  it("with an expired pass: signs in, the lab-side routes work, lesson progress and quizzes answer 402", async () => {
    const user = await selfUser("expired");
    const s = await signIn(t.app, user.email, PASSWORD);
    for (const res of [
      await s.agent.get(`/api/lessons/${lessonSlug}/progress`),
      await s.agent.put(`/api/lessons/${lessonSlug}/progress`).set("x-csrf-token", s.csrfToken).send({}),
      await s.agent.get(`/api/quizzes/${quizId}`),
      await s.agent.get(`/api/quizzes/${quizId}/attempts`),
      await s.agent.post(`/api/quizzes/${quizId}/attempts`).set("x-csrf-token", s.csrfToken).send({}),
    ]) {
      expect(res.status).toBe(402);
      expect(res.body.error).toEqual({ code: "pass_required", message: expect.stringMatching(/self-study pass is not active/) });
    }
    expect((await s.agent.get("/api/alloys")).status).toBe(200);
    expect((await s.agent.get("/api/modules")).status).toBe(200);
  });

  it("school students are unaffected, and signed-out callers still get 401", async () => {
    const s = await newStudent(t);
    expect((await s.agent.get(`/api/lessons/${lessonSlug}/progress`)).status).toBe(200);
    expect((await s.agent.get(`/api/quizzes/${quizId}`)).status).toBe(200);
    expect((await request(t.app).get(`/api/quizzes/${quizId}`)).status).toBe(401);
    expect((await request(t.app).get(`/api/lessons/${lessonSlug}/progress`)).status).toBe(401);
  });
});

describe("POST /api/billing/renew", () => {
  const DAY_MS = 86_400_000;
  const card = (overrides: Record<string, unknown> = {}) => ({ cardNumber: CARD_OK, cardExpiry: "12/34", cardCvc: "123", ...overrides });

  /** A signed-in "self" account whose only paid pass ends at `validUntil`. */
  async function selfLearner(validUntil: Date) {
    n += 1;
    const user = await createUser(t, { email: `renew-${n}@self.test`, role: "student", password: PASSWORD });
    await t.db.write(async (tx) => {
      await t.db.models.User.update({ kind: "self" }, { where: { id: user.id }, transaction: tx });
      await t.db.models.StudyPass.create({ userId: user.id, providerPaymentId: `pi_first_${n}`, amountMinor: 3900, currency: "eur", status: "succeeded", paidAt: new Date(validUntil.getTime() - 365 * DAY_MS), validUntil }, { transaction: tx });
    });
    return { ...(await signIn(t.app, user.email, PASSWORD)), user };
  }
  const passRows = (userId: number) => t.db.models.StudyPass.findAll({ where: { userId }, order: [["id", "ASC"]] });
  const summaryOf = async (agent: Awaited<ReturnType<typeof selfLearner>>["agent"]) => (await agent.get("/api/me/summary").expect(200)).body as MeSummary;

  it("while the pass still runs: the new 12 months start at the current end (no overlap), the webhook counted once", async () => {
    const currentEnd = new Date(Date.now() + 40 * DAY_MS);
    const s = await selfLearner(currentEnd);
    const before = await counts();
    const res = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card());
    expect(res.status).toBe(200);
    // Calendar months in UTC from the old end: the same rule as passValidUntil, checked in "shared helpers".
    expect(res.body).toEqual({ passValidUntil: passValidUntil(currentEnd, 12).toISOString() });

    const rows = await passRows(s.user.id);
    expect(rows.map((r) => r.status)).toEqual(["succeeded", "succeeded"]);
    expect(rows[0].validUntil).toEqual(currentEnd); // the old pass is left as it was
    expect(rows[1]).toMatchObject({ amountMinor: 3900, currency: "eur" });
    expect(rows[1].validUntil!.toISOString()).toBe(res.body.passValidUntil);
    expect(await counts()).toEqual({ users: before.users, passes: before.passes + 1, events: before.events + 1 });
    const event = await t.db.models.BillingEvent.findOne({ where: { providerPaymentId: rows[1].providerPaymentId } });
    expect(event?.type).toBe("payment_intent.succeeded");

    // The home summary shows the new end; a replayed webhook event changes nothing.
    const summary = await summaryOf(s.agent);
    expect(summary.role === "student" && summary.selfStudy).toEqual({ passValidUntil: res.body.passValidUntil });
    const last = (await fake()).deliveries.at(-1)!;
    const replay = await request(t.app).post("/api/billing/webhook").set("content-type", "application/json").set("stripe-signature", last.signature).send(last.payload);
    expect(replay.body).toEqual({ received: true, outcome: "duplicate" });
    expect((await passRows(s.user.id)).map((r) => r.validUntil!.toISOString())).toEqual([currentEnd.toISOString(), res.body.passValidUntil]);
  });

  it("after the pass ended: the new 12 months start now, and lessons and quizzes open again", async () => {
    const s = await selfLearner(new Date("2025-03-01T10:00:00Z"));
    expect((await s.agent.get(`/api/quizzes/${quizId}`)).status).toBe(402);
    const startedMs = Date.now();
    const res = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card());
    const endedMs = Date.now();
    expect(res.status).toBe(200);
    const newEnd = new Date(res.body.passValidUntil).getTime();
    expect(newEnd).toBeGreaterThanOrEqual(passValidUntil(new Date(startedMs), 12).getTime());
    expect(newEnd).toBeLessThanOrEqual(passValidUntil(new Date(endedMs), 12).getTime());
    expect((await s.agent.get(`/api/quizzes/${quizId}`)).status).toBe(200);
    expect((await s.agent.get(`/api/lessons/${lessonSlug}/progress`)).status).toBe(200);
  });

  it("declined: 402 with the provider's message, nothing stored as paid, the old end date stands", async () => {
    const oldEnd = new Date("2025-06-30T12:00:00Z");
    const s = await selfLearner(oldEnd);
    const before = await counts();
    const res = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card({ cardNumber: CARD_DECLINED }));
    expect(res.status).toBe(402);
    expect(res.body.error.code).toBe("payment_declined");
    expect(res.body.error.message).toMatch(/^Your card was declined\. Nothing was charged and your pass is unchanged/);
    expect(res.body.error.fields).toEqual({ cardNumber: ["Your card was declined."] });
    expect(await counts()).toEqual(before);
    const rows = await passRows(s.user.id);
    expect(rows).toHaveLength(1);
    expect(rows[0].validUntil).toEqual(oldEnd);
    const summary = await summaryOf(s.agent);
    expect(summary.role === "student" && summary.selfStudy).toEqual({ passValidUntil: oldEnd.toISOString() });
    // Not blocked as "in progress": the good card goes through right after.
    expect((await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card())).status).toBe(200);
  });

  it("a renewal still being processed blocks a second one (409), so a double click cannot pay twice", async () => {
    const s = await selfLearner(new Date(Date.now() + 10 * DAY_MS));
    await t.db.write((tx) => t.db.models.StudyPass.create({ userId: s.user.id, providerPaymentId: `pi_inflight_${n}`, amountMinor: 3900, currency: "eur" }, { transaction: tx }));
    const before = await counts();
    const res = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card());
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("payment_in_progress");
    expect(await counts()).toEqual(before);
  });

  it("school students and staff get 403 with the reason, signed-out callers 401, no CSRF token 403; nothing changes", async () => {
    const before = await counts();
    const deliveries = (await fake()).deliveries.length;
    const school = await newStudent(t);
    const denied = await school.agent.post("/api/billing/renew").set("x-csrf-token", school.csrfToken).send(card());
    expect(denied.status).toBe(403);
    expect(denied.body.error).toEqual({ code: "forbidden", message: expect.stringMatching(/^Your school provides your access/) });

    const instructor = await createUser(t, { email: `teacher-${++n}@cinderfield.test`, role: "instructor", password: PASSWORD });
    const staff = await signIn(t.app, instructor.email, PASSWORD);
    const staffRes = await staff.agent.post("/api/billing/renew").set("x-csrf-token", staff.csrfToken).send(card());
    expect(staffRes.status).toBe(403);
    expect(staffRes.body.error.message).toMatch(/instructor and admin accounts have access through the school/);

    const anon = await csrfAgent(t.app);
    const signedOut = await anon.agent.post("/api/billing/renew").set("x-csrf-token", anon.csrfToken).send(card());
    expect(signedOut.status).toBe(401);
    expect(signedOut.body.error.code).toBe("unauthenticated");

    const s = await selfLearner(new Date("2025-01-01T00:00:00Z"));
    const noToken = await s.agent.post("/api/billing/renew").send(card());
    expect(noToken.status).toBe(403);
    expect(noToken.body.error.code).toBe("csrf_failed");
    expect((await counts()).passes).toBe(before.passes + 1); // only selfLearner's own first pass
    expect((await fake()).deliveries.length).toBe(deliveries);
  });

  it("validation errors name the card fields only; account fields are refused", async () => {
    const s = await selfLearner(new Date("2025-01-01T00:00:00Z"));
    const empty = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send({});
    expect(empty.status).toBe(400);
    expect(empty.body.error.code).toBe("validation_failed");
    expect(Object.keys(empty.body.error.fields).sort()).toEqual(["cardCvc", "cardExpiry", "cardNumber"]);
    const bad = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send({ cardNumber: "4242 4242 4242 4241", cardExpiry: "13/30", cardCvc: "12" });
    expect(bad.body.error.fields).toEqual({
      cardNumber: ["Check the card number: it has a typing mistake."],
      cardExpiry: ["Enter the expiry date as MM/YY."],
      cardCvc: ["Enter the 3 or 4 digit security code."],
    });
    const extra = await s.agent.post("/api/billing/renew").set("x-csrf-token", s.csrfToken).send(card({ email: "someone-else@self.test" }));
    expect(extra.status).toBe(400);
    expect((await passRows(s.user.id))).toHaveLength(1);
  });

  it("is rate limited per IP", async () => {
    const limited = await createTestApp({ env: { LOGIN_RATE_LIMIT: "2" } });
    try {
      const user = await createUser(limited, { email: "limited@self.test", role: "student", password: PASSWORD });
      await limited.db.write(async (tx) => {
        await limited.db.models.User.update({ kind: "self" }, { where: { id: user.id }, transaction: tx });
        await limited.db.models.StudyPass.create({ userId: user.id, providerPaymentId: "pi_limited", amountMinor: 3900, currency: "eur", status: "succeeded", paidAt: new Date(), validUntil: new Date(Date.now() + DAY_MS) }, { transaction: tx });
      });
      const { agent, csrfToken } = await signIn(limited.app, user.email, PASSWORD);
      const statuses: number[] = [];
      for (let i = 0; i < 3; i += 1) statuses.push((await agent.post("/api/billing/renew").set("x-csrf-token", csrfToken).send({})).status);
      expect(statuses).toEqual([400, 400, 429]);
    } finally {
      await limited.cleanup();
    }
  });
});

describe("GET /api/me/summary: selfStudy", () => {
  it("a self account gets its pass end date; a school student gets null", async () => {
    const { res } = await purchase(buyer());
    expect(res.status).toBe(201);
    const [row] = await t.db.models.StudyPass.findAll({ where: { userId: res.body.user.id } });
    const self = await signIn(t.app, res.body.user.email, PASSWORD);
    const summary = (await self.agent.get("/api/me/summary").expect(200)).body as MeSummary;
    expect(summary).toMatchObject({ role: "student", selfStudy: { passValidUntil: row.validUntil!.toISOString() } });

    const school = await newStudent(t);
    const schoolSummary = (await school.agent.get("/api/me/summary").expect(200)).body as MeSummary;
    expect(schoolSummary.role).toBe("student");
    expect(schoolSummary.role === "student" && schoolSummary.selfStudy).toBeNull();
  });
});
