/**
 * Optional performance marks for the frame-time benchmark (bench/frames-sims-1.ts). They are recorded
 * only when the page sets `window.__simBench = true`, so normal use never fills the performance buffer.
 */
declare global {
  interface Window {
    __simBench?: boolean;
  }
}

export function benchEnabled(): boolean {
  return typeof window !== "undefined" && window.__simBench === true;
}

/** Runs `fn` between two marks and records a measure named `name` when benchmarking. */
export function measured<T>(name: string, fn: () => T): T {
  if (!benchEnabled()) return fn();
  const start = performance.now();
  const result = fn();
  performance.measure(name, { start, end: performance.now() });
  return result;
}
