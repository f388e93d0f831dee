/**
 * Roster import: the preview classifies every row and stores nothing; the import invites only the
 * good rows; malformed rows and duplicate e-mails are reported; a spreadsheet-formula name
 * ("=cmd|...") survives as text and is defused (leading ') in the gradebook CSV export.
 */
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseRoster } from "../../server/services/roster";
import { defuseCell } from "../../server/services/gradebook-csv";
import { csrfAgent } from "../support/test-app";
import { createTeachingWorld, dbSnapshot, invitationLinkFor, type TeachingWorld } from "./teaching-fixture";

let w: TeachingWorld;
beforeAll(async () => {
  w = await createTeachingWorld();
});
afterAll(() => w?.t.cleanup());

const FORMULA = "=cmd|' /C calc'!A0";

function rosterCsv(existingStudentEmail: string, memberEmail: string): string {
  return [
    "Name,E-mail",
    "Priya Tallisker,priya.tallisker@cinderfield.test",
    `"${FORMULA.replace(/"/g, '""')}",formula.person@cinderfield.test`,
    "Jonas Villemont,not-an-address",
    "Only one column",
    "Dario Penhallow,PRIYA.TALLISKER@cinderfield.test",
    "",
    `Existing Student,${existingStudentEmail}`,
    `Already Member,${memberEmail}`,
    "Too,many@cinderfield.test,columns",
    ",nameless@cinderfield.test",
    "Tab\tName,tab.name@cinderfield.test",
  ].join("\r\n");
}

describe("parseRoster (papaparse)", () => {
  it("finds the header, skips blank lines and reports each malformed row with its line number", () => {
    const { headerDetected, rows, fileErrors } = parseRoster(rosterCsv("a@cinderfield.test", "b@cinderfield.test"));
    expect(headerDetected).toBe(true);
    expect(fileErrors).toEqual([]);
    expect(rows.map((r) => r.line)).toEqual([2, 3, 4, 5, 6, 8, 9, 10, 11, 12]);
    const errorsAt = (line: number) => rows.find((r) => r.line === line)!.errors;
    expect(errorsAt(2)).toEqual([]);
    expect(errorsAt(3)).toEqual([]); // a formula is just text here; it is defused on export
    expect(errorsAt(4)[0]).toMatch(/not a valid e-mail/);
    expect(errorsAt(5)[0]).toMatch(/two columns/);
    expect(errorsAt(10)[0]).toMatch(/Too many columns/);
    expect(errorsAt(11)[0]).toMatch(/Enter name/);
    expect(errorsAt(12)[0]).toMatch(/control characters/); // a TAB inside a name
  });

  it("reads files without a header, in either column order, and rejects an empty one", () => {
    expect(parseRoster("Wren Ostby,wren@cinderfield.test\n").rows[0]).toMatchObject({ name: "Wren Ostby", email: "wren@cinderfield.test", errors: [] });
    expect(parseRoster("wren@cinderfield.test;Wren Ostby\n").rows[0]).toMatchObject({ name: "Wren Ostby", email: "wren@cinderfield.test" });
    expect(parseRoster("\n\n").fileErrors[0]).toMatch(/no rows/);
    expect(parseRoster('Name,Email\n"unterminated,x@y.test\n').rows[0].errors.join(" ")).toMatch(/could not be read/);
  });
});

describe("preview and import", () => {
  let csv: string;
  beforeAll(async () => {
    csv = rosterCsv(w.outsider.user.email, w.s1.user.email);
  });

  it("the preview classifies every row and changes nothing in the database", async () => {
    const before = await dbSnapshot(w.t);
    const res = await w.own.agent.post(`/api/cohorts/${w.cohortA}/roster/preview`).set("x-csrf-token", w.own.csrfToken).send({ csv }).expect(200);
    expect(await dbSnapshot(w.t)).toBe(before);
    const status = Object.fromEntries(res.body.rows.map((r: { line: number; status: string }) => [r.line, r.status]));
    expect(status).toEqual({ 2: "new", 3: "new", 4: "invalid", 5: "invalid", 6: "duplicate", 8: "existing_student", 9: "already_member", 10: "invalid", 11: "invalid", 12: "invalid" });
    expect(res.body.counts).toEqual({ new: 2, existing_student: 1, already_member: 1, already_invited: 0, duplicate: 1, invalid: 5 });
  });

  it("the import invites the new rows, enrols the existing student, and skips the rest", async () => {
    const res = await w.own.agent.post(`/api/cohorts/${w.cohortA}/roster/import`).set("x-csrf-token", w.own.csrfToken).send({ csv }).expect(202);
    expect(res.body.counts).toMatchObject({ invited: 2, enrolled: 1 });
    const invitations = await w.t.db.models.Invitation.findAll({ where: { cohortId: w.cohortA }, order: [["email", "ASC"]] });
    expect(invitations.map((i) => i.email)).toEqual(["formula.person@cinderfield.test", "priya.tallisker@cinderfield.test"]);
    expect(invitations[0].displayName).toBe(FORMULA);
    expect(await w.t.db.models.Invitation.count({ where: { email: "nameless@cinderfield.test" } })).toBe(0);
    const audit = await w.t.db.models.AuditLog.findOne({ where: { action: "roster.imported" } });
    expect(audit!.details).toMatchObject({ rows: 10, invited: 2, enrolled: 1, skipped: 7 });
    // A second import of the same file finds them already invited or members: nothing new.
    const again = await w.own.agent.post(`/api/cohorts/${w.cohortA}/roster/preview`).set("x-csrf-token", w.own.csrfToken).send({ csv }).expect(200);
    expect(again.body.counts).toMatchObject({ new: 0, existing_student: 0, already_invited: 2, already_member: 2 });
  });

  it("refuses a roster over the row limit as a whole", async () => {
    const big = ["name,email", ...Array.from({ length: 501 }, (_, i) => `P${i},p${i}@cinderfield.test`)].join("\n");
    const res = await w.own.agent.post(`/api/cohorts/${w.cohortA}/roster/import`).set("x-csrf-token", w.own.csrfToken).send({ csv: big }).expect(400);
    expect(res.body.error.message).toMatch(/at most 500/);
  });

  it("the formula name, once a student, is defused in the gradebook CSV export", async () => {
    const { token } = await invitationLinkFor(w.t, "formula.person@cinderfield.test");
    const anon = await csrfAgent(w.t.app);
    const lookup = await anon.agent.post("/api/invitations/lookup").set("x-csrf-token", anon.csrfToken).send({ token }).expect(200);
    await anon.agent.post("/api/invitations/accept").set("x-csrf-token", anon.csrfToken).send({ token, displayName: lookup.body.displayName, password: "anvil-glow-4455" }).expect(201);

    const res = await w.own.agent.get(`/api/cohorts/${w.cohortA}/gradebook.csv`).expect(200);
    expect(res.headers["content-type"]).toBe("text/csv; charset=utf-8");
    expect(res.headers["content-disposition"]).toMatch(/^attachment; filename="gradebook-cohort-\d+-\d{4}-\d{2}-\d{2}\.csv"$/);
    const parsed = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, ""), { skipEmptyLines: true });
    const row = parsed.data.find((r) => r[1] === "formula.person@cinderfield.test")!;
    expect(row[0]).toBe(`'${FORMULA}`);
    // No cell of the export starts with a formula character.
    for (const r of parsed.data) for (const cell of r) expect(cell).not.toMatch(/^[=+\-@\t\r]/);
  });

  it("defuseCell prefixes exactly the dangerous first characters", () => {
    for (const bad of ["=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx"]) expect(defuseCell(bad)).toBe(`'${bad}`);
    for (const ok of ["Ruth", "1.5", "", "a=b", "'quoted"]) expect(defuseCell(ok)).toBe(ok);
  });
});
