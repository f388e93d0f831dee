import { useId } from "react";
import { cx } from "@/components/ui/cx";

export interface Choice<T extends string | number> {
  value: T;
  label: string;
}

export interface ChoiceFieldProps<T extends string | number> {
  legend: string;
  value: T;
  choices: readonly Choice<T>[];
  onChange: (value: T) => void;
  hint?: string;
  /** Lay the options in a row of segments (default) or a column. */
  layout?: "row" | "column";
}

/** A radio group drawn as segmented buttons: one visible choice, arrow keys move between options. */
export function ChoiceField<T extends string | number>({ legend, value, choices, onChange, hint, layout = "row" }: ChoiceFieldProps<T>) {
  const name = useId();
  return (
    <fieldset className="min-w-0">
      <legend className="text-sm font-semibold text-soot-800">{legend}</legend>
      {hint ? <p className="text-xs text-soot-600">{hint}</p> : null}
      <div className={cx("mt-1.5 flex gap-1", layout === "column" ? "flex-col" : "flex-wrap")}>
        {choices.map((choice) => {
          const checked = choice.value === value;
          return (
            <label
              key={String(choice.value)}
              className={cx(
                "relative flex min-h-9 cursor-pointer items-center gap-1.5 rounded-sm border px-2.5 text-sm",
                "has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-1 has-[:focus-visible]:outline-quench-500",
                checked ? "border-soot-900 bg-soot-900 text-bone-50" : "border-soot-500/50 bg-white text-soot-800 hover:border-soot-700",
              )}
            >
              <input
                type="radio"
                name={name}
                value={String(choice.value)}
                checked={checked}
                onChange={() => onChange(choice.value)}
                className="sr-only"
              />
              {/* A tick, so the choice is not shown by colour alone. */}
              <span aria-hidden="true" className={cx("font-mono text-xs", checked ? "text-ember-300" : "text-transparent")}>
                ✓
              </span>
              {choice.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}
