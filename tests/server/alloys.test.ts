/**
 * Saved alloys (/api/alloys): each user lists, creates, renames and deletes their own; someone
 * else's alloy answers 404; bodies are validated with field names; an instructor attaches an own
 * alloy to a lesson and any signed-in reader of that lesson sees it.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { AttachedAlloyListResponse, SavedAlloy, SavedAlloyListResponse } from "../../shared/api/alloys";
import { createTestApp, createUser, signIn, type TestApp } from "../support/test-app";
import { newStudent } from "./course-fixture";

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t?.cleanup());

type Session = Awaited<ReturnType<typeof signIn>>;
const post = (s: Session, path: string, body: unknown) => s.agent.post(path).set("x-csrf-token", s.csrfToken).send(body as object);
const patch = (s: Session, path: string, body: unknown) => s.agent.patch(path).set("x-csrf-token", s.csrfToken).send(body as object);
const del = (s: Session, path: string) => s.agent.delete(path).set("x-csrf-token", s.csrfToken);

async function save(s: Session, name: string, composition: Record<string, number>): Promise<SavedAlloy> {
  const res = await post(s, "/api/alloys", { name, composition });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.alloy as SavedAlloy;
}

let instructorCounter = 0;
async function newInstructor(): Promise<Session> {
  instructorCounter += 1;
  const user = await createUser(t, { email: `alloy-instructor-${instructorCounter}@cinderfield.test`, role: "instructor", displayName: `Ida Ashgrove ${instructorCounter}` });
  return signIn(t.app, user.email);
}

describe("saved alloys: own list", () => {
  it("answers 401 when signed out", async () => {
    expect((await request(t.app).get("/api/alloys")).status).toBe(401);
  });

  it("creates, lists newest first, renames and deletes a user's alloys", async () => {
    const s = await newStudent(t, "alloy");
    const first = await save(s, "Cinderfield 14-4", { C: 1.05, Cr: 14, Mo: 4, V: 0 });
    // Zeros are not stored: the alloy simply has none of that element.
    expect(first.composition).toEqual({ C: 1.05, Cr: 14, Mo: 4 });
    const second = await save(s, "  Trimmed name  ", { C: 2.45, V: 9.75 });
    expect(second.name).toBe("Trimmed name");

    const list = (await s.agent.get("/api/alloys")).body as SavedAlloyListResponse;
    expect(list.alloys.map((a) => a.id)).toEqual([second.id, first.id]);

    const renamed = await patch(s, `/api/alloys/${first.id}`, { name: "Cinderfield 14-4 mod" });
    expect(renamed.status).toBe(200);
    expect(renamed.body.alloy).toMatchObject({ id: first.id, name: "Cinderfield 14-4 mod", composition: first.composition });

    expect((await del(s, `/api/alloys/${second.id}`)).status).toBe(204);
    const after = (await s.agent.get("/api/alloys")).body as SavedAlloyListResponse;
    expect(after.alloys.map((a) => a.id)).toEqual([first.id]);
    expect((await del(s, `/api/alloys/${second.id}`)).status).toBe(404);
  });

  it("never shows or changes another user's alloy (404, as if it did not exist)", async () => {
    const owner = await newStudent(t, "owner");
    const other = await newStudent(t, "other");
    const alloy = await save(owner, "Owner's steel", { C: 1, Cr: 17 });

    expect(((await other.agent.get("/api/alloys")).body as SavedAlloyListResponse).alloys).toEqual([]);
    const rename = await patch(other, `/api/alloys/${alloy.id}`, { name: "Mine now" });
    expect(rename.status).toBe(404);
    expect(rename.body.error.code).toBe("not_found");
    expect((await del(other, `/api/alloys/${alloy.id}`)).status).toBe(404);
    // Unchanged for the owner.
    const list = (await owner.agent.get("/api/alloys")).body as SavedAlloyListResponse;
    expect(list.alloys[0]).toMatchObject({ id: alloy.id, name: "Owner's steel" });
  });
});

describe("saved alloys: validation", () => {
  it("names the failing fields", async () => {
    const s = await newStudent(t, "validate");
    const cases: [unknown, string][] = [
      [{ composition: { C: 1 } }, "name"],
      [{ name: "   ", composition: {} }, "name"],
      [{ name: "x".repeat(61), composition: {} }, "name"],
      [{ name: "Too much carbon", composition: { C: 3.1 } }, "composition.C"],
      [{ name: "Negative", composition: { Cr: -1 } }, "composition.Cr"],
      [{ name: "Not a number", composition: { V: "4" } }, "composition.V"],
      [{ name: "Unknown element", composition: { Co: 2 } }, "composition"],
      [{ name: "No composition" }, "composition"],
    ];
    for (const [body, field] of cases) {
      const res = await post(s, "/api/alloys", body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.code).toBe("validation_failed");
      expect(Object.keys(res.body.error.fields), JSON.stringify(body)).toContain(field);
      expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/); // no stack trace
    }
    const badId = await patch(s, "/api/alloys/abc", { name: "x" });
    expect(badId.status).toBe(400);
    expect(Object.keys(badId.body.error.fields)).toContain("id");
    const badRename = await patch(s, `/api/alloys/${(await save(s, "ok", { C: 1 })).id}`, { name: "" });
    expect(badRename.status).toBe(400);
    expect(Object.keys(badRename.body.error.fields)).toContain("name");
  });
});

describe("attaching a saved alloy to a lesson", () => {
  it("lets an instructor attach an own alloy; students and other instructors cannot; readers see it", async () => {
    const instructor = await newInstructor();
    const alloy = await save(instructor, "High-vanadium demo", { C: 2.45, Cr: 5.25, V: 9.75, Mo: 1.3 });

    const created = await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "first-lesson", note: "Compare with 440C." });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.attachment).toMatchObject({ lessonSlug: "first-lesson", note: "Compare with 440C.", alloyId: alloy.id, name: "High-vanadium demo" });

    // Attaching again updates the note instead of duplicating.
    const again = await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "first-lesson", note: "Compare with D2." });
    expect(again.status).toBe(200);

    const student = await newStudent(t, "reader");
    const seen = (await student.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse;
    expect(seen.attachments).toHaveLength(1);
    expect(seen.attachments[0]).toMatchObject({ name: "High-vanadium demo", note: "Compare with D2.", composition: { C: 2.45, Cr: 5.25, V: 9.75, Mo: 1.3 } });
    expect(seen.attachments[0].attachedBy).toMatch(/Ida Ashgrove/);
    expect(((await student.agent.get("/api/lessons/second-lesson/attached-alloys")).body as AttachedAlloyListResponse).attachments).toEqual([]);
    expect((await request(t.app).get("/api/lessons/first-lesson/attached-alloys")).status).toBe(401);

    // A student cannot attach (403), even their own alloy.
    const own = await save(student, "Student steel", { C: 1 });
    expect((await post(student, `/api/alloys/${own.id}/attach`, { lessonSlug: "first-lesson" })).status).toBe(403);
    // Another instructor cannot attach this instructor's alloy (404).
    const other = await newInstructor();
    expect((await post(other, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "first-lesson" })).status).toBe(404);

    // Deleting the alloy removes the attachment.
    expect((await del(instructor, `/api/alloys/${alloy.id}`)).status).toBe(204);
    expect(((await student.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse).attachments).toEqual([]);
  });

  it("lets only the owner detach an alloy from a lesson; the alloy itself stays saved", async () => {
    const instructor = await newInstructor();
    const alloy = await save(instructor, "Detach me", { C: 1.2, Cr: 12 });
    expect((await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "first-lesson", note: "" })).status).toBe(201);
    expect((await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "second-lesson", note: "" })).status).toBe(201);

    // The owner sees the attachment as theirs; a student does not.
    const student = await newStudent(t, "detach-reader");
    const ownView = (await instructor.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse;
    expect(ownView.attachments.find((a) => a.alloyId === alloy.id)?.yours).toBe(true);
    const studentView = (await student.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse;
    expect(studentView.attachments.find((a) => a.alloyId === alloy.id)?.yours).toBe(false);

    // A student gets 403, another instructor 404 (someone else's alloy), and nothing changes.
    expect((await del(student, `/api/alloys/${alloy.id}/attach/first-lesson`)).status).toBe(403);
    expect((await del(await newInstructor(), `/api/alloys/${alloy.id}/attach/first-lesson`)).status).toBe(404);
    expect(((await student.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse).attachments.some((a) => a.alloyId === alloy.id)).toBe(true);

    expect((await del(instructor, `/api/alloys/${alloy.id}/attach/first-lesson`)).status).toBe(204);
    expect(((await student.agent.get("/api/lessons/first-lesson/attached-alloys")).body as AttachedAlloyListResponse).attachments.some((a) => a.alloyId === alloy.id)).toBe(false);
    // Only that lesson's attachment went; the other lesson and the saved alloy remain.
    expect(((await student.agent.get("/api/lessons/second-lesson/attached-alloys")).body as AttachedAlloyListResponse).attachments.some((a) => a.alloyId === alloy.id)).toBe(true);
    expect(((await instructor.agent.get("/api/alloys")).body as SavedAlloyListResponse).alloys.some((a) => a.id === alloy.id)).toBe(true);
    // Detaching again: nothing to remove.
    const twice = await del(instructor, `/api/alloys/${alloy.id}/attach/first-lesson`);
    expect(twice.status).toBe(404);
    expect(twice.body.error.message).toMatch(/attachment/i);
    expect((await del(instructor, `/api/alloys/${alloy.id}/attach/Bad%20Slug`)).status).toBe(400);
  });

  it("rejects unknown lessons (404) and malformed slugs or notes (400)", async () => {
    const instructor = await newInstructor();
    const alloy = await save(instructor, "Plain", { C: 0.95 });
    const unknown = await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "no-such-lesson" });
    expect(unknown.status).toBe(404);
    const bad = await post(instructor, `/api/alloys/${alloy.id}/attach`, { lessonSlug: "Bad Slug!", note: "n".repeat(501) });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(["lessonSlug", "note"]);
    expect((await instructor.agent.get("/api/lessons/Bad%20Slug/attached-alloys")).status).toBe(400);
  });
});
