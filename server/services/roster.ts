/**
 * Roster import: a CSV of name and e-mail, parsed with papaparse. The preview classifies every
 * row (new, existing student, already a member, already invited, duplicate in the file, invalid)
 * and stores nothing; the import re-runs the same checks and invites only the rows that pass.
 */
import Papa from "papaparse";
import { ROSTER_MAX_ROWS, displayNameSchema, inviteEmailSchema, type RosterPreview, type RosterRow, type RosterRowStatus } from "../../shared/api/invitations";
import type { Db } from "../db/database";
import type { CohortInstance } from "../db/models";
import { relationTo } from "./invitations";

interface ParsedRow {
  line: number;
  name: string;
  email: string;
  errors: string[];
}

const EMAIL_HEADER = /^e-?mail( address)?$/i;
const NAME_HEADER = /^(full |display )?name$/i;

/**
 * Comma, semicolon (spreadsheets in many locales) or TAB: whichever the first non-blank line uses
 * most. (papaparse's own guess needs several rows and misreads one-line files.)
 */
function guessDelimiter(text: string): string {
  const line = text.split(/\r?\n/).find((l) => l.trim() !== "") ?? "";
  const outsideQuotes = line.replace(/"[^"]*"/g, "");
  const counts = [",", ";", "\t"].map((d) => ({ d, n: outsideQuotes.split(d).length - 1 }));
  const best = counts.reduce((a, b) => (b.n > a.n ? b : a));
  return best.n > 0 ? best.d : ",";
}

/** Parse the CSV text into rows with per-row format errors (no database access). */
export function parseRoster(csv: string): { headerDetected: boolean; rows: ParsedRow[]; fileErrors: string[] } {
  const text = csv.replace(/^\uFEFF/, ""); // spreadsheet BOM
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false, delimiter: guessDelimiter(text) });
  const rowErrors = new Map<number, string[]>();
  for (const err of parsed.errors) {
    if (typeof err.row === "number") rowErrors.set(err.row, [...(rowErrors.get(err.row) ?? []), `The row could not be read (${err.message}).`]);
  }
  const data = parsed.data;
  const fileErrors: string[] = [];

  // A header row names the columns; without one the order is name, e-mail (or e-mail, name).
  const first = (data[0] ?? []).map((c) => c.trim());
  const headerDetected = first.some((c) => EMAIL_HEADER.test(c));
  let nameCol = 0;
  let emailCol = 1;
  if (headerDetected) {
    emailCol = first.findIndex((c) => EMAIL_HEADER.test(c));
    nameCol = first.findIndex((c) => NAME_HEADER.test(c));
    if (nameCol < 0) fileErrors.push('The header has an "email" column but no "name" column.');
  } else if (first.length >= 2 && first[0].includes("@") && !first[1].includes("@")) {
    nameCol = 1;
    emailCol = 0;
  }

  const rows: ParsedRow[] = [];
  data.forEach((cells, index) => {
    if (headerDetected && index === 0) return;
    if (cells.every((c) => c.trim() === "")) return; // blank line
    const line = index + 1;
    const errors = [...(rowErrors.get(index) ?? [])];
    const name = (cells[nameCol] ?? "").trim();
    const email = (cells[emailCol] ?? "").trim();
    const expected = headerDetected ? first.length : 2;
    if (cells.length < 2) errors.push("Expected two columns: name and e-mail.");
    else if (cells.length > expected && cells.slice(expected).some((c) => c.trim() !== "")) errors.push(`Too many columns (${cells.length}); expected ${expected}.`);
    if (cells.length >= 2) {
      const n = displayNameSchema.safeParse(name);
      if (!n.success) errors.push(n.error.issues[0].message);
      const e = inviteEmailSchema.safeParse(email);
      if (!e.success) errors.push(email ? `“${email.slice(0, 80)}” is not a valid e-mail address.` : "The e-mail address is missing.");
    }
    rows.push({ line, name: name.slice(0, 200), email: email.toLowerCase().slice(0, 254), errors });
  });
  if (rows.length > ROSTER_MAX_ROWS) fileErrors.push(`The roster has ${rows.length} rows; import at most ${ROSTER_MAX_ROWS} at a time.`);
  if (rows.length === 0 && fileErrors.length === 0) fileErrors.push("The file has no rows with a name and an e-mail address.");
  return { headerDetected, rows, fileErrors };
}

/** Classify every row against the cohort; stores nothing. */
export async function previewRoster(db: Db, cohort: CohortInstance, csv: string): Promise<RosterPreview> {
  const { headerDetected, rows, fileErrors } = parseRoster(csv);
  const valid = rows.filter((r) => r.errors.length === 0);
  const relations = await db.read(() => relationTo(db, cohort.id, [...new Set(valid.map((r) => r.email))]));
  const seen = new Set<string>();
  const out: RosterRow[] = rows.map((row) => {
    if (row.errors.length) return { line: row.line, name: row.name, email: row.email, status: "invalid", messages: row.errors };
    if (seen.has(row.email)) return { line: row.line, name: row.name, email: row.email, status: "duplicate", messages: ["This e-mail address appears earlier in the file."] };
    seen.add(row.email);
    const relation = relations.get(row.email) ?? { kind: "new" as const };
    const as = (status: RosterRowStatus, message: string): RosterRow => ({ line: row.line, name: row.name, email: row.email, status, messages: message ? [message] : [] });
    switch (relation.kind) {
      case "new":
        return as("new", "");
      case "existing_student":
        return as("existing_student", "Has a student account: will be added directly.");
      case "already_member":
        return as("already_member", "Already in this cohort.");
      case "already_invited":
        return as("already_invited", "Already invited.");
      case "staff":
        return as("invalid", "This address belongs to an instructor or admin account.");
      case "disabled":
        return as("invalid", "This address belongs to a disabled account.");
    }
  });
  const counts = { new: 0, existing_student: 0, already_member: 0, already_invited: 0, duplicate: 0, invalid: 0 } as Record<RosterRowStatus, number>;
  for (const r of out) counts[r.status] += 1;
  return { headerDetected, rows: out, counts, fileErrors };
}

/** The rows an import acts on: new people and existing students, in file order. */
export function importableRows(preview: RosterPreview): RosterRow[] {
  return preview.fileErrors.length ? [] : preview.rows.filter((r) => r.status === "new" || r.status === "existing_student");
}
