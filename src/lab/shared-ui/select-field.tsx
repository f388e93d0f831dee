import { useId } from "react";

export interface SelectFieldProps<T extends string> {
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  hint?: string;
}

/** A labelled native select: keyboard and screen-reader friendly without extra code. */
export function SelectField<T extends string>({ label, value, options, onChange, hint }: SelectFieldProps<T>) {
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="block text-sm font-semibold text-soot-800">
        {label}
      </label>
      {hint ? <p className="text-xs text-soot-600">{hint}</p> : null}
      <select
        id={id}
        value={value}
        onChange={(e) => onChange(e.target.value as T)}
        className="mt-1.5 block min-h-10 w-full rounded-sm border border-soot-500/60 bg-white px-2 text-sm text-soot-900 focus:border-quench-500"
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}
