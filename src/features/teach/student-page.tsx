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
import { formatDateTime, percent, plural } from "./format";
import { teachPaths } from "./paths";
import { Badge, Loaded, Panel } from "./ui";

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
          {(data) =>
            data.quizzes.length === 0 ? (
              <p className="text-soot-700">No quizzes are assigned to this cohort yet.</p>
            ) : (
              data.quizzes.map((quiz) => (
                <Panel
                  key={quiz.quizId}
                  id={`quiz-${quiz.quizId}`}
                  title={quiz.title}
                  description={`${quiz.moduleTitle} · ${quiz.attempts.length ? plural(quiz.attempts.length, "attempt") + ", newest first" : "not attempted yet"}`}
                >
                  {quiz.attempts.length === 0 ? (
                    <p className="text-sm text-soot-700">No attempts yet.</p>
                  ) : (
                    <ol className="space-y-6">
                      {quiz.attempts.map((attempt, i) => (
                        <Attempt key={attempt.id} attempt={attempt} number={quiz.attempts.length - i} />
                      ))}
                    </ol>
                  )}
                </Panel>
              ))
            )
          }
        </Loaded>
      </PageBody>
    </>
  );
}

function Attempt({ attempt, number }: { attempt: AttemptResult; number: number }) {
  const prompts = new Map(attempt.questions.map((q) => [q.id, q.prompt]));
  return (
    <li>
      <h3 className="flex flex-wrap items-center gap-2 text-base font-semibold">
        Attempt {number}
        <span className="font-mono text-sm font-normal text-soot-700">
          {attempt.score} / {attempt.maxScore} ({percent(attempt.maxScore ? attempt.score / attempt.maxScore : 0)})
        </span>
        <Badge tone={attempt.passed ? "success" : "ember"}>{attempt.passed ? "Passed" : "Not passed"}</Badge>
        <span className="text-xs font-normal text-soot-600">{formatDateTime(attempt.createdAt)}</span>
      </h3>
      <div className="mt-2 overflow-x-auto">
        <table className="w-full min-w-[36rem] text-left text-sm">
          <caption className="sr-only">Answers in attempt {number}</caption>
          <thead className="text-soot-700">
            <tr className="border-b border-bone-300">
              <th scope="col" className="py-2 pr-3 font-semibold">
                Question
              </th>
              <th scope="col" className="py-2 pr-3 font-semibold">
                Answer given
              </th>
              <th scope="col" className="py-2 pr-3 font-semibold">
                Correct answer
              </th>
              <th scope="col" className="py-2 font-semibold">
                Marks
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-bone-200">
            {attempt.results.map((r) => (
              <tr key={r.questionId} className={cx("align-top", !r.correct && "bg-danger-100/40")}>
                <td className="max-w-sm py-2 pr-3 text-soot-800">{prompts.get(r.questionId) ?? r.questionId}</td>
                <td className="py-2 pr-3">
                  <span className={cx("font-medium", r.correct ? "text-success-700" : "text-danger-700")}>
                    <span aria-hidden="true">{r.correct ? "✓ " : "✗ "}</span>
                    <span className="sr-only">{r.correct ? "Right: " : "Wrong: "}</span>
                    {r.given}
                  </span>
                  {!r.correct && r.feedback ? <span className="mt-0.5 block text-xs text-soot-700">{r.feedback}</span> : null}
                </td>
                <td className="py-2 pr-3 text-soot-800">{r.correctAnswer}</td>
                <td className="py-2 font-mono text-xs tabular-nums">
                  {r.pointsAwarded}/{r.points}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </li>
  );
}
