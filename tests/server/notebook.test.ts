/**
 * Forge notebook API (/api/notebook): entries with validation that names the fields, the
 * computation in each response equal to the science core's own functions, object-level access
 * (owner, the owner's instructors, admins; everyone else 404), instructor review with the
 * student's e-mail, the review queue, and the anonymous cohort comparison.
 *
 * World (tests/server/teaching-fixture.ts): instructor "own" teaches cohort A (students s1, s2);
 * instructor "other" teaches cohort B (s3); an admin; and "outsider", a student in no cohort.
 */
import request from "supertest";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { NotebookEntry, NotebookEntryInput, NotebookEntryResponse, ReviewListResponse } from "../../shared/api/notebook";
import {
  andrewsMsC,
  dissolvedFractionsForAustenitizing,
  equivalentTemperingHours,
  findGrade,
  hardenedState,
  martensitePlateauHardnessHrc,
  retainedAusteniteFraction,
  temperingConstantForCarbon,
  temperingParameter,
} from "../../shared/metallurgy";
import { reviewNotifierOf } from "../../server/services/notebook-mail";
import { createTeachingWorld, outbox, type Signed, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const post = (s: Signed, path: string, body: unknown) => s.agent.post(path).set("x-csrf-token", s.csrfToken).send(body as object);
const put = (s: Signed, path: string, body: unknown) => s.agent.put(path).set("x-csrf-token", s.csrfToken).send(body as object);
const del = (s: Signed, path: string) => s.agent.delete(path).set("x-csrf-token", s.csrfToken);

/** A 52100 blade: 845 °C, oil, dry ice, two 1 h tempers at 200 °C, three readings. */
function entryInput(overrides: Partial<NotebookEntryInput> = {}): NotebookEntryInput {
  return {
    title: "Paring knife, 52100",
    workedOn: "2026-03-14",
    steel: "grade:52100",
    normalizingCycles: 3,
    austenitizeC: 845,
    soakMinutes: 10,
    quenchMedium: "fast-oil",
    coldTreatment: "dry-ice",
    temperCycles: 2,
    temperC: 200,
    temperHours: 1,
    hardness: [
      { hrc: 61.5, spot: "edge" },
      { hrc: 62, spot: "mid" },
      { hrc: 60.5, spot: "spine" },
    ],
    notes: "Clean fracture, fine grain.",
    ...overrides,
  };
}

async function createEntry(s: Signed, overrides: Partial<NotebookEntryInput> = {}): Promise<NotebookEntry> {
  const res = await post(s, "/api/notebook/entries", entryInput(overrides));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return (res.body as NotebookEntryResponse).entry;
}

describe("creating entries", () => {
  it("answers 401 signed out", async () => {
    expect((await request(w.t.app).get("/api/notebook/entries")).status).toBe(401);
  });

  it("stores an entry and returns the computation of the science core", async () => {
    const entry = await createEntry(w.s1);
    expect(entry.steel).toMatchObject({ key: "grade:52100", source: "grade", label: "SAE 52100" });
    expect(entry.steel.composition).toEqual(findGrade("52100")!.composition);
    expect(entry.canEdit).toBe(true);
    expect(entry.review.status).toBe("unreviewed");

    const c = entry.computation;
    // Two 1 h cycles at one temperature count as 2 h (common practice, no source).
    const p = temperingParameter(200, 2).value;
    // Check value: 200 °C, 2 h, C = 20 -> P = 9605.43 (science-reference §5.1 check 1 [Computed]).
    expect(p).toBeCloseTo(9605.43, 2);
    expect(c.tempering!.parameter).toBe(p);
    expect(c.tempering!.totalHours).toBe(2);
    const cCarbon = temperingConstantForCarbon(1.0);
    expect(c.tempering!.carbonConstant).toBe(cCarbon);
    expect(c.tempering!.parameterCarbonConstant).toBe(temperingParameter(200, 2, cCarbon).value);
    // Default "other temperature": 20 °C hotter. Check value: same P at 220 °C = 0.3004 h (science-reference §5.1 check 2).
    expect(c.equivalent!.atC).toBe(220);
    expect(c.equivalent!.hours).toBe(equivalentTemperingHours(p, 220).value);
    expect(c.equivalent!.hours).toBeCloseTo(0.3004, 3);

    // Hardening chain, called here step by step from the core.
    const comp = findGrade("52100")!.composition;
    const dissolved = dissolvedFractionsForAustenitizing(comp, 845);
    const state = hardenedState(comp, { dissolvedFraction: dissolved.dissolvedFraction });
    const ms = andrewsMsC(state.solution.composition);
    expect(c.hardening.carbonInSolutionMassPct).toBe(state.solution.carbonMassPct);
    expect(c.hardening.asQuenchedHrc).toBe(martensitePlateauHardnessHrc(state.solution.carbonMassPct).value);
    expect(c.hardening.msC).toBe(ms);
    expect(c.hardening.retainedAusteniteAtRoom).toBe(retainedAusteniteFraction(ms, 20));
    // Dry ice is taken as −78 °C (sublimation of CO2 at 1 atm is −78.5 °C [Checked, handbook value]).
    expect(c.hardening.coldTreatmentC).toBe(-78);
    expect(c.hardening.retainedAusteniteAfterCold).toBe(retainedAusteniteFraction(ms, -78));
    expect(c.hardening.retainedAusteniteAfterCold!).toBeLessThan(c.hardening.retainedAusteniteAtRoom!);

    expect(c.readings).toEqual({ count: 3, meanHrc: (61.5 + 62 + 60.5) / 3, minHrc: 60.5, maxHrc: 62 });
  });

  it("an untempered piece has no tempering parameter and stores no tempering temperature", async () => {
    const entry = await createEntry(w.s1, { temperCycles: 0, temperC: 180, temperHours: 1, coldTreatment: "none" });
    expect(entry.process.temperC).toBeNull();
    expect(entry.computation.tempering).toBeNull();
    expect(entry.computation.equivalent).toBeNull();
    expect(entry.computation.hardening.retainedAusteniteAfterCold).toBeNull();
  });

  it("explains mistakes field by field", async () => {
    const res = await post(w.s1, "/api/notebook/entries", {
      ...entryInput({ austenitizeC: 1400, temperC: null, steel: "grade:NOPE", hardness: [{ hrc: 80, spot: "" }], title: "  " }),
    });
    expect(res.status).toBe(400);
    const fields = res.body.error.fields as Record<string, string[]>;
    expect(fields.austenitizeC[0]).toMatch(/at most 1250 °C/);
    expect(fields.temperC[0]).toMatch(/tempering temperature/);
    expect(fields.steel[0]).toMatch(/standard grades/);
    expect(fields["hardness.0.hrc"][0]).toMatch(/70 HRC/);
    expect(fields.title[0]).toMatch(/Enter a title/);
  });

  it("refuses fields the form does not have (no mass assignment)", async () => {
    const res = await post(w.s1, "/api/notebook/entries", { ...entryInput(), userId: w.s2.user.id, reviewStatus: "reviewed" });
    expect(res.status).toBe(400);
    const list = await w.s2.agent.get("/api/notebook/entries").expect(200);
    expect(list.body.entries).toEqual([]);
  });

  it("takes the steel from one's own saved alloy, not someone else's", async () => {
    const alloy = await post(w.s1, "/api/alloys", { name: "My 1084-ish", composition: { C: 0.84, Mn: 0.75 } });
    expect(alloy.status).toBe(201);
    const entry = await createEntry(w.s1, { steel: `alloy:${alloy.body.alloy.id}` });
    expect(entry.steel).toMatchObject({ source: "alloy", label: "My 1084-ish", composition: { C: 0.84, Mn: 0.75 } });
    const theirs = await post(w.s2, "/api/notebook/entries", entryInput({ steel: `alloy:${alloy.body.alloy.id}` }));
    expect(theirs.status).toBe(400);
    expect(theirs.body.error.fields.steel[0]).toMatch(/not found among yours/);
  });
});

describe("who sees and changes an entry", () => {
  let entry: NotebookEntry;
  beforeAll(async () => {
    entry = await createEntry(w.s1, { title: "Access check coupon" });
  });

  it("the owner, the owner's instructor and an admin can read it; others get 404 like a missing id", async () => {
    const path = `/api/notebook/entries/${entry.id}`;
    expect((await w.s1.agent.get(path)).status).toBe(200);
    const own = await w.own.agent.get(path).expect(200);
    expect(own.body.entry.canEdit).toBe(false);
    expect(own.body.entry.canReview).toBe(true);
    expect((await w.admin.agent.get(path)).status).toBe(200);
    const missing = await w.s2.agent.get("/api/notebook/entries/999999");
    for (const outsider of [w.s2, w.s3, w.other, w.outsider]) {
      const res = await outsider.agent.get(path);
      expect(res.status).toBe(404);
      expect(res.body).toEqual(missing.body);
    }
  });

  it("only the owner can change or delete it", async () => {
    const path = `/api/notebook/entries/${entry.id}`;
    for (const s of [w.s2, w.own, w.admin]) {
      expect((await put(s, path, entryInput({ title: "Hijacked" }))).status).toBe(404);
      expect((await del(s, path)).status).toBe(404);
    }
    const updated = await put(w.s1, path, entryInput({ title: "Access check coupon, retempered", temperC: 220 }));
    expect(updated.status).toBe(200);
    expect(updated.body.entry.title).toBe("Access check coupon, retempered");
    expect(updated.body.entry.computation.tempering.parameter).toBe(temperingParameter(220, 2).value);
  });

  it("lists only one's own entries", async () => {
    const mine = await w.s1.agent.get("/api/notebook/entries").expect(200);
    expect(mine.body.entries.length).toBeGreaterThan(0);
    expect(mine.body.entries.every((e: { owner: { id: number } }) => e.owner.id === w.s1.user.id)).toBe(true);
    expect(mine.body.storage).toMatchObject({ usedBytes: 0, quotaBytes: 50 * 1024 * 1024 });
    expect((await w.s3.agent.get("/api/notebook/entries").expect(200)).body.entries).toEqual([]);
  });

  it("deleting removes it", async () => {
    const doomed = await createEntry(w.s1, { title: "Cracked in the quench" });
    expect((await del(w.s1, `/api/notebook/entries/${doomed.id}`)).status).toBe(204);
    expect((await w.s1.agent.get(`/api/notebook/entries/${doomed.id}`)).status).toBe(404);
  });
});

describe("instructor review", () => {
  it("students get 403; an instructor of another cohort gets 404; the student's instructor reviews and the student is e-mailed", async () => {
    const entry = await createEntry(w.s1, { title: "Chef knife, 52100 <b>bold</b>" });
    const path = `/api/notebook/entries/${entry.id}/review`;
    expect((await post(w.s1, path, { status: "reviewed", comment: "Looks great" })).status).toBe(403);
    expect((await post(w.other, path, { status: "reviewed", comment: "" })).status).toBe(404);
    expect((await post(w.own, path, { status: "done", comment: "" })).body.error.fields.status).toBeDefined();

    const res = await post(w.own, path, { status: "needs-rework", comment: "Retest the edge after a second temper.\nTake three readings." });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.entry.review).toMatchObject({ status: "needs-rework", reviewedBy: w.own.user.displayName });
    expect(res.body.comment).toMatchObject({ author: w.own.user.displayName, status: "needs-rework", notification: "pending" });

    await reviewNotifierOf(w.t.db)!.idle();
    const mail = (await outbox(w.t)).filter((m) => m.toAddress.includes(w.s1.user.email)).at(-1)!;
    expect(mail.subject).toBe('Your notebook entry "Chef knife, 52100 <b>bold</b>" needs rework');
    expect(mail.text).toContain("> Retest the edge after a second temper.");
    expect(mail.text).toMatch(new RegExp(`https?://[^\\s]+/notebook/${entry.id}`));
    // The title is escaped in the HTML part.
    expect(mail.html).toContain("Chef knife, 52100 &lt;b&gt;bold&lt;/b&gt;");
    const after = await w.s1.agent.get(`/api/notebook/entries/${entry.id}`).expect(200);
    expect(after.body.entry.comments.map((c: { notification: string }) => c.notification)).toEqual(["sent"]);

    // The student reworks it: back in the queue as unreviewed.
    const reworked = await put(w.s1, `/api/notebook/entries/${entry.id}`, entryInput({ title: "Chef knife, 52100, second temper", temperCycles: 3 }));
    expect(reworked.body.entry.review.status).toBe("unreviewed");
  });

  it("an admin may review any entry", async () => {
    const entry = await createEntry(w.s3, { title: "Admin-reviewed coupon" });
    const res = await post(w.admin, `/api/notebook/entries/${entry.id}/review`, { status: "reviewed", comment: "" });
    expect(res.status).toBe(201);
    expect(res.body.entry.review.status).toBe("reviewed");
  });

  it("the review queue shows an instructor only their cohorts' students, filtered by status", async () => {
    await createEntry(w.s2, { title: "Tobin's first blade" });
    await createEntry(w.s3, { title: "Other cohort's blade" });
    const queue = (await w.own.agent.get("/api/notebook/review?status=unreviewed").expect(200)).body as ReviewListResponse;
    const owners = new Set(queue.entries.map((e) => e.owner.id));
    expect(owners.has(w.s2.user.id)).toBe(true);
    expect(owners.has(w.s3.user.id)).toBe(false);
    expect(queue.entries.every((e) => e.review.status === "unreviewed")).toBe(true);
    expect(queue.entries.find((e) => e.owner.id === w.s2.user.id)!.cohorts).toEqual(["Autumn Forge Cohort"]);
    const adminQueue = (await w.admin.agent.get("/api/notebook/review").expect(200)).body as ReviewListResponse;
    expect(adminQueue.entries.some((e) => e.owner.id === w.s3.user.id)).toBe(true);
    expect((await w.s1.agent.get("/api/notebook/review")).status).toBe(403);
    expect((await w.own.agent.get("/api/notebook/review?status=maybe")).status).toBe(400);
  });
});

describe("cohort comparison", () => {
  it("puts cohort mates' readings of the same steel beside the entry, without names, and nobody else's", async () => {
    const mine = await createEntry(w.s2, { steel: "grade:1080", title: "1080 coupon A", hardness: [{ hrc: 63, spot: "" }] });
    await createEntry(w.s1, { steel: "grade:1080", title: "1080 coupon B", temperC: 230, hardness: [{ hrc: 59, spot: "" }, { hrc: 59.5, spot: "" }] });
    await createEntry(w.s3, { steel: "grade:1080", title: "1080 other cohort", hardness: [{ hrc: 55, spot: "" }] });
    await createEntry(w.s1, { steel: "grade:5160", title: "5160, another steel", hardness: [{ hrc: 50, spot: "" }] });

    const res = await w.s2.agent.get(`/api/notebook/entries/${mine.id}`).expect(200);
    const { comparison } = res.body as NotebookEntryResponse;
    expect(comparison.steelLabel).toBe("SAE 1080");
    expect(comparison.own).toEqual([{ temperingParameter: temperingParameter(200, 2).value, hrc: 63, entryId: mine.id }]);
    // s1 shares cohort A with s2; s3 (cohort B) and the 5160 entry are left out.
    expect(comparison.cohort).toEqual([
      { temperingParameter: temperingParameter(230, 2).value, hrc: 59 },
      { temperingParameter: temperingParameter(230, 2).value, hrc: 59.5 },
    ]);
  });
});
