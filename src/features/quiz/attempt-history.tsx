import { useState } from "react";
import type { AttemptResult } from "@shared/api/quizzes";
import { formatWhen, ResultView } from "./result-view";

/** Every attempt at this quiz, newest first; any one can be opened to see its answers again. */
export function AttemptHistory({ attempts, passFraction }: { attempts: AttemptResult[]; passFraction: number }) {
  const [open, setOpen] = useState<number | null>(null);
  if (attempts.length === 0) return null;
  const shown = attempts.find((a) => a.id === open);
  return (
    <section aria-label="Your attempts" className="mt-8">
      <h4 className="eyebrow text-soot-600">Your attempts</h4>
      <div className="mt-3 overflow-x-auto rounded-md border border-bone-300 bg-white" role="region" aria-label="Attempts table" tabIndex={0}>
        <table className="w-full text-left text-sm">
          <thead className="bg-bone-100 font-mono text-xs uppercase tracking-[0.06em] text-soot-700">
            <tr>
              <th scope="col" className="px-3 py-2">#</th>
              <th scope="col" className="px-3 py-2">Submitted</th>
              <th scope="col" className="px-3 py-2">Score</th>
              <th scope="col" className="px-3 py-2">Result</th>
              <th scope="col" className="px-3 py-2"><span className="sr-only">Details</span></th>
            </tr>
          </thead>
          <tbody>
            {attempts.map((attempt, i) => (
              <tr key={attempt.id} className="border-t border-bone-200">
                <td className="px-3 py-2 font-mono">{attempts.length - i}</td>
                <td className="px-3 py-2">{formatWhen(attempt.createdAt)}</td>
                <td className="px-3 py-2 font-mono">
                  {attempt.score} / {attempt.maxScore}
                </td>
                <td className="px-3 py-2">{attempt.passed ? "Passed" : "Not passed"}</td>
                <td className="px-3 py-2 text-right">
                  <button
                    type="button"
                    className="font-semibold text-quench-700 underline underline-offset-4"
                    aria-expanded={open === attempt.id}
                    onClick={() => setOpen(open === attempt.id ? null : attempt.id)}
                  >
                    {open === attempt.id ? "Hide" : "Review"}
                    <span className="sr-only"> attempt {attempts.length - i}</span>
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {shown ? (
        <div className="mt-4">
          <ResultView attempt={shown} passFraction={passFraction} headingLevel={4} />
        </div>
      ) : null}
    </section>
  );
}
