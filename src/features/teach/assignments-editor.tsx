import { useId, useState } from "react";
import { MAX_ATTEMPTS_LIMIT, type CohortAssignment } from "@shared/api/assignments";
import { useCohortAssignments, useCreateAssignment, useDeleteAssignment, useUpdateAssignment } from "@/api/assignments";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { messageFor } from "@/api/errors";
import { formatDay, fromLocalInput, plural, relativeDue, toLocalInput } from "@/lib/format";
import { Badge } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";
import { ProgressBar } from "@/components/ui/progress-bar";
import { inputClass, selectClass } from "@/components/ui/form-classes";

const ATTEMPT_CHOICES = [null, 1, 2, 3, 4, 5, 10, MAX_ATTEMPTS_LIMIT] as const;
const attemptsLabel = (n: number | null) => (n === null ? "Unlimited" : plural(n, "attempt"));

/** Next week, 17:00 local time: a sensible default due date. */
function defaultDue(): string {
  const d = new Date(Date.now() + 7 * 86_400_000);
  d.setHours(17, 0, 0, 0);
  return toLocalInput(d.toISOString());
}

function AttemptsSelect({ id, value, onChange }: { id: string; value: number | null; onChange: (v: number | null) => void }) {
  return (
    <select id={id} className={`${selectClass} w-full`} value={value === null ? "" : String(value)} onChange={(e) => onChange(e.target.value === "" ? null : Number(e.target.value))}>
      {[...ATTEMPT_CHOICES, ...(ATTEMPT_CHOICES.includes(value as never) ? [] : [value])].map((n) => (
        <option key={String(n)} value={n === null ? "" : n}>
          {attemptsLabel(n)}
        </option>
      ))}
    </select>
  );
}

/** Modules set for the cohort: due dates, attempts per quiz, who has finished; add, change, remove. */
export function AssignmentsEditor({ cohortId, archived }: { cohortId: number; archived: boolean }) {
  const query = useCohortAssignments(cohortId);
  const create = useCreateAssignment(cohortId);
  const [moduleSlug, setModuleSlug] = useState("");
  const [due, setDue] = useState(defaultDue);
  const [attempts, setAttempts] = useState<number | null>(3);
  const ids = { module: useId(), due: useId(), attempts: useId() };

  async function add(event: React.FormEvent) {
    event.preventDefault();
    const dueAt = fromLocalInput(due);
    if (!moduleSlug || !dueAt) return;
    await create.mutateAsync({ moduleSlug, dueAt, maxAttemptsPerQuiz: attempts });
    setModuleSlug("");
  }

  return (
    <Panel
      id="assignments"
      title="Assignments"
      description="A module is finished when every lesson is read to the end and every quiz is passed. Students get an e-mail reminder two days before the due date if they have not finished."
    >
      <Loaded query={query} label="assignments">
        {(data) => {
          const free = data.modules.filter((m) => !m.assigned);
          return (
            <div className="space-y-6">
              {data.assignments.length === 0 ? (
                <p className="text-sm text-soot-700">No work set yet.</p>
              ) : (
                <ul className="divide-y divide-bone-200 rounded-md border border-bone-200">
                  {data.assignments.map((a) => (
                    <AssignmentRow key={a.id} cohortId={cohortId} assignment={a} archived={archived} />
                  ))}
                </ul>
              )}
              {archived || free.length === 0 ? null : (
                <form onSubmit={(e) => void add(e).catch(() => undefined)} className="grid gap-4 rounded-md bg-bone-100 p-4 md:grid-cols-[2fr_1.2fr_1fr_auto] md:items-end">
                  <div>
                    <label htmlFor={ids.module} className="block text-sm font-semibold text-soot-800">
                      Module
                    </label>
                    <select id={ids.module} className={`${selectClass} mt-1.5 w-full`} value={moduleSlug} onChange={(e) => setModuleSlug(e.target.value)} required>
                      <option value="">Choose a module…</option>
                      {free.map((m) => (
                        <option key={m.slug} value={m.slug}>
                          {m.title} ({plural(m.lessonCount, "lesson")}, {plural(m.quizCount, "quiz", "quizzes")})
                        </option>
                      ))}
                    </select>
                  </div>
                  <div>
                    <label htmlFor={ids.due} className="block text-sm font-semibold text-soot-800">
                      Due
                    </label>
                    <input id={ids.due} type="datetime-local" className={`${inputClass} mt-1.5`} value={due} onChange={(e) => setDue(e.target.value)} required />
                  </div>
                  <div>
                    <label htmlFor={ids.attempts} className="block text-sm font-semibold text-soot-800">
                      Attempts per quiz
                    </label>
                    <div className="mt-1.5">
                      <AttemptsSelect id={ids.attempts} value={attempts} onChange={setAttempts} />
                    </div>
                  </div>
                  <Button type="submit" disabled={!moduleSlug || !fromLocalInput(due) || create.isPending}>
                    {create.isPending ? "Assigning…" : "Assign"}
                  </Button>
                  {create.isError ? (
                    <Alert tone="danger" className="md:col-span-4">
                      {messageFor(create.error)}
                    </Alert>
                  ) : null}
                </form>
              )}
            </div>
          );
        }}
      </Loaded>
    </Panel>
  );
}

function AssignmentRow({ cohortId, assignment: a, archived }: { cohortId: number; assignment: CohortAssignment; archived: boolean }) {
  const update = useUpdateAssignment(cohortId);
  const remove = useDeleteAssignment(cohortId);
  const [editing, setEditing] = useState(false);
  const [due, setDue] = useState(toLocalInput(a.dueAt));
  const [attempts, setAttempts] = useState<number | null>(a.maxAttemptsPerQuiz);
  const ids = { due: useId(), attempts: useId() };
  const finishedShare = a.studentCount ? a.finishedCount / a.studentCount : 0;

  async function save(event: React.FormEvent) {
    event.preventDefault();
    const dueAt = fromLocalInput(due);
    if (!dueAt) return;
    await update.mutateAsync({ id: a.id, dueAt, maxAttemptsPerQuiz: attempts });
    setEditing(false);
  }

  return (
    <li className="p-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <p className="flex flex-wrap items-center gap-2 font-semibold text-soot-900">
            {a.module.title}
            {a.overdue ? <Badge tone="danger">Past due</Badge> : null}
          </p>
          <p className="mt-0.5 text-sm text-soot-600">
            Due <span className="font-mono text-soot-800">{formatDay(a.dueAt)}</span> ({relativeDue(a.dueAt)}) · {attemptsLabel(a.maxAttemptsPerQuiz)} per quiz ·{" "}
            {plural(a.module.lessonCount, "lesson")}, {plural(a.module.quizCount, "quiz", "quizzes")}
          </p>
        </div>
        {archived || editing ? null : (
          <div className="flex gap-1">
            <Button variant="ghost" className="min-h-9 px-3" onClick={() => setEditing(true)}>
              Change<span className="sr-only"> {a.module.title}</span>
            </Button>
            <Button
              variant="ghost"
              className="min-h-9 px-3"
              disabled={remove.isPending}
              onClick={() => {
                if (window.confirm(`Remove the assignment “${a.module.title}”? Students keep their progress and attempts.`)) remove.mutate(a.id);
              }}
            >
              Remove<span className="sr-only"> {a.module.title}</span>
            </Button>
          </div>
        )}
      </div>
      <div className="mt-3 flex items-center gap-3">
        <span className="w-28 shrink-0 text-xs text-soot-700">
          {a.finishedCount} of {a.studentCount} finished
        </span>
        <ProgressBar share={finishedShare} label={`${a.module.title}: ${a.finishedCount} of ${a.studentCount} students finished`} tone="success" />
      </div>
      {editing ? (
        <form onSubmit={(e) => void save(e).catch(() => undefined)} className="mt-4 grid gap-3 sm:grid-cols-[1.3fr_1fr_auto_auto] sm:items-end">
          <div>
            <label htmlFor={ids.due} className="block text-sm font-semibold text-soot-800">
              Due
            </label>
            <input id={ids.due} type="datetime-local" className={`${inputClass} mt-1.5`} value={due} onChange={(e) => setDue(e.target.value)} required />
          </div>
          <div>
            <label htmlFor={ids.attempts} className="block text-sm font-semibold text-soot-800">
              Attempts per quiz
            </label>
            <div className="mt-1.5">
              <AttemptsSelect id={ids.attempts} value={attempts} onChange={setAttempts} />
            </div>
          </div>
          <Button type="submit" disabled={update.isPending}>
            Save
          </Button>
          <Button variant="secondary" onClick={() => setEditing(false)}>
            Cancel
          </Button>
        </form>
      ) : null}
      {update.isError || remove.isError ? (
        <Alert tone="danger" className="mt-3">
          {messageFor(update.error ?? remove.error)}
        </Alert>
      ) : null}
    </li>
  );
}
