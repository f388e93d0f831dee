import { useEffect, useState } from "react";
import { formatDuration } from "@shared/sim/alloy/format";
import { LiveSummary } from "@/lab/shared-ui/live-summary";

export type ReadoutUpdate = (summary: string, timeS: number) => void;

interface PlaybackReadoutProps {
  /** The parent's animation loop calls the function registered here (a few times a second). */
  register: (update: ReadoutUpdate | null) => void;
  totalTimeS: number | null;
  onSeek: (timeS: number) => void;
}

/**
 * The model-time slider and the live summary, with their own state: the animation updates them
 * through `register` without re-rendering the whole simulation (which would cost frames).
 */
export function PlaybackReadout({ register, totalTimeS, onSeek }: PlaybackReadoutProps) {
  const [summary, setSummary] = useState("Computing the ingot…");
  const [timeS, setTimeS] = useState(0);
  useEffect(() => {
    register((text, t) => {
      setSummary(text);
      setTimeS(t);
    });
    return () => register(null);
  }, [register]);

  return (
    <>
      {totalTimeS !== null ? (
        <label className="block text-sm">
          <span className="font-semibold text-soot-800">Model time: {formatDuration(timeS)}</span>
          <span className="text-soot-600"> of {formatDuration(totalTimeS)}</span>
          <input
            type="range"
            min={0}
            max={totalTimeS}
            step={totalTimeS / 400}
            value={Math.min(timeS, totalTimeS)}
            aria-valuetext={`${formatDuration(timeS)} after pouring`}
            onChange={(e) => onSeek(Number(e.target.value))}
            className="mt-1 block h-6 w-full cursor-pointer accent-ember-600"
          />
        </label>
      ) : null}
      <LiveSummary text={summary} />
    </>
  );
}
