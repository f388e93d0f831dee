/**
 * The gradebook as CSV (papaparse `unparse`). Spreadsheet formula injection is defused: any cell
 * that starts with = + - @ TAB or CR gets a leading single quote, so a student named
 * "=HYPERLINK(...)" shows as text instead of running as a formula (OWASP "CSV Injection").
 */
import Papa from "papaparse";
import type { Gradebook } from "../../shared/api/gradebook";

const FORMULA_START = /^[=+\-@\t\r]/;

export function defuseCell(value: string): string {
  return FORMULA_START.test(value) ? `'${value}` : value;
}

const pct = (share: number | null) => (share === null ? "" : String(Math.round(share * 1000) / 10));

export function gradebookCsv(book: Gradebook): string {
  const fields = [
    "Student",
    "E-mail",
    "Completion %",
    "Overdue assignments",
    ...book.assignments.map((a) => `${a.moduleTitle}: completion %`),
    ...book.quizzes.flatMap((q) => [`${q.title}: best %`, `${q.title}: latest %`, `${q.title}: attempts`, `${q.title}: passed`]),
  ];
  const data = book.students.map((s) => [
    s.displayName,
    s.email,
    pct(s.completion),
    String(s.overdueCount),
    ...book.assignments.map((a) => {
      const c = s.assignments[String(a.id)];
      return c ? `${pct(c.share)}${c.overdue ? " (overdue)" : ""}` : "";
    }),
    ...book.quizzes.flatMap((q) => {
      const cell = s.quizzes[q.id];
      return [pct(cell?.best ?? null), pct(cell?.latest ?? null), String(cell?.attempts ?? 0), cell?.passed ? "yes" : "no"];
    }),
  ]);
  return Papa.unparse({ fields: fields.map(defuseCell), data: data.map((row) => row.map(defuseCell)) }, { newline: "\r\n" });
}

/** A server-chosen, ASCII-only file name (never built from user input except the numeric id). */
export function gradebookFileName(cohortId: number, now = new Date()): string {
  return `gradebook-cohort-${cohortId}-${now.toISOString().slice(0, 10)}.csv`;
}
