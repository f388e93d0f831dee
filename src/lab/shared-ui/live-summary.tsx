import { useEffect, useRef, useState } from "react";

export interface LiveSummaryProps {
  /** The full, current description; it may change every frame. */
  text: string;
  /** Minimum time between updates of the announced text (default 1500 ms), so screen readers are not flooded. */
  throttleMs?: number;
  label?: string;
  id?: string;
}

/**
 * The text summary of a canvas, in a polite ARIA live region. The text shown and announced is throttled:
 * the latest description appears at most every `throttleMs` (and at once after a pause in changes).
 */
export function LiveSummary({ text, throttleMs = 1500, label = "What the simulation shows now", id }: LiveSummaryProps) {
  const [shown, setShown] = useState(text);
  const last = useRef(0);
  const latest = useRef(text);
  latest.current = text;

  useEffect(() => {
    if (text === shown) return;
    const wait = Math.max(0, last.current + throttleMs - Date.now());
    const timer = window.setTimeout(() => {
      last.current = Date.now();
      setShown(latest.current);
    }, wait);
    return () => window.clearTimeout(timer);
  }, [text, shown, throttleMs]);

  return (
    <div className="rounded-md border border-bone-300 bg-bone-100 px-3 py-2">
      <p className="eyebrow text-[0.65rem] text-soot-600">{label}</p>
      <p id={id} role="status" aria-live="polite" aria-atomic="true" className="mt-1 text-sm leading-relaxed text-soot-900" data-testid="live-summary">
        {shown}
      </p>
    </div>
  );
}
