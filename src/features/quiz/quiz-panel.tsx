/**
 * The quiz at the end of a lesson: the questions of the open attempt, or the latest
 * result (which is what a reload shows), the attempts left, and the history.
 */
import { useEffect, useRef, useState } from "react";
import type { AttemptResult } from "@shared/api/quizzes";
import { useQuiz, useQuizAttempts, useStartNextAttempt } from "@/api/quizzes";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Spinner } from "@/components/ui/spinner";
import { AttemptHistory } from "./attempt-history";
import { QuizForm } from "./quiz-form";
import { ResultView } from "./result-view";

export default function QuizPanel({ quizId }: { quizId: string }) {
  const view = useQuiz(quizId);
  const history = useQuizAttempts(quizId);
  const startNext = useStartNextAttempt(quizId);
  const [answering, setAnswering] = useState(false);
  const [fresh, setFresh] = useState<AttemptResult | null>(null);
  const resultHeading = useRef<HTMLHeadingElement>(null);

  useEffect(() => {
    if (fresh) resultHeading.current?.focus();
  }, [fresh]);

  if (view.isPending || history.isPending) return <Spinner label="Loading the quiz" />;
  if (view.isError || history.isError) {
    return <Alert tone="danger" title="The quiz could not be loaded">{(view.error ?? history.error)?.message}</Alert>;
  }

  const { quiz, attempts } = view.data;
  const latest = fresh ?? history.data.attempts[0] ?? null;
  const canTryAgain = attempts.remaining === null || attempts.remaining > 0;
  const showForm = answering || !latest;

  return (
    <section className="quiz-panel rounded-xl border border-soot-700 bg-bone-100 shadow-card" aria-labelledby={`${quizId}-title`}>
      <div className="graticule rounded-t-xl bg-soot-800 px-5 py-4 text-bone-50">
        <p className="eyebrow text-ember-300">Quiz · graded on the server</p>
        <h3 id={`${quizId}-title`} className="mt-1 font-display text-xl font-semibold">
          {quiz.title}
        </h3>
        <p id={`${quizId}-allowance`} className="mt-1 text-sm text-ash-200">
          {view.data.questions.length} questions · pass mark {Math.round(quiz.passFraction * 100)} % ·{" "}
          {attempts.limit === null
            ? `${attempts.used} attempt${attempts.used === 1 ? "" : "s"} so far, no limit`
            : `${attempts.used} of ${attempts.limit} attempts used`}
        </p>
      </div>
      <div className="p-4 sm:p-5">
        {showForm ? (
          attempts.remaining === 0 ? (
            <Alert tone="info" title="No attempts left">Your instructor set a limit of {attempts.limit} attempts for this quiz.</Alert>
          ) : (
            <QuizForm
              key={view.data.drawId}
              view={view.data}
              onSubmitted={(attempt) => {
                setFresh(attempt);
                setAnswering(false);
              }}
            />
          )
        ) : (
          <>
            <div aria-live="polite">
              <ResultView ref={resultHeading} attempt={latest} passFraction={quiz.passFraction} />
            </div>
            <div className="mt-6 flex flex-wrap items-center gap-3">
              {canTryAgain ? (
                <Button
                  variant="secondary"
                  onClick={() => {
                    setFresh(null);
                    setAnswering(true);
                    void startNext();
                  }}
                >
                  Take the quiz again{view.data.questions.some((q) => q.kind === "numeric") ? " (new numbers)" : ""}
                </Button>
              ) : (
                <p className="text-sm text-soot-700">You have used all {attempts.limit} attempts at this quiz.</p>
              )}
            </div>
          </>
        )}
        <AttemptHistory attempts={history.data.attempts} passFraction={quiz.passFraction} />
      </div>
    </section>
  );
}
