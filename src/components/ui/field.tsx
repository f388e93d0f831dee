import { forwardRef, useId, type InputHTMLAttributes } from "react";
import { cx } from "./cx";

interface TextFieldProps extends InputHTMLAttributes<HTMLInputElement> {
  label: string;
  error?: string;
  hint?: string;
}

/** A labelled input whose error and hint are tied to it with aria-describedby. */
export const TextField = forwardRef<HTMLInputElement, TextFieldProps>(function TextField(
  { label, error, hint, className, id, ...rest },
  ref,
) {
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;

  return (
    <div className={className}>
      <label htmlFor={inputId} className="block text-sm font-semibold text-soot-800">
        {label}
      </label>
      {hint ? (
        <p id={hintId} className="mt-0.5 text-xs text-soot-600">
          {hint}
        </p>
      ) : null}
      <input
        ref={ref}
        id={inputId}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={cx(
          "mt-1.5 block min-h-11 w-full rounded-md border bg-white px-3 text-base text-soot-900 shadow-[inset_0_1px_2px_rgb(26_23_20/0.06)]",
          "placeholder:text-soot-500 focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300",
          error ? "border-danger-700" : "border-soot-500/60",
        )}
        {...rest}
      />
      {error ? (
        <p id={errorId} className="mt-1.5 text-sm font-medium text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
});
