import { useId } from "react";
import type { PublicMultipleQuestion, PublicNumericQuestion, PublicSimTaskQuestion, PublicSingleQuestion } from "@shared/api/quizzes";
import { unitLabel } from "@shared/api/quizzes";
import { SimulationFrame } from "@/components/mdx/simulation";
import { cx } from "@/components/ui/cx";
import type { DraftAnswer } from "./draft";
import { InlineMarkdown } from "./inline-markdown";

const optionClass =
  "flex cursor-pointer items-start gap-3 rounded-sm border border-bone-300 bg-bone-50 px-3 py-2.5 text-[0.95rem] leading-snug hover:border-quench-500 has-[:checked]:border-quench-600 has-[:checked]:bg-quench-100";

interface FieldProps<Q, A extends DraftAnswer["kind"]> {
  question: Q;
  number: number;
  answer: Extract<DraftAnswer, { kind: A }>;
  onChange: (answer: Extract<DraftAnswer, { kind: A }>) => void;
  disabled?: boolean;
  error?: string;
}

function Prompt({ id, number, prompt, hint }: { id: string; number: number; prompt: string; hint?: string }) {
  return (
    <legend id={id} className="w-full text-[1.02rem] font-semibold leading-relaxed text-soot-950">
      <span className="mr-2 font-mono text-sm text-ember-700">Q{number}</span>
      <InlineMarkdown text={prompt} />
      {hint ? <span className="mt-1 block text-sm font-normal text-soot-600">{hint}</span> : null}
    </legend>
  );
}

export function SingleField({ question, number, answer, onChange, disabled }: FieldProps<PublicSingleQuestion, "single">) {
  const name = useId();
  return (
    <fieldset disabled={disabled} className="min-w-0">
      <Prompt id={`${name}-p`} number={number} prompt={question.prompt} hint="Choose one." />
      <div className="mt-3 grid gap-2">
        {question.options.map((option) => (
          <label key={option.id} className={optionClass}>
            <input
              type="radio"
              name={name}
              value={option.id}
              checked={answer.choice === option.id}
              onChange={() => onChange({ kind: "single", choice: option.id })}
              className="mt-0.5 size-4 shrink-0 accent-quench-600"
            />
            <span>
              <InlineMarkdown text={option.text} />
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}

export function MultipleField({ question, number, answer, onChange, disabled }: FieldProps<PublicMultipleQuestion, "multiple">) {
  const name = useId();
  const toggle = (id: string, on: boolean) =>
    onChange({ kind: "multiple", choices: on ? [...answer.choices, id] : answer.choices.filter((c) => c !== id) });
  return (
    <fieldset disabled={disabled} className="min-w-0">
      <Prompt id={`${name}-p`} number={number} prompt={question.prompt} hint="Choose all that apply." />
      <div className="mt-3 grid gap-2">
        {question.options.map((option) => (
          <label key={option.id} className={optionClass}>
            <input
              type="checkbox"
              name={name}
              value={option.id}
              checked={answer.choices.includes(option.id)}
              onChange={(e) => toggle(option.id, e.target.checked)}
              className="mt-0.5 size-4 shrink-0 accent-quench-600"
            />
            <span>
              <InlineMarkdown text={option.text} />
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}

export function NumericField({ question, number, answer, onChange, disabled, error }: FieldProps<PublicNumericQuestion, "numeric">) {
  const id = useId();
  return (
    <fieldset disabled={disabled} className="min-w-0">
      <Prompt id={`${id}-p`} number={number} prompt={question.prompt} />
      <div className="mt-3 flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor={`${id}-value`} className="block text-sm font-semibold text-soot-800">
            Your answer
          </label>
          <input
            id={`${id}-value`}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            value={answer.text}
            onChange={(e) => onChange({ ...answer, text: e.target.value })}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-error` : undefined}
            className={cx(
              "mt-1 block min-h-11 w-44 rounded-md border bg-white px-3 font-mono text-base text-soot-900",
              "focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300",
              error ? "border-danger-700" : "border-soot-500/60",
            )}
          />
        </div>
        <div>
          <label htmlFor={`${id}-unit`} className="block text-sm font-semibold text-soot-800">
            Unit
          </label>
          <select
            id={`${id}-unit`}
            value={answer.unit}
            onChange={(e) => onChange({ ...answer, unit: e.target.value })}
            className="mt-1 block min-h-11 rounded-md border border-soot-500/60 bg-white px-3 text-base text-soot-900 focus:border-quench-500 focus:outline-3 focus:outline-quench-300"
          >
            {question.units.map((unit) => (
              <option key={unit} value={unit}>
                {unitLabel(unit)}
              </option>
            ))}
          </select>
        </div>
      </div>
      {error ? (
        <p id={`${id}-error`} className="mt-1.5 text-sm font-medium text-danger-700">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

export function SimTaskField({ question, number, answer, onChange, disabled }: FieldProps<PublicSimTaskQuestion, "sim-task">) {
  const id = useId();
  const reported = answer.params;
  return (
    <fieldset disabled={disabled} className="min-w-0">
      <Prompt id={`${id}-p`} number={number} prompt={question.prompt} hint="Set the simulation, then submit: its current settings are your answer." />
      <SimulationFrame id={question.simulation} initial={question.initial} onParamsChange={(params) => onChange({ kind: "sim-task", params })} headingLevel={4} />
      <p className="mt-2 text-sm text-soot-700" aria-live="polite">
        {reported ? (
          <>
            Your settings: <span className="font-mono text-xs">{summarise(reported)}</span>
          </>
        ) : (
          "Your answer will be the simulation's settings when you submit."
        )}
      </p>
    </fieldset>
  );
}

function summarise(params: Record<string, unknown>): string {
  return Object.entries(params)
    .filter(([, v]) => typeof v !== "object")
    .map(([k, v]) => `${k} ${String(v)}`)
    .join(", ");
}
