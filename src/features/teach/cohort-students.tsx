import { useId, useState } from "react";
import { Link } from "react-router";
import type { CohortDetail, CohortStudent } from "@shared/api/cohorts";
import { useMoveStudent, useRemoveStudent } from "@/api/cohorts";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { messageFor } from "@/api/errors";
import { formatDay } from "@/lib/format";
import { teachPaths } from "./paths";
import { Badge } from "@/components/ui/badge";
import { Panel } from "@/components/ui/panel";
import { selectClass } from "@/components/ui/form-classes";

/** The cohort's students: open their attempts, move them to another of your cohorts, or remove them. */
export function CohortStudents({ data }: { data: CohortDetail }) {
  const cohortId = data.cohort.id;
  const remove = useRemoveStudent(cohortId);
  const move = useMoveStudent(cohortId);
  const [status, setStatus] = useState("");
  const failure = remove.error ?? move.error;

  async function onRemove(student: CohortStudent) {
    if (!window.confirm(`Remove ${student.displayName} from ${data.cohort.name}? Their account and past attempts stay.`)) return;
    await remove.mutateAsync(student.id);
    setStatus(`${student.displayName} was removed from the cohort.`);
  }

  async function onMove(student: CohortStudent, toCohortId: number) {
    const target = data.moveTargets.find((t) => t.id === toCohortId);
    await move.mutateAsync({ studentId: student.id, toCohortId });
    setStatus(`${student.displayName} moved to ${target?.name ?? "the other cohort"}.`);
  }

  return (
    <Panel id="students" title="Students" description={data.students.length ? "Open a name to see their quiz attempts and answers." : undefined}>
      <p role="status" className="sr-only">
        {status}
      </p>
      {failure ? <Alert tone="danger" className="mb-3">{messageFor(failure)}</Alert> : null}
      {data.students.length === 0 ? (
        <p className="text-sm text-soot-700">No students yet. Invite them by e-mail or import a roster.</p>
      ) : (
        <ul className="divide-y divide-bone-200">
          {data.students.map((s) => (
            <StudentRow
              key={s.id}
              student={s}
              cohortId={cohortId}
              archived={data.cohort.archived}
              moveTargets={data.moveTargets}
              onRemove={() => void onRemove(s).catch(() => undefined)}
              onMove={(to) => void onMove(s, to).catch(() => undefined)}
              busy={remove.isPending || move.isPending}
            />
          ))}
        </ul>
      )}
    </Panel>
  );
}

function StudentRow({
  student,
  cohortId,
  archived,
  moveTargets,
  onRemove,
  onMove,
  busy,
}: {
  student: CohortStudent;
  cohortId: number;
  archived: boolean;
  moveTargets: CohortDetail["moveTargets"];
  onRemove: () => void;
  onMove: (toCohortId: number) => void;
  busy: boolean;
}) {
  const [target, setTarget] = useState("");
  const selectId = useId();
  return (
    <li className="flex flex-wrap items-center gap-x-4 gap-y-2 py-3 first:pt-0 last:pb-0">
      <div className="min-w-0 flex-1 basis-48">
        <Link to={teachPaths.student(cohortId, student.id)} className="font-semibold text-quench-700 underline-offset-2 hover:underline">
          {student.displayName}
        </Link>
        {student.disabled ? <Badge className="ml-2">Disabled</Badge> : null}
        <p className="truncate text-xs text-soot-600">
          {student.email} · joined {formatDay(student.enrolledAt)}
        </p>
      </div>
      {archived ? null : (
        <div className="flex flex-wrap items-center gap-2">
          {moveTargets.length ? (
            <>
              <label htmlFor={selectId} className="sr-only">
                Move {student.displayName} to
              </label>
              <select id={selectId} className={`${selectClass} min-h-10 max-w-44 text-sm`} value={target} onChange={(e) => setTarget(e.target.value)}>
                <option value="">Move to…</option>
                {moveTargets.map((t) => (
                  <option key={t.id} value={t.id}>
                    {t.name}
                  </option>
                ))}
              </select>
              <Button variant="secondary" disabled={!target || busy} onClick={() => onMove(Number(target))}>
                Move<span className="sr-only"> {student.displayName}</span>
              </Button>
            </>
          ) : null}
          <Button variant="ghost" disabled={busy} onClick={onRemove}>
            Remove<span className="sr-only"> {student.displayName}</span>
          </Button>
        </div>
      )}
    </li>
  );
}
