/** Labelled select and textarea for react-hook-form, styled like components/ui/field (TextField). */
import { forwardRef, useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes, type TextareaHTMLAttributes } from "react";
import { cx } from "@/components/ui/cx";

const control = (error?: string) =>
  cx(
    "mt-1.5 block w-full rounded-md border bg-white px-3 text-base text-soot-900 shadow-[inset_0_1px_2px_rgb(26_23_20/0.06)]",
    "focus:border-quench-500 focus:outline-3 focus:outline-offset-0 focus:outline-quench-300",
    error ? "border-danger-700" : "border-soot-500/60",
  );

function Described({ id, label, hint, error, children, className }: { id: string; label: string; hint?: ReactNode; error?: string; children: ReactNode; className?: string }) {
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-sm font-semibold text-soot-800">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="mt-0.5 text-xs text-soot-600">
          {hint}
        </p>
      ) : null}
      {children}
      {error ? (
        <p id={`${id}-error`} className="mt-1.5 text-sm font-medium text-danger-700">
          {error}
        </p>
      ) : null}
    </div>
  );
}

const describedBy = (id: string, hint: unknown, error: unknown) => [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;

interface SelectProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

export const SelectField = forwardRef<HTMLSelectElement, SelectProps>(function SelectField({ label, hint, error, className, id, children, ...rest }, ref) {
  const auto = useId();
  const selectId = id ?? auto;
  return (
    <Described id={selectId} label={label} hint={hint} error={error} className={className}>
      <select ref={ref} id={selectId} aria-invalid={error ? true : undefined} aria-describedby={describedBy(selectId, hint, error)} className={cx(control(error), "min-h-11")} {...rest}>
        {children}
      </select>
    </Described>
  );
});

interface TextAreaProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  hint?: ReactNode;
  error?: string;
}

export const TextAreaField = forwardRef<HTMLTextAreaElement, TextAreaProps>(function TextAreaField({ label, hint, error, className, id, ...rest }, ref) {
  const auto = useId();
  const areaId = id ?? auto;
  return (
    <Described id={areaId} label={label} hint={hint} error={error} className={className}>
      <textarea ref={ref} id={areaId} aria-invalid={error ? true : undefined} aria-describedby={describedBy(areaId, hint, error)} className={cx(control(error), "min-h-32 py-2 leading-relaxed")} {...rest} />
    </Described>
  );
});

/** A number input with its unit shown after it (the unit is also in the label for screen readers). */
export const NumberField = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement> & { label: string; unit?: string; hint?: ReactNode; error?: string }>(function NumberField(
  { label, unit, hint, error, className, id, ...rest },
  ref,
) {
  const auto = useId();
  const inputId = id ?? auto;
  return (
    <Described id={inputId} label={label} hint={hint} error={error} className={className}>
      <div className="relative">
        <input
          ref={ref}
          id={inputId}
          type="number"
          inputMode="decimal"
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(inputId, hint, error)}
          className={cx(control(error), "min-h-11 font-mono tabular-nums", unit ? "pr-16" : "")}
          {...rest}
        />
        {unit ? (
          <span aria-hidden="true" className="pointer-events-none absolute inset-y-0 right-3 top-1.5 flex items-center text-sm text-soot-600">
            {unit}
          </span>
        ) : null}
      </div>
    </Described>
  );
});
