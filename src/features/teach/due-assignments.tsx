/**
 * The student's assignments on their home page: overdue first, then what is due, then what is
 * done; each with progress and a link to the next lesson. Self-contained (own query).
 */
import { Link } from "react-router";
import type { MyAssignment, MyAssignmentState } from "@shared/api/assignments";
import { useMyAssignments } from "@/api/assignments";
import { formatDay, percent, relativeDue } from "@/lib/format";
import { Badge, type BadgeTone } from "@/components/ui/badge";
import { ProgressBar } from "@/components/ui/progress-bar";
import { paths } from "@/config/paths";

const ORDER: Record<MyAssignmentState, number> = { overdue: 0, due: 1, done: 2 };
const BADGE: Record<MyAssignmentState, { label: string; tone: BadgeTone }> = {
  overdue: { label: "Overdue", tone: "danger" },
  due: { label: "Due", tone: "straw" },
  done: { label: "Done", tone: "success" },
};

export function DueAssignments() {
  const query = useMyAssignments();
  if (query.isPending || query.isError || query.data.assignments.length === 0) return null;
  const list = [...query.data.assignments].sort((a, b) => ORDER[a.state] - ORDER[b.state] || a.dueAt.localeCompare(b.dueAt));
  const overdue = list.filter((a) => a.state === "overdue").length;

  return (
    <section aria-labelledby="due-assignments">
      <h2 id="due-assignments" className="text-2xl font-semibold">
        Your assignments
      </h2>
      <p className="mt-1 text-sm text-soot-700">
        {overdue ? `${overdue} overdue — start with ${overdue === 1 ? "that one" : "those"}.` : "Nothing overdue."} A module is done when every lesson is read and every quiz passed.
      </p>
      <ul className="mt-4 grid gap-3">
        {list.map((a) => (
          <AssignmentItem key={a.id} assignment={a} />
        ))}
      </ul>
    </section>
  );
}

function AssignmentItem({ assignment: a }: { assignment: MyAssignment }) {
  const p = a.progress;
  return (
    <li className={`rounded-lg border bg-white p-4 shadow-card ${a.state === "overdue" ? "border-danger-700/40 border-l-4 border-l-danger-700" : "border-bone-300"}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <p className="flex flex-wrap items-center gap-2 font-semibold text-soot-900">
            {a.module.title}
            <Badge tone={BADGE[a.state].tone}>{BADGE[a.state].label}</Badge>
          </p>
          <p className="mt-0.5 text-xs text-soot-600">
            {a.cohort.name} · due <span className="font-mono text-soot-800">{formatDay(a.dueAt)}</span> ({relativeDue(a.dueAt)})
            {a.maxAttemptsPerQuiz !== null ? ` · ${a.maxAttemptsPerQuiz} attempts per quiz` : ""}
          </p>
        </div>
        {a.next ? (
          <Link to={paths.lesson(a.module.slug, a.next.lessonSlug)} className="text-sm font-semibold text-quench-700 underline-offset-2 hover:underline">
            Continue: {a.next.title}
          </Link>
        ) : null}
      </div>
      <div className="mt-3 flex items-center gap-3">
        <span className="w-12 shrink-0 font-mono text-xs tabular-nums text-soot-800">{percent(p.share)}</span>
        <ProgressBar share={p.share} label={`${a.module.title}: ${percent(p.share)} done`} tone={a.state === "overdue" ? "ember" : a.state === "done" ? "success" : "quench"} />
      </div>
      <p className="mt-1 text-xs text-soot-600">
        {p.lessonsDone} of {p.lessonsTotal} lessons read · {p.quizzesPassed} of {p.quizzesTotal} quizzes passed
      </p>
    </li>
  );
}
