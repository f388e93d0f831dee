/**
 * Per-question analytics for one quiz: share of students whose latest attempt got each question
 * right (bar chart), and the most common wrong answers (a list, which also carries the chart's numbers).
 */
import { useId, useState } from "react";
import { Bar, BarChart, CartesianGrid, Cell, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { QuizAnalytics } from "@shared/api/gradebook";
import { cx } from "@/components/ui/cx";
import { CHART, TICK } from "./chart-style";
import { percent } from "@/lib/format";
import { selectClass } from "@/components/ui/form-classes";

/** Below this share the question is flagged: most of the cohort got it wrong. */
const WEAK = 0.5;

/** Columns of one question row when its container is wide: number, question, share correct, wrong answers. */
const ROW_GRID_WIDE = "gap-x-3 @2xl:grid-cols-[2.25rem_minmax(0,1.4fr)_4.5rem_minmax(0,1fr)]";

/** The prompt as authors wrote it; drawn numbers ({name}) become "…". */
const plainPrompt = (p: string) => p.replace(/\{[A-Za-z]\w*\}/g, "…").replace(/[*_`$]/g, "");

export function QuestionAnalytics({ quizzes }: { quizzes: QuizAnalytics[] }) {
  const [quizId, setQuizId] = useState(quizzes[0]?.quizId ?? "");
  const selectId = useId();
  const quiz = quizzes.find((q) => q.quizId === quizId) ?? quizzes[0];
  if (!quiz) return <p className="text-sm text-soot-700">No quizzes in the assigned modules yet.</p>;

  const data = quiz.questions.map((q, i) => ({ label: `Q${i + 1}`, share: q.correctShare === null ? 0 : Math.round(q.correctShare * 100), answered: q.answered, weak: q.correctShare !== null && q.correctShare < WEAK }));
  const weakest = [...quiz.questions].filter((q) => q.correctShare !== null).sort((a, b) => (a.correctShare ?? 0) - (b.correctShare ?? 0))[0];

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-4">
        <div className="w-full min-w-0 sm:w-auto">
          <label htmlFor={selectId} className="block text-sm font-semibold text-soot-800">
            Quiz
          </label>
          <select id={selectId} className={`${selectClass} mt-1.5 w-full sm:w-auto sm:max-w-md`} value={quiz.quizId} onChange={(e) => setQuizId(e.target.value)}>
            {quizzes.map((q) => (
              <option key={q.quizId} value={q.quizId}>
                {q.title}
              </option>
            ))}
          </select>
        </div>
        <p className="pb-2 text-sm text-soot-700">
          {quiz.studentsAttempted} {quiz.studentsAttempted === 1 ? "student has" : "students have"} attempted it; figures use each student's latest attempt.
        </p>
      </div>

      {quiz.studentsAttempted === 0 ? (
        <p className="text-sm text-soot-700">Nobody has attempted this quiz yet.</p>
      ) : (
        <figure className="rounded-md border border-bone-200 p-3">
          <figcaption className="text-sm font-semibold text-soot-900">Share correct, question by question</figcaption>
          <p className="text-xs text-soot-600">
            {weakest ? `Hardest: Q${quiz.questions.indexOf(weakest) + 1}, ${percent(weakest.correctShare)} correct. ` : ""}Bars below {percent(WEAK)} are in ember. The
            same numbers are in the list below.
          </p>
          <div className="mt-2" style={{ height: Math.max(140, data.length * 34 + 40) }} aria-hidden="true">
            <ResponsiveContainer width="100%" height="100%">
              <BarChart accessibilityLayer={false} data={data} layout="vertical" margin={{ top: 4, right: 24, bottom: 4, left: 0 }}>
                <CartesianGrid stroke={CHART.grid} horizontal={false} />
                <XAxis type="number" domain={[0, 100]} ticks={[0, 25, 50, 75, 100]} tickFormatter={(v: number) => `${v} %`} tick={TICK} />
                <YAxis type="category" dataKey="label" width={36} tick={TICK} />
                <Tooltip formatter={(v) => [`${String(v)} %`, "correct"]} cursor={{ fill: "rgba(216,204,184,0.35)" }} />
                <Bar dataKey="share" radius={[0, 3, 3, 0]} isAnimationActive={false}>
                  {data.map((d) => (
                    <Cell key={d.label} fill={d.weak ? CHART.ember : CHART.quench} />
                  ))}
                </Bar>
              </BarChart>
            </ResponsiveContainer>
          </div>
        </figure>
      )}

      {/* A list, not a table: at phone width (and in the half-width panel) a four-column table
          pushed the wrong answers past the panel's edge. Narrow: the wrong answers stack under the
          question; wide (container ≥ 42rem): they take a column, under a visual header row. */}
      <div className="@container">
        <div aria-hidden="true" className={cx("hidden border-b border-bone-300 py-2 text-sm font-semibold text-soot-700 @2xl:grid", ROW_GRID_WIDE)}>
          <span>#</span>
          <span>Question</span>
          <span className="text-right">Correct</span>
          <span>Most common wrong answers</span>
        </div>
        <ol aria-label={`Questions of ${quiz.title}: share correct and the most common wrong answers`} className="divide-y divide-bone-200">
          {quiz.questions.map((q, i) => (
            <li key={q.questionId} className={cx("grid grid-cols-[2.25rem_minmax(0,1fr)_auto] gap-x-3 gap-y-1.5 py-2.5 text-sm", ROW_GRID_WIDE)}>
              <span className="pt-0.5 font-mono text-xs text-soot-600">Q{i + 1}</span>
              <p className="text-soot-800">{plainPrompt(q.prompt)}</p>
              <p className={cx("text-right font-mono tabular-nums", q.correctShare !== null && q.correctShare < WEAK ? "font-semibold text-ember-700" : "text-soot-900")}>
                {percent(q.correctShare)}
                <span className="block text-2xs font-normal whitespace-nowrap text-soot-600">
                  {q.correct}/{q.answered} right
                </span>
              </p>
              <div className="col-span-2 col-start-2 min-w-0 @2xl:col-span-1 @2xl:col-start-auto">
                <p className="eyebrow text-2xs text-soot-600 @2xl:sr-only">Most common wrong answers</p>
                {q.commonWrong.length === 0 ? (
                  <p className="text-soot-600">
                    —<span className="sr-only">none</span>
                  </p>
                ) : (
                  <ul className="mt-0.5 space-y-0.5 @2xl:mt-0">
                    {q.commonWrong.map((w) => (
                      <li key={w.answer} className="break-words text-soot-800">
                        <span className="font-mono text-xs text-ember-700">{w.count}×</span> {w.answer}
                      </li>
                    ))}
                  </ul>
                )}
              </div>
            </li>
          ))}
        </ol>
      </div>
    </div>
  );
}
