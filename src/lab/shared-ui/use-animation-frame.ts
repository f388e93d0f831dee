import { useEffect, useRef } from "react";

/**
 * Calls `onFrame(dtS)` on every animation frame while `running`, with the real time since the last
 * frame in seconds (capped at `maxDtS` so a background tab does not produce one giant step).
 * The callback may change between renders; the loop always calls the latest one.
 */
export function useAnimationFrame(running: boolean, onFrame: (dtS: number) => void, maxDtS = 0.1): void {
  const callback = useRef(onFrame);
  callback.current = onFrame;
  useEffect(() => {
    if (!running) return;
    let handle = 0;
    let last = performance.now();
    const loop = (now: number) => {
      const dt = Math.min(maxDtS, Math.max(0, (now - last) / 1000));
      last = now;
      callback.current(dt);
      handle = requestAnimationFrame(loop);
    };
    handle = requestAnimationFrame(loop);
    return () => cancelAnimationFrame(handle);
  }, [running, maxDtS]);
}
