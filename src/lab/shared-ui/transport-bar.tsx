import { useId } from "react";

export interface TransportBarProps {
  playing: boolean;
  onPlayPause: () => void;
  onStep: () => void;
  onReset: () => void;
  /** Current speed and the allowed speeds (model units per real second). */
  speed: number;
  speeds: readonly number[];
  onSpeed: (speed: number) => void;
  /** How a speed reads, e.g. (s) => `${s} model s per s`. */
  formatSpeed: (speed: number) => string;
  /** Disable the controls, e.g. while the model is being built. */
  disabled?: boolean;
}

const buttonClass =
  "inline-flex min-h-10 items-center gap-1.5 rounded-sm border border-soot-500/60 bg-white px-3 text-sm font-semibold text-soot-900 hover:border-soot-900 disabled:opacity-50";

/** Play / pause, single step, reset and a speed choice for any time-stepped simulation. */
export function TransportBar({ playing, onPlayPause, onStep, onReset, speed, speeds, onSpeed, formatSpeed, disabled }: TransportBarProps) {
  const speedId = useId();
  return (
    <div className="flex flex-wrap items-end gap-2" role="group" aria-label="Simulation time controls">
      <button type="button" className={buttonClass} onClick={onPlayPause} disabled={disabled} aria-pressed={playing}>
        <span aria-hidden="true" className="font-mono">{playing ? "❚❚" : "▶"}</span>
        {playing ? "Pause" : "Play"}
      </button>
      <button type="button" className={buttonClass} onClick={onStep} disabled={disabled || playing}>
        <span aria-hidden="true" className="font-mono">▶❘</span>
        Step
      </button>
      <button type="button" className={buttonClass} onClick={onReset} disabled={disabled}>
        <span aria-hidden="true" className="font-mono">↺</span>
        Reset
      </button>
      <div className="flex basis-full items-center gap-2">
        <label htmlFor={speedId} className="text-sm font-semibold text-soot-800">
          Speed
        </label>
        <select
          id={speedId}
          value={speed}
          onChange={(e) => onSpeed(Number(e.target.value))}
          className="min-h-10 grow rounded-sm border border-soot-500/60 bg-white px-2 text-sm"
        >
          {speeds.map((s) => (
            <option key={s} value={s}>
              {formatSpeed(s)}
            </option>
          ))}
        </select>
      </div>
    </div>
  );
}
