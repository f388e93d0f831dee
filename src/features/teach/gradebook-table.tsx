/**
 * The gradebook table (TanStack Table): students × quizzes with best and latest score, attempts,
 * passed and overdue marks, completion; sortable columns, a text filter and an "overdue only"
 * filter. The table grows with the page, so every student is reached by scrolling the page; it
 * scrolls sideways in its own box with the name column stuck at the left, and the header row
 * follows the page scroll (use-following-header.ts says why this is not CSS sticky).
 */
import { useId, useMemo, useState } from "react";
import { Link } from "react-router";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
  type SortingFn,
} from "@tanstack/react-table";
import type { Gradebook, GradebookCell, GradebookQuiz, GradebookStudent } from "@shared/api/gradebook";
import { cx } from "@/components/ui/cx";
import { percent } from "@/lib/format";
import { teachPaths } from "./paths";
import { useFollowingHeader } from "./use-following-header";
import { inputClass } from "@/components/ui/form-classes";

type ScoreView = "best" | "latest";
const column = createColumnHelper<GradebookStudent>();

/** Empty cells sort last whichever the direction. */
const nullsLast =
  (get: (s: GradebookStudent) => number | null): SortingFn<GradebookStudent> =>
  (a, b) => {
    const x = get(a.original);
    const y = get(b.original);
    if (x === null && y === null) return 0;
    if (x === null) return -1;
    if (y === null) return 1;
    return x - y;
  };

function QuizCell({ cell, quiz, view, overdue }: { cell: GradebookCell | undefined; quiz: GradebookQuiz; view: ScoreView; overdue: boolean }) {
  if (!cell || cell.attempts === 0) {
    return overdue ? (
      <span className="text-xs font-semibold text-danger-700">
        Overdue<span className="sr-only">, not attempted</span>
      </span>
    ) : (
      <span className="text-soot-500">
        —<span className="sr-only">not attempted</span>
      </span>
    );
  }
  const shown = view === "best" ? cell.best : cell.latest;
  const other = view === "best" ? cell.latest : cell.best;
  return (
    <div className="leading-tight">
      <span className={cx("font-mono text-base font-semibold tabular-nums", cell.passed ? "text-success-700" : "text-ember-700")}>
        {percent(shown)}
        <span aria-hidden="true" className="ml-1 text-xs">
          {cell.passed ? "✓" : "✗"}
        </span>
        <span className="sr-only">{cell.passed ? ", passed" : `, not passed (pass mark ${percent(quiz.passFraction)})`}</span>
      </span>
      <span className="block text-2xs text-soot-600">
        {view === "best" ? "latest" : "best"} {percent(other)} · {cell.attempts} {cell.attempts === 1 ? "try" : "tries"}
      </span>
      {overdue && !cell.passed ? <span className="block text-2xs font-semibold text-danger-700">Overdue</span> : null}
    </div>
  );
}

export function GradebookTable({ book }: { book: Gradebook }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "student", desc: false }]);
  const [filter, setFilter] = useState("");
  const [overdueOnly, setOverdueOnly] = useState(false);
  const [view, setView] = useState<ScoreView>("best");
  const filterId = useId();
  const { boxRef, overflow } = useFollowingHeader<HTMLDivElement>();
  const overdueAssignments = new Set(book.assignments.filter((a) => a.overdue).map((a) => a.id));

  const columns = useMemo(
    () => [
      column.accessor("displayName", {
        id: "student",
        header: "Student",
        sortingFn: (a, b) => a.original.displayName.localeCompare(b.original.displayName),
        cell: ({ row }) => (
          <div className="min-w-0">
            <Link to={teachPaths.student(book.cohort.id, row.original.id)} className="block truncate font-semibold text-quench-700 underline-offset-2 hover:underline">
              {row.original.displayName}
            </Link>
            <span className="block truncate text-2xs text-soot-600">{row.original.email}</span>
          </div>
        ),
      }),
      column.accessor("completion", {
        id: "completion",
        header: "Done",
        cell: ({ getValue }) => <span className="font-mono tabular-nums">{percent(getValue())}</span>,
      }),
      column.accessor("overdueCount", {
        id: "overdue",
        header: "Overdue",
        cell: ({ getValue }) =>
          getValue() > 0 ? (
            <span className="inline-flex min-w-6 justify-center rounded-xs bg-danger-100 px-1.5 font-mono text-xs font-semibold text-danger-700">{getValue()}</span>
          ) : (
            <span className="font-mono text-xs text-soot-500">0</span>
          ),
      }),
      ...book.quizzes.map((quiz) =>
        column.display({
          id: `quiz:${quiz.id}`,
          header: quiz.title,
          enableSorting: true,
          sortingFn: nullsLast((s) => (view === "best" ? s.quizzes[quiz.id]?.best : s.quizzes[quiz.id]?.latest) ?? null),
          cell: ({ row }) => (
            <QuizCell
              cell={row.original.quizzes[quiz.id]}
              quiz={quiz}
              view={view}
              overdue={!!row.original.assignments[String(quiz.assignmentId)]?.overdue && overdueAssignments.has(quiz.assignmentId)}
            />
          ),
        }),
      ),
    ],
    [book, view],
  );

  const data = useMemo(() => (overdueOnly ? book.students.filter((s) => s.overdueCount > 0) : book.students), [book.students, overdueOnly]);

  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    globalFilterFn: (row, _id, value: string) => {
      const needle = value.trim().toLowerCase();
      return !needle || row.original.displayName.toLowerCase().includes(needle) || row.original.email.toLowerCase().includes(needle);
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  const rows = table.getRowModel().rows;
  const quizById = new Map(book.quizzes.map((q) => [`quiz:${q.id}`, q]));

  return (
    <div>
      <div className="flex flex-wrap items-end gap-x-5 gap-y-3">
        <div className="w-full sm:w-64">
          <label htmlFor={filterId} className="block text-sm font-semibold text-soot-800">
            Find a student
          </label>
          <input id={filterId} type="search" className={`${inputClass} mt-1.5`} value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="Name or e-mail" />
        </div>
        <label className="inline-flex min-h-11 items-center gap-2 text-sm font-medium text-soot-800">
          <input type="checkbox" className="size-4 accent-ember-600" checked={overdueOnly} onChange={(e) => setOverdueOnly(e.target.checked)} />
          Only students with overdue work
        </label>
        <fieldset className="flex items-center gap-1 text-sm">
          <legend className="sr-only">Score shown in each cell</legend>
          {(["best", "latest"] as const).map((v) => (
            <label
              key={v}
              className={cx(
                "inline-flex min-h-10 cursor-pointer items-center rounded-md border px-3 font-medium has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-quench-500",
                view === v ? "border-soot-800 bg-soot-800 text-bone-50" : "border-soot-700/25 bg-white text-soot-800 hover:bg-bone-100",
              )}
            >
              <input type="radio" name="score-view" value={v} checked={view === v} onChange={() => setView(v)} className="sr-only" />
              {v === "best" ? "Best score" : "Latest score"}
            </label>
          ))}
        </fieldset>
      </div>

      <p className="mt-3 text-xs text-soot-600" role="status">
        <strong className="font-semibold text-soot-800">
          {rows.length} of {book.students.length} students shown
        </strong>
        . ✓ passed, ✗ not yet passed. Scores are shares of the quiz's marks.
      </p>
      {overflow.left || overflow.right ? (
        <p className="mt-1 text-xs font-medium text-quench-700" aria-hidden="true">
          {overflow.right ? "More quizzes to the right: scroll the table sideways →" : "← Scroll back for the first quizzes"}
        </p>
      ) : null}

      <div className="relative isolate mt-2">
        <div ref={boxRef} className="relative overflow-x-auto rounded-lg border border-bone-300 bg-white shadow-card" tabIndex={0} role="region" aria-label="Gradebook table, scrolls sideways">
          <table className="w-max min-w-full border-separate border-spacing-0 text-left text-sm">
            <caption className="sr-only">
              Gradebook of {book.cohort.name}: one row per student, one column per quiz. Column headers sort the table.
            </caption>
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id}>
                  {group.headers.map((header, i) => {
                    const sorted = header.column.getIsSorted();
                    const quiz = quizById.get(header.column.id);
                    return (
                      <th
                        key={header.id}
                        scope="col"
                        aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                        style={{ transform: "translateY(var(--head-y, 0px))" }}
                        className={cx(
                          "border-b border-bone-300 bg-bone-100 px-3 py-2 align-bottom font-semibold text-soot-800",
                          i === 0 ? "sticky left-0 z-30 w-36 min-w-36 border-r sm:w-52 sm:min-w-52" : "relative z-20",
                          quiz ? "min-w-32 max-w-44" : "",
                        )}
                      >
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="group inline-flex w-full items-end gap-1 text-left hover:text-soot-950"
                        >
                          <span className="min-w-0">
                            <span className="line-clamp-2">{flexRender(header.column.columnDef.header, header.getContext())}</span>
                            {quiz ? <span className="block text-2xs font-normal text-soot-600">pass {percent(quiz.passFraction)}</span> : null}
                          </span>
                          <span aria-hidden="true" className={cx("shrink-0 text-xs", sorted ? "text-ember-700" : "text-soot-500 opacity-0 group-hover:opacity-100")}>
                            {sorted === "desc" ? "▼" : "▲"}
                          </span>
                        </button>
                      </th>
                    );
                  })}
                </tr>
              ))}
            </thead>
            <tbody>
              {rows.length === 0 ? (
                <tr>
                  <td colSpan={columns.length} className="px-3 py-6 text-center text-soot-600">
                    {book.students.length === 0 ? "No students in this cohort yet." : "No student matches the filter."}
                  </td>
                </tr>
              ) : (
                rows.map((row) => (
                  <tr key={row.id} className="group/row">
                    {row.getVisibleCells().map((cell, i) => (
                      <td
                        key={cell.id}
                        className={cx(
                          "border-b border-bone-200 px-3 py-2 align-top group-hover/row:bg-bone-50",
                          i === 0 ? "sticky left-0 z-10 w-36 min-w-36 max-w-36 border-r bg-white sm:w-52 sm:min-w-52 sm:max-w-52" : "bg-white",
                        )}
                      >
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ))}
                  </tr>
                ))
              )}
            </tbody>
          </table>
        </div>
        {overflow.right ? (
          // A fade at the right edge: more columns lie beyond it.
          <div aria-hidden="true" className="pointer-events-none absolute inset-y-px right-px z-40 w-10 rounded-r-lg bg-linear-to-l from-soot-900/15 to-transparent" />
        ) : null}
      </div>
    </div>
  );
}
