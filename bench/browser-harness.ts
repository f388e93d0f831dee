/**
 * What the browser frame benchmarks (frames-sims-1.ts, frames-sims-2.ts) share: statistics, a
 * bench page with the simulations' timing hooks switched on, a frame recorder, and the merge of
 * their figures into bench/results.json under `browser`.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import type { Browser, Page } from "playwright-core";
import { RESULTS_FILE } from "./merge-results";

export const MEASURE_MS = Number(process.env.BENCH_MEASURE_MS ?? 8000);

export interface Stats {
  medianMs: number;
  p90Ms: number;
  meanMs: number;
  samples: number;
}

export const round = (v: number) => Math.round(v * 1000) / 1000;

export function stats(values: number[]): Stats {
  const sorted = [...values].sort((a, b) => a - b);
  const q = (p: number) => {
    if (sorted.length === 0) return NaN;
    const pos = (sorted.length - 1) * p;
    const lo = Math.floor(pos);
    const hi = Math.ceil(pos);
    return sorted[lo] + (sorted[hi] - sorted[lo]) * (pos - lo);
  };
  const mean = sorted.reduce((s, v) => s + v, 0) / Math.max(1, sorted.length);
  return { medianMs: round(q(0.5)), p90Ms: round(q(0.9)), meanMs: round(mean), samples: sorted.length };
}

export async function summaryText(page: Page): Promise<string> {
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

export async function waitForSummary(page: Page, pattern: RegExp, timeout = 90_000): Promise<void> {
  await page.waitForFunction(
    ([source, flags]) => new RegExp(source, flags).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""),
    [pattern.source, pattern.flags] as const,
    { timeout },
  );
}

/**
 * A desktop page with `window.__simBench = true`: the simulations then record a performance.measure
 * per frame and per recomputation, and the ingot and powder hooks push worker timings to
 * `window.__ingotTimings` / `window.__powderTimings`.
 */
export async function newBenchPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, reducedMotion: "no-preference" });
  await context.addInitScript(() => {
    const w = window as unknown as Record<string, unknown>;
    w.__simBench = true;
    w.__ingotTimings = [];
    w.__powderTimings = [];
  });
  return context.newPage();
}

/**
 * rAF intervals and the named measures over MEASURE_MS. Per-frame compute = each measure of the
 * first name plus the next measure of every other name that starts within 8 ms of it.
 * (Scripts go in as strings: the page has no tsx helpers for named functions.)
 */
export async function recordFrames(page: Page, names: string[]) {
  await page.evaluate(`(() => {
    performance.clearMeasures();
    window.__frames = [];
    window.__recording = true;
    let last = performance.now();
    const tick = (t) => { window.__frames.push(t - last); last = t; if (window.__recording) requestAnimationFrame(tick); };
    requestAnimationFrame(tick);
  })()`);
  await page.waitForTimeout(MEASURE_MS);
  const raw = (await page.evaluate(`(() => {
    window.__recording = false;
    const out = { frames: window.__frames.slice(1) };
    for (const name of ${JSON.stringify(names)}) out[name] = performance.getEntriesByName(name, "measure").map((e) => ({ start: e.startTime, duration: e.duration }));
    return out;
  })()`)) as { frames: number[] } & Record<string, { start: number; duration: number }[]>;
  const [first, ...rest] = names;
  const perFrame = raw[first].map((s) => {
    let total = s.duration;
    for (const name of rest) {
      const next = raw[name].find((e) => e.start >= s.start && e.start - s.start < 8);
      if (next) total += next.duration;
    }
    return total;
  });
  return {
    frameIntervalMs: stats(raw.frames),
    computePerFrameMs: stats(perFrame),
    measures: Object.fromEntries(names.map((n) => [n, stats(raw[n].map((e) => e.duration))])) as Record<string, Stats>,
    framesOver16_7ms: raw.frames.filter((f) => f > 1000 / 60 + 1).length,
    frames: raw.frames.length,
  };
}

/** Merge simulation sections into results.json's `browser` (re-read now: another bench may have written meanwhile). */
export function mergeBrowserResults(sections: Record<string, object>, environmentKey: string, browser: Browser): void {
  const results = existsSync(RESULTS_FILE) ? (JSON.parse(readFileSync(RESULTS_FILE, "utf8")) as Record<string, Record<string, unknown>>) : {};
  const measuredAt = new Date().toISOString();
  results.browser = {
    ...(results.browser ?? {}),
    ...Object.fromEntries(Object.entries(sections).map(([k, v]) => [k, { ...v, measuredAt }])),
    [environmentKey]: {
      chromium: browser.version(),
      cpus: cpus().length,
      loadAverage1m: round(loadavg()[0]),
      note: "headless Chromium (--disable-gpu) on the 2-core reference machine; other jobs may share the CPU",
    },
  };
  writeFileSync(RESULTS_FILE, `${JSON.stringify(results, null, 2)}\n`);
  console.log(`merged into ${RESULTS_FILE} (${Object.keys(sections).map((k) => `browser.${k}`).join(", ")})`);
}
