/**
 * Invitations by e-mail: the message goes over SMTP to the in-process fake and lands in the outbox
 * (plain text + HTML), the token is random, stored hashed, single use and expiring; accepting
 * creates the student, joins the cohort and signs them in; a mail server that is down leaves the
 * invitation pending (202, never 500) until the retry job sends it; no header injection.
 */
import { createHash } from "node:crypto";
import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { teachingRuntimeOf } from "../../server/mail/runtime";
import { csrfAgent, createTestApp } from "../support/test-app";
import { createTeachingWorld, invitationLinkFor, mailSettled, outbox, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const invite = (email: string, displayName?: string) =>
  w.own.agent
    .post(`/api/cohorts/${w.cohortA}/invitations`)
    .set("x-csrf-token", w.own.csrfToken)
    .send({ invitations: [{ email, ...(displayName ? { displayName } : {}) }] });

async function accept(token: string, displayName = "Lumi Harrowgate", password = "anvil-glow-4455") {
  const anon = await csrfAgent(w.t.app);
  const res = await anon.agent.post("/api/invitations/accept").set("x-csrf-token", anon.csrfToken).send({ token, displayName, password });
  return { res, agent: anon.agent };
}

describe("inviting by e-mail", () => {
  it("answers 202, e-mails a link through the SMTP fake, and stores only the token's hash", async () => {
    const res = await invite("Lumi.Harrowgate@Cinderfield.test", "Lumi Harrowgate").expect(202);
    expect(res.body.counts.invited).toBe(1);
    expect(res.body.results[0]).toMatchObject({ email: "lumi.harrowgate@cinderfield.test", outcome: "invited" });

    const { token, url } = await invitationLinkFor(w.t, "lumi.harrowgate@cinderfield.test");
    expect(url).toMatch(/^http:\/\/127\.0\.0\.1:\d+\/invite\//); // supertest's origin: no PUBLIC_URL set
    // 43 base64url characters = 256 random bits (ASVS 11.5.1 asks for at least 128).
    expect(token).toHaveLength(43);
    const row = await w.t.db.models.Invitation.findOne({ where: { email: "lumi.harrowgate@cinderfield.test" } });
    expect(row!.status).toBe("sent");
    expect(row!.tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    const [raw] = await w.t.db.sequelize.query(`SELECT * FROM Invitations WHERE id = ${row!.id}`);
    expect(JSON.stringify(raw)).not.toContain(token);

    const message = (await outbox(w.t)).at(-1)!;
    expect(message.subject).toBe("You are invited to Autumn Forge Cohort on Grain & Edge");
    expect(message.text).toContain("Hello Lumi Harrowgate,");
    expect(message.html).toContain(`href="${url}"`);
    expect(message.fromAddress).toContain("no-reply@grain-edge.test");
  });

  it("lists invitations for the instructor with their state", async () => {
    const res = await w.own.agent.get(`/api/cohorts/${w.cohortA}/invitations`).expect(200);
    const lumi = res.body.invitations.find((i: { email: string }) => i.email === "lumi.harrowgate@cinderfield.test");
    expect(lumi).toMatchObject({ state: "sent", sendAttempts: 1, lastSendError: null });
    expect(JSON.stringify(res.body)).not.toMatch(/tokenHash|token/);
  });

  it("does not invite twice, enrols an existing student directly, and refuses staff addresses", async () => {
    const again = await invite("lumi.harrowgate@cinderfield.test").expect(202);
    expect(again.body.results[0].outcome).toBe("already_invited");
    const existing = await invite(w.outsider.user.email).expect(202);
    expect(existing.body.results[0].outcome).toBe("enrolled");
    expect(await w.t.db.models.Enrollment.count({ where: { cohortId: w.cohortA, studentId: w.outsider.user.id } })).toBe(1);
    const staff = await invite(w.other.user.email).expect(202);
    expect(staff.body.results[0].outcome).toBe("rejected");
    // Clean up: take the outsider back out of the cohort.
    await w.own.agent.delete(`/api/cohorts/${w.cohortA}/students/${w.outsider.user.id}`).set("x-csrf-token", w.own.csrfToken).expect(204);
  });

  it("shows the invitation to the holder of the link, then accepts it once: account, cohort, signed in", async () => {
    await invite("ezra.coldwater@cinderfield.test", "Ezra").expect(202);
    const { token } = await invitationLinkFor(w.t, "ezra.coldwater@cinderfield.test");
    const anon = await csrfAgent(w.t.app);
    const lookup = await anon.agent.post("/api/invitations/lookup").set("x-csrf-token", anon.csrfToken).send({ token }).expect(200);
    expect(lookup.body).toMatchObject({ email: "ezra.coldwater@cinderfield.test", cohortName: "Autumn Forge Cohort", displayName: "Ezra" });

    const { res, agent } = await accept(token, "Ezra Coldwater");
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.user).toMatchObject({ email: "ezra.coldwater@cinderfield.test", role: "student", displayName: "Ezra Coldwater" });
    // Signed in as the new student, who is in the cohort and sees its assignment.
    expect((await agent.get("/api/auth/me").expect(200)).body.user.email).toBe("ezra.coldwater@cinderfield.test");
    const mine = await agent.get("/api/assignments").expect(200);
    expect(mine.body.assignments.map((a: { cohort: { name: string } }) => a.cohort.name)).toEqual(["Autumn Forge Cohort"]);
    const detail = await w.own.agent.get(`/api/cohorts/${w.cohortA}`).expect(200);
    expect(detail.body.students.map((s: { email: string }) => s.email)).toContain("ezra.coldwater@cinderfield.test");

    // Single use: the same link again is refused, and creates nothing.
    const users = await w.t.db.models.User.count();
    const second = await accept(token, "Someone Else");
    expect(second.res.status).toBe(410);
    expect(second.res.body.error.code).toBe("invitation_used");
    expect(await w.t.db.models.User.count()).toBe(users);
    // The new password works for signing in.
    const login = await csrfAgent(w.t.app);
    await login.agent.post("/api/auth/login").set("x-csrf-token", login.csrfToken).send({ email: "ezra.coldwater@cinderfield.test", password: "anvil-glow-4455" }).expect(200);
  });

  it("refuses an expired link, and a resend makes a new link while the old one stops working", async () => {
    await invite("anouk.stennet@cinderfield.test").expect(202);
    const first = await invitationLinkFor(w.t, "anouk.stennet@cinderfield.test");
    const row = await w.t.db.models.Invitation.findOne({ where: { email: "anouk.stennet@cinderfield.test" } });
    await w.t.db.write((tx) => row!.update({ expiresAt: new Date(Date.now() - 1000) }, { transaction: tx }));
    const expired = await accept(first.token);
    expect(expired.res.status).toBe(410);
    expect(expired.res.body.error.code).toBe("invitation_expired");
    expect(await w.t.db.models.User.count({ where: { email: "anouk.stennet@cinderfield.test" } })).toBe(0);
    const listed = await w.own.agent.get(`/api/cohorts/${w.cohortA}/invitations`).expect(200);
    expect(listed.body.invitations.find((i: { id: number }) => i.id === row!.id).state).toBe("expired");

    await w.own.agent.post(`/api/cohorts/${w.cohortA}/invitations/${row!.id}/resend`).set("x-csrf-token", w.own.csrfToken).expect(202);
    const second = await invitationLinkFor(w.t, "anouk.stennet@cinderfield.test");
    expect(second.token).not.toBe(first.token);
    expect((await accept(first.token)).res.status).toBe(404); // the old token is gone
    expect((await accept(second.token, "Anouk Stennet")).res.status).toBe(201);
  });

  it("a revoked invitation's link no longer works", async () => {
    await invite("caleb.finch@cinderfield.test").expect(202);
    const { token } = await invitationLinkFor(w.t, "caleb.finch@cinderfield.test");
    const row = await w.t.db.models.Invitation.findOne({ where: { email: "caleb.finch@cinderfield.test" } });
    const revoked = await w.own.agent.delete(`/api/cohorts/${w.cohortA}/invitations/${row!.id}`).set("x-csrf-token", w.own.csrfToken).expect(200);
    expect(revoked.body.invitation.state).toBe("revoked");
    const res = await accept(token);
    expect(res.res.status).toBe(404);
    expect(res.res.body.error.code).toBe("invitation_invalid");
  });

  it("rejects malformed tokens and weak passwords with 400, and unknown tokens with 404", async () => {
    const anon = await csrfAgent(w.t.app);
    const bad = await anon.agent.post("/api/invitations/accept").set("x-csrf-token", anon.csrfToken).send({ token: "short", displayName: "X", password: "anvil-glow-4455" });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(["token"]);
    const weak = await anon.agent.post("/api/invitations/accept").set("x-csrf-token", anon.csrfToken).send({ token: "A".repeat(43), displayName: "X", password: "short" });
    expect(weak.status).toBe(400);
    expect(Object.keys(weak.body.error.fields)).toEqual(["password"]);
    const unknown = await anon.agent.post("/api/invitations/lookup").set("x-csrf-token", anon.csrfToken).send({ token: "A".repeat(43) });
    expect(unknown.status).toBe(404);
  });

  it("keeps CR/LF out of headers: a display name with a Bcc line does not add a recipient", async () => {
    const injected = "Mallory\r\nBcc: spy@evil.test";
    const res = await invite("mallory@cinderfield.test", "Mallory").expect(202);
    expect(res.body.results[0].outcome).toBe("invited");
    // The schema refuses control characters outright...
    const refused = await invite("mallory2@cinderfield.test", injected);
    expect(refused.status).toBe(400);
    // ...and a name stored some other way is flattened before it reaches a header.
    await mailSettled(w.t);
    await w.t.db.write((tx) => w.t.db.models.Invitation.update({ displayName: injected, status: "pending", nextSendAt: new Date() }, { where: { email: "mallory@cinderfield.test" }, transaction: tx }));
    await teachingRuntimeOf(w.t.db)!.runJobs();
    const last = (await outbox(w.t)).filter((m) => m.toAddress.includes("mallory@")).at(-1)!;
    expect(last.toAddress).toBe("mallory@cinderfield.test"); // envelope: exactly one recipient
    expect(last.toAddress).not.toContain("spy@evil.test");
    expect(last.text).toContain("Hello Mallory Bcc: spy@evil.test,"); // one line of text, not a header
  });
});

describe("when the mail server is down", () => {
  it("stores the invitation as pending, answers 202, and the retry job sends it once the server is back", async () => {
    // Reserve a free port, then close it: SMTP_URL points at a server that is not there yet.
    const probe = new SMTPServer({ authOptional: true, disabledCommands: ["STARTTLS", "AUTH"], logger: false });
    await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", () => resolve()));
    const port = (probe.server.address() as AddressInfo).port;
    await new Promise<void>((resolve) => probe.close(() => resolve()));

    const down = await createTeachingWorld({ env: { SMTP_URL: `smtp://127.0.0.1:${port}` } });
    try {
      const res = await down.own.agent
        .post(`/api/cohorts/${down.cohortA}/invitations`)
        .set("x-csrf-token", down.own.csrfToken)
        .send({ invitations: [{ email: "kofi.brannagh@cinderfield.test", displayName: "Kofi" }] });
      expect(res.status).toBe(202);
      await mailSettled(down.t);
      const pending = await down.t.db.models.Invitation.findOne({ where: { email: "kofi.brannagh@cinderfield.test" } });
      expect(pending!.status).toBe("pending");
      expect(pending!.sendAttempts).toBe(1);
      expect(pending!.lastSendError).toMatch(/ECONNREFUSED|could not take/);
      expect(pending!.nextSendAt!.getTime()).toBeGreaterThan(Date.now());
      const listed = await down.own.agent.get(`/api/cohorts/${down.cohortA}/invitations`).expect(200);
      expect(listed.body.invitations[0]).toMatchObject({ state: "pending", sendAttempts: 1 });

      // The mail server comes back on that port; the retry job (run as if an hour later) delivers it.
      const received: string[] = [];
      const server = new SMTPServer({
        authOptional: true,
        disabledCommands: ["STARTTLS", "AUTH"],
        logger: false,
        onData(stream, _session, cb) {
          const chunks: Buffer[] = [];
          stream.on("data", (c: Buffer) => chunks.push(c));
          stream.on("end", () => {
            received.push(Buffer.concat(chunks).toString("utf8"));
            cb();
          });
        },
      });
      await new Promise<void>((resolve) => server.listen(port, "127.0.0.1", () => resolve()));
      try {
        const result = await teachingRuntimeOf(down.t.db)!.runJobs(new Date(Date.now() + 3_600_000));
        expect(result.invitationsAttempted).toBe(1);
        // (The job also sends due-date reminders to the cohort's two students; count only invitations.)
        const invitations = () => received.filter((m) => m.includes("kofi.brannagh@cinderfield.test"));
        expect(invitations()).toHaveLength(1);
        expect(invitations()[0]).toContain("To: Kofi <kofi.brannagh@cinderfield.test>");
        const sent = await down.t.db.models.Invitation.findByPk(pending!.id);
        expect(sent!.status).toBe("sent");
        expect(sent!.sendAttempts).toBe(2);
        // Running the job again sends nothing more.
        const again = await teachingRuntimeOf(down.t.db)!.runJobs(new Date(Date.now() + 7_200_000));
        expect(again.invitationsAttempted).toBe(0);
        expect(again.reminders.sent).toBe(0);
        expect(invitations()).toHaveLength(1);
      } finally {
        await new Promise<void>((resolve) => server.close(() => resolve()));
      }
    } finally {
      await down.t.cleanup();
    }
  });
});

describe("the in-process SMTP fake", () => {
  it("starts on first use and stores each message parsed (encoded headers, quoted-printable, both parts)", async () => {
    const t = await createTestApp();
    try {
      const rt = teachingRuntimeOf(t.db)!;
      expect(rt.mailer.fakeTransport).toBe(true);
      const longLink = `https://example.test/invite/${"x".repeat(120)}`;
      await rt.mailer.send({
        to: { address: "jonas.villemont@cinderfield.test", name: "Jonas Villemont" },
        subject: "Härten — “Autumn” reminder",
        text: `Grüße from the forge\n${longLink}`,
        html: "<p>Grüße <b>forge</b></p>",
      });
      const [message] = await outbox(t);
      expect(message.subject).toBe("Härten — “Autumn” reminder");
      expect(message.text).toBe(`Grüße from the forge\n${longLink}`); // soft line breaks rejoined
      expect(message.html).toBe("<p>Grüße <b>forge</b></p>");
      expect(message.toAddress).toBe("jonas.villemont@cinderfield.test");
    } finally {
      await t.cleanup();
    }
  });
});
