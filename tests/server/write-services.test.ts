/**
 * The write services shared by the routes and the demo seed (server/services/alloys.ts,
 * notebook-entries.ts), called directly: they enforce the routes' rules themselves, a live
 * review is audited and waits for its e-mail while the demo history's is neither, and called
 * inside an outer queued write they join it (the seed's one transaction rolls them all back).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { NotebookEntryInput } from "../../shared/api/notebook";
import type { Actor } from "../../server/services/actor";
import { attachAlloy, saveAlloy } from "../../server/services/alloys";
import { getCourseCatalog } from "../../server/services/lessons/course";
import { createEntry, reviewEntry } from "../../server/services/notebook-entries";
import { createTeachingWorld, type Signed, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const live = (s: Signed): Actor => ({ user: s.user, ip: "203.0.113.7" });
const history = (s: Signed): Actor => ({ user: s.user, ip: undefined, demoHistory: true });

const input: NotebookEntryInput = {
  title: "1080 coupon",
  workedOn: "2025-01-10",
  steel: "grade:1080",
  normalizingCycles: 2,
  austenitizeC: 815,
  soakMinutes: 5,
  quenchMedium: "fast-oil",
  coldTreatment: "none",
  temperCycles: 2,
  temperC: 200,
  temperHours: 1,
  hardness: [{ hrc: 61, spot: "edge" }],
  notes: "",
};

const audits = (entryId: number) => w.t.db.models.AuditLog.findAll({ where: { action: "notebook.review", targetId: String(entryId) } });

describe("reviewEntry", () => {
  it("live: comment waits for its e-mail, the entry is marked, one audit row with the request's address", async () => {
    const entry = await createEntry(w.t.db, live(w.s1), input);
    const comment = await reviewEntry(w.t.db, live(w.own), entry, { status: "needs-rework", comment: "Grind a flat and test again." });
    expect(comment.notification).toBe("pending");
    const fresh = (await w.t.db.models.NotebookEntry.findByPk(entry.id))!;
    expect([fresh.reviewStatus, fresh.reviewedById]).toEqual(["needs-rework", w.own.user.id]);
    const rows = await audits(entry.id);
    expect(rows.map((r) => [r.actorId, r.ip, r.details])).toEqual([[w.own.user.id, "203.0.113.7", { status: "needs-rework", studentId: w.s1.user.id }]]);
  });

  it("demo history: the same review, but no e-mail and no audit row", async () => {
    const entry = await createEntry(w.t.db, history(w.s2), input);
    const comment = await reviewEntry(w.t.db, history(w.own), entry, { status: "reviewed", comment: "" });
    expect(comment.notification).toBe("none");
    expect((await w.t.db.models.NotebookEntry.findByPk(entry.id))!.reviewStatus).toBe("reviewed");
    expect(await audits(entry.id)).toHaveLength(0);
  });

  it("refuses an instructor who does not teach the student (404), writing nothing", async () => {
    const entry = await createEntry(w.t.db, live(w.s1), input);
    await expect(reviewEntry(w.t.db, live(w.other), entry, { status: "reviewed", comment: "" })).rejects.toMatchObject({ status: 404, message: "That notebook entry was not found." });
    expect(await w.t.db.models.NotebookComment.count({ where: { entryId: entry.id } })).toBe(0);
  });
});

describe("attachAlloy", () => {
  it("keeps the route's rules: instructors only (403), own alloys only (404), lessons of the course only (404)", async () => {
    const catalog = await getCourseCatalog();
    const mine = await saveAlloy(w.t.db, live(w.own), { name: "Test stainless", composition: { C: 0.6, Cr: 13, V: 0 } });
    expect(mine.composition).toEqual({ C: 0.6, Cr: 13 }); // zeros dropped
    const studentAlloy = await saveAlloy(w.t.db, live(w.s1), { name: "Mine", composition: { C: 1 } });
    await expect(attachAlloy(w.t.db, catalog, live(w.s1), studentAlloy, { lessonSlug: "first-lesson", note: "" })).rejects.toMatchObject({ status: 403 });
    await expect(attachAlloy(w.t.db, catalog, live(w.other), mine, { lessonSlug: "first-lesson", note: "" })).rejects.toMatchObject({ status: 404, message: "That saved alloy was not found." });
    await expect(attachAlloy(w.t.db, catalog, live(w.own), mine, { lessonSlug: "no-such-lesson", note: "" })).rejects.toMatchObject({ status: 404, message: "That lesson was not found." });
    const first = await attachAlloy(w.t.db, catalog, live(w.own), mine, { lessonSlug: "first-lesson", note: "a" });
    const again = await attachAlloy(w.t.db, catalog, live(w.own), mine, { lessonSlug: "first-lesson", note: "b" });
    expect([first.created, again.created, again.attachment.id === first.attachment.id, again.attachment.note]).toEqual([true, false, true, "b"]);
  });
});

describe("inside an outer queued write (the demo seed's one transaction)", () => {
  it("the services join it: when it rolls back, none of their rows remain", async () => {
    const { SavedAlloy, NotebookEntry, NotebookComment } = w.t.db.models;
    const before = [await SavedAlloy.count(), await NotebookEntry.count(), await NotebookComment.count()];
    const catalog = await getCourseCatalog();
    const rolledBack = w.t.db.write(async () => {
      const alloy = await saveAlloy(w.t.db, history(w.own), { name: "Rolled back", composition: { C: 0.8 } });
      await attachAlloy(w.t.db, catalog, history(w.own), alloy, { lessonSlug: "second-lesson", note: "" });
      const entry = await createEntry(w.t.db, history(w.s1), input);
      await reviewEntry(w.t.db, history(w.own), entry, { status: "reviewed", comment: "" });
      expect(await NotebookEntry.count()).toBe(before[1] + 1); // visible inside the transaction
      throw new Error("seed failed");
    });
    await expect(rolledBack).rejects.toThrow("seed failed");
    expect([await SavedAlloy.count(), await NotebookEntry.count(), await NotebookComment.count()]).toEqual(before);
  });
});
