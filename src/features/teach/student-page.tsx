/**
 * /teach/cohorts/:cohortId/students/:studentId: one student's attempts at the cohort's quizzes,
 * each with the answers given, the right answers and what was wrong.
 */
import { useParams } from "react-router";
import type { AttemptResult } from "@shared/api/quizzes";
import { useStudentAttempts } from "@/api/gradebook";
import { ButtonLink } from "@/components/ui/button";
import { cx } from "@/components/ui/cx";
import { PageBody, PageHeader } from "@/components/ui/page-header";
import { formatDateTime, percent, plural } from "@/lib/format";
import { teachPaths } from "./paths";
import { Badge } from "@/components/ui/badge";
import { Loaded } from "@/components/ui/loaded";
import { Panel } from "@/components/ui/panel";

export function Component() {
  const params = useParams();
  const cohortId = Number(params.cohortId);
  const studentId = Number(params.studentId);
  const query = useStudentAttempts(cohortId, studentId);
  const student = query.data?.student;

  return (
    <>
      <title>{`${student?.displayName ?? "Student"} — Grain & Edge`}</title>
      <PageHeader eyebrow={query.data ? `Student in ${query.data.cohort.name}` : "Student"} title={student?.displayName ?? "Student"} lede={student?.email}>
        <ButtonLink to={teachPaths.gradebook(cohortId)}>Back to the gradebook</ButtonLink>
      </PageHeader>
      <PageBody className="space-y-8">
        <Loaded query={query} label="student">
          {(data) => {
            const attempted = data.quizzes.filter((q) => q.attempts.length > 0);
            const untouched = data.quizzes.filter((q) => q.attempts.length === 0);
            if (data.quizzes.length === 0) return <p className="text-soot-700">No quizzes are assigned to this cohort yet.</p>;
            return (
              <>
                {attempted.map((quiz) => (
                  <Panel key={quiz.quizId} id={`quiz-${quiz.quizId}`} title={quiz.title} description={`${quiz.moduleTitle} · ${plural(quiz.attempts.length, "attempt")}, newest first`}>
                    <ol className="space-y-3">
                      {quiz.attempts.map((attempt, i) => (
                        <Attempt key={attempt.id} attempt={attempt} number={quiz.attempts.length - i} open={i === 0} />
                      ))}
                    </ol>
                  </Panel>
                ))}
                {untouched.length ? (
                  <Panel id="not-attempted" title="Not attempted yet" description={`${plural(untouched.length, "quiz", "quizzes")} of the assigned modules.`}>
                    <ul className="grid gap-2 sm:grid-cols-2">
                      {untouched.map((q) => (
                        <li key={q.quizId} className="text-sm">
                          <span className="font-medium text-soot-900">{q.title}</span>
                          <span className="block text-xs text-soot-600">{q.moduleTitle}</span>
                        </li>
                      ))}
                    </ul>
                  </Panel>
                ) : null}
              </>
            );
          }}
        </Loaded>
      </PageBody>
    </>
  );
}

function Attempt({ attempt, number, open }: { attempt: AttemptResult; number: number; open: boolean }) {
  const prompts = new Map(attempt.questions.map((q) => [q.id, q.prompt]));
  const wrong = attempt.results.filter((r) => !r.correct).length;
  return (
    <li>
      <details open={open} className="group rounded-md border border-bone-200">
        <summary className="flex cursor-pointer list-none flex-wrap items-center gap-x-3 gap-y-1 px-3 py-2.5 hover:bg-bone-50 [&::-webkit-details-marker]:hidden">
          <span aria-hidden="true" className="text-soot-500 transition-transform group-open:rotate-90">
            ›
          </span>
          <span className="font-display text-base font-semibold">Attempt {number}</span>
          <span className="font-mono text-sm text-soot-700">
            {attempt.score} / {attempt.maxScore} ({percent(attempt.maxScore ? attempt.score / attempt.maxScore : 0)})
          </span>
          <Badge tone={attempt.passed ? "success" : "ember"}>{attempt.passed ? "Passed" : "Not passed"}</Badge>
          <span className="text-xs text-soot-600">
            {formatDateTime(attempt.createdAt)} · {wrong === 0 ? "all right" : `${wrong} wrong`}
          </span>
        </summary>
        <ol className="divide-y divide-bone-200 border-t border-bone-200">
          {attempt.results.map((r, i) => (
            <li key={r.questionId} className={cx("grid gap-x-6 gap-y-1.5 px-3 py-3 sm:grid-cols-[1fr_1fr_auto]", !r.correct && "bg-danger-100/35")}>
              <p className="text-sm text-soot-900 sm:col-span-2">
                <span className="mr-2 font-mono text-xs text-soot-600">Q{i + 1}</span>
                {prompts.get(r.questionId) ?? r.questionId}
              </p>
              <p className="font-mono text-xs tabular-nums text-soot-700 sm:row-span-3 sm:text-right">
                {r.pointsAwarded}/{r.points}
                <span className="sr-only"> marks</span>
              </p>
              <div className="text-sm">
                <span className="block text-2xs font-semibold uppercase tracking-wide text-soot-600">Answer given</span>
                <span className={cx("font-medium", r.correct ? "text-success-700" : "text-danger-700")}>
                  <span aria-hidden="true">{r.correct ? "✓ " : "✗ "}</span>
                  <span className="sr-only">{r.correct ? "Right: " : "Wrong: "}</span>
                  {r.given}
                </span>
                {!r.correct && r.feedback ? <span className="mt-0.5 block text-xs text-soot-700">{r.feedback}</span> : null}
              </div>
              {r.correct ? null : (
                <div className="text-sm">
                  <span className="block text-2xs font-semibold uppercase tracking-wide text-soot-600">Correct answer</span>
                  <span className="text-soot-800">{r.correctAnswer}</span>
                </div>
              )}
            </li>
          ))}
        </ol>
      </details>
    </li>
  );
}
