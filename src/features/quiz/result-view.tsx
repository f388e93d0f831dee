import { forwardRef } from "react";
import type { AttemptResult, QuestionResult } from "@shared/api/quizzes";
import { cx } from "@/components/ui/cx";
import { InlineMarkdown } from "./inline-markdown";

interface ResultViewProps {
  attempt: AttemptResult;
  passFraction: number;
  /** Heading level of the score line (the quiz sits under a lesson's h2). */
  headingLevel?: 3 | 4;
}

export function formatWhen(iso: string): string {
  return new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeStyle: "short" }).format(new Date(iso));
}

/** A graded attempt: score, pass or not, and for every question what was right, what was wrong and why. */
export const ResultView = forwardRef<HTMLHeadingElement, ResultViewProps>(function ResultView({ attempt, passFraction, headingLevel = 3 }, ref) {
  const Heading = headingLevel === 3 ? "h3" : "h4";
  const wrong = attempt.results.filter((r) => !r.correct).length;
  const promptOf = new Map(attempt.questions.map((q) => [q.id, q.prompt]));
  return (
    <div className="space-y-6" data-testid="quiz-result">
      <div className={cx("rounded-lg border-2 p-5", attempt.passed ? "border-success-700/50 bg-success-100" : "border-ember-600/50 bg-[#fff4e8]")}>
        <Heading ref={ref} tabIndex={-1} className="font-display text-2xl font-semibold text-soot-950 outline-none">
          Score {attempt.score} of {attempt.maxScore}
          <span className={cx("ml-3 inline-block rounded-full px-3 py-0.5 align-middle font-sans text-sm font-semibold", attempt.passed ? "bg-success-700 text-white" : "bg-ember-700 text-white")}>
            {attempt.passed ? "Passed" : "Not passed yet"}
          </span>
        </Heading>
        <p className="mt-2 text-sm text-soot-800">
          {wrong === 0 ? "Every answer was right." : `${wrong} answer${wrong === 1 ? " was" : "s were"} wrong; see why below.`} Pass mark {Math.round(passFraction * 100)} %. Submitted{" "}
          {formatWhen(attempt.createdAt)}.
        </p>
      </div>
      <ol className="space-y-4">
        {attempt.results.map((result, i) => (
          <li key={result.questionId}>
            <ResultItem number={i + 1} prompt={promptOf.get(result.questionId) ?? ""} result={result} />
          </li>
        ))}
      </ol>
    </div>
  );
});

function ResultItem({ number, prompt, result }: { number: number; prompt: string; result: QuestionResult }) {
  return (
    <article className={cx("rounded-lg border bg-white p-4 shadow-card", result.correct ? "border-l-4 border-bone-300 border-l-success-700" : "border-l-4 border-bone-300 border-l-danger-700")}>
      <div className="flex items-center justify-between gap-3">
        <span className="font-mono text-xs font-semibold uppercase tracking-[0.12em] text-ember-700">Question {number}</span>
        <span className={cx("shrink-0 rounded-full px-2.5 py-0.5 text-xs font-bold", result.correct ? "bg-success-100 text-success-700" : "bg-danger-100 text-danger-700")}>
          {result.correct ? "✓ Right" : "✗ Wrong"}
          <span className="sr-only">, {result.pointsAwarded} of {result.points} points</span>
        </span>
      </div>
      <p className="mt-1.5 font-semibold leading-relaxed text-soot-950">
        <InlineMarkdown text={prompt} />
      </p>
      <dl className="mt-3 grid gap-x-4 gap-y-1.5 text-sm sm:grid-cols-[9rem_minmax(0,1fr)]">
        <dt className="text-soot-600">Your answer</dt>
        <dd className={cx("font-medium", result.correct ? "text-success-700" : "text-danger-700")}>
          <InlineMarkdown text={result.given} />
        </dd>
        {!result.correct ? (
          <>
            <dt className="text-soot-600">Right answer</dt>
            <dd className="font-medium text-soot-900">
              <InlineMarkdown text={result.correctAnswer} />
            </dd>
          </>
        ) : null}
        {result.feedback ? (
          <>
            <dt className="text-soot-600">What went wrong</dt>
            <dd className="text-soot-900">{result.feedback}</dd>
          </>
        ) : null}
        {result.working ? (
          <>
            <dt className="text-soot-600">{/^[\w\s()*/+\-.^,=]+$/.test(result.working) ? "Working" : "Computed"}</dt>
            <dd className="break-words font-mono text-xs leading-relaxed text-soot-800">{result.working}</dd>
          </>
        ) : null}
      </dl>
      <p className="mt-3 border-t border-bone-200 pt-3 text-sm leading-relaxed text-soot-800">
        <span className="font-semibold text-soot-950">Why: </span>
        <InlineMarkdown text={result.explanation} />
      </p>
    </article>
  );
}
