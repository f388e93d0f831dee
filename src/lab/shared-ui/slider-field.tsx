import { useEffect, useId, useState } from "react";

export interface SliderFieldProps {
  label: string;
  value: number;
  min: number;
  max: number;
  step: number;
  /** Unit shown after the number and read out with the value, e.g. "%" or "°C". */
  unit?: string;
  /** Decimals shown in the number box (default: from `step`). */
  decimals?: number;
  hint?: string;
  onChange: (value: number) => void;
  disabled?: boolean;
}

/**
 * A labelled range slider with a linked number box: drag for a feel, type for an exact value.
 * The number box commits on blur or Enter and clamps to [min, max].
 */
export function SliderField({ label, value, min, max, step, unit, decimals, hint, onChange, disabled }: SliderFieldProps) {
  const id = useId();
  const places = decimals ?? Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const [draft, setDraft] = useState(value.toFixed(places));
  useEffect(() => setDraft(value.toFixed(places)), [value, places]);

  const commit = (text: string) => {
    const parsed = Number(text.replace(",", "."));
    if (!Number.isFinite(parsed)) { setDraft(value.toFixed(places)); return; }
    const clamped = Math.min(max, Math.max(min, Math.round(parsed / step) * step));
    setDraft(clamped.toFixed(places));
    if (clamped !== value) onChange(Number(clamped.toFixed(places)));
  };

  return (
    <div className="grid grid-cols-[1fr_auto] items-center gap-x-3 gap-y-1">
      <label htmlFor={`${id}-range`} className="text-sm font-semibold text-soot-800">
        {label}
      </label>
      <span className="flex items-center gap-1">
        <input
          type="text"
          inputMode="decimal"
          aria-label={`${label}, exact value${unit ? ` in ${unit}` : ""}`}
          value={draft}
          disabled={disabled}
          onChange={(e) => setDraft(e.target.value)}
          onBlur={(e) => commit(e.target.value)}
          onKeyDown={(e) => { if (e.key === "Enter") commit((e.target as HTMLInputElement).value); }}
          className="min-h-9 w-20 rounded-sm border border-soot-500/60 bg-white px-2 text-right font-mono text-sm tabular-nums text-soot-900 focus:border-quench-500"
        />
        {unit ? <span className="w-6 text-sm text-soot-600">{unit}</span> : null}
      </span>
      <input
        id={`${id}-range`}
        type="range"
        min={min}
        max={max}
        step={step}
        value={value}
        disabled={disabled}
        aria-valuetext={`${value.toFixed(places)}${unit ? ` ${unit}` : ""}`}
        aria-describedby={hint ? `${id}-hint` : undefined}
        onChange={(e) => onChange(Number(e.target.value))}
        className="col-span-2 h-6 w-full cursor-pointer accent-ember-600"
      />
      {hint ? (
        <p id={`${id}-hint`} className="col-span-2 text-xs text-soot-600">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
