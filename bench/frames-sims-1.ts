/**
 * Frame-time benchmark of the first two simulations in a real browser (issue 4): the passive film at
 * 256 × 256 surface sites and the carbide field at about 5,000 particles, in the built app served by
 * createApp, driven by playwright-core with Debian's Chromium.
 *
 *   npx vite build && node --import tsx bench/frames-sims-1.ts
 *
 * The page is opened with `window.__simBench = true`, which makes the simulations record a
 * `performance.measure` for each frame's model step and drawing ("passive-film:step", "passive-film:paint",
 * "carbides:step", "carbides:draw"). A requestAnimationFrame recorder in the page gives the frame intervals.
 * Reports median and p90 of the frame interval and of the per-frame compute (step + draw) and merges them
 * into bench/results.json under browser.passiveFilm and browser.carbides, leaving other keys alone.
 */
import { existsSync, readFileSync, writeFileSync } from "node:fs";
import { cpus, loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, startTestServer } from "../tests/support/browser";

const RESULTS = fileURLToPath(new URL("./results.json", import.meta.url));
const MEASURE_MS = Number(process.env.BENCH_MEASURE_MS ?? 8000);

interface Stats {
  medianMs: number;
  p90Ms: number;
  meanMs: number;
  samples: number;
}

function stats(values: number[]): Stats {
  const sorted = [...values].sort((a, b) => a - b);
  const q = (p: number) => {
    if (sorted.length === 0) return NaN;
    const pos = (sorted.length - 1) * p;
    const lo = Math.floor(pos), hi = Math.ceil(pos);
    return sorted[lo] + (sorted[hi] - sorted[lo]) * (pos - lo);
  };
  const mean = sorted.reduce((s, v) => s + v, 0) / Math.max(1, sorted.length);
  return { medianMs: round(q(0.5)), p90Ms: round(q(0.9)), meanMs: round(mean), samples: sorted.length };
}

const round = (v: number) => Math.round(v * 1000) / 1000;

async function summaryText(page: Page): Promise<string> {
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

async function waitForSummary(page: Page, pattern: RegExp, timeout = 60_000): Promise<void> {
  await page.waitForFunction(
    ([source, flags]) => new RegExp(source, flags).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""),
    [pattern.source, pattern.flags] as const,
    { timeout },
  );
}

/** Records rAF intervals and the simulation's measures for MEASURE_MS while it runs. */
async function record(page: Page, stepName: string, drawName: string) {
  // A string, not a closure: the TypeScript loader would wrap named functions in a helper the page lacks.
  await page.evaluate(`(() => {
    performance.clearMeasures();
    window.__frames = [];
    window.__recording = true;
    let last = performance.now();
    const tick = (t) => {
      window.__frames.push(t - last);
      last = t;
      if (window.__recording) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
  })()`);
  await page.waitForTimeout(MEASURE_MS);
  const raw = (await page.evaluate(`(() => {
    window.__recording = false;
    const entries = (name) => performance.getEntriesByName(name, "measure").map((e) => ({ start: e.startTime, duration: e.duration }));
    return { frames: window.__frames.slice(1), step: entries(${JSON.stringify(stepName)}), draw: entries(${JSON.stringify(drawName)}) };
  })()`)) as { frames: number[]; step: { start: number; duration: number }[]; draw: { start: number; duration: number }[] };
  // Pair each step with the drawing that follows it in the same frame (a draw within 8 ms after its step).
  const perFrame: number[] = [];
  let d = 0;
  for (const s of raw.step) {
    while (d < raw.draw.length && raw.draw[d].start < s.start) d++;
    const draw = d < raw.draw.length && raw.draw[d].start - s.start < 8 ? raw.draw[d].duration : 0;
    perFrame.push(s.duration + draw);
  }
  return {
    frameIntervalMs: stats(raw.frames),
    computePerFrameMs: stats(perFrame),
    stepMs: stats(raw.step.map((e) => e.duration)),
    drawMs: stats(raw.draw.map((e) => e.duration)),
    framesOver16_7ms: raw.frames.filter((f) => f > 1000 / 60 + 1).length,
  };
}

async function newBenchPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, reducedMotion: "no-preference" });
  await context.addInitScript(() => {
    (window as unknown as { __simBench: boolean }).__simBench = true;
  });
  return context.newPage();
}

async function benchPassiveFilm(browser: Browser, baseUrl: string) {
  const page = await newBenchPage(browser);
  // 14 % Cr in salt spray: the network is broken, rust nucleates and spreads over most of the surface.
  await page.goto(`${baseUrl}/lab/passive-film?crMassPct=14&environment=salt`);
  await waitForSummary(page, /Model time/);
  const result = await record(page, "passive-film:step", "passive-film:paint");
  const text = await summaryText(page);
  await page.context().close();
  return {
    description: "passive film, 256 × 256 surface sites (24-layer slab), 14 % Cr, salt spray, default speed (4 model s per s): rust nucleating and spreading over the whole surface during the run; compute = model step + repaint of changed pixels + layer draw",
    sites: 256 * 256,
    ...result,
    endState: text.slice(0, 240),
  };
}

async function benchCarbides(browser: Browser, baseUrl: string) {
  const page = await newBenchPage(browser);
  // Annealed 1095-type on a 90 µm field: about 5,000 cementite particles; Play runs the coarsening clock,
  // so every frame reselects the visible particles and redraws them all.
  await page.goto(`${baseUrl}/lab/carbides?grade=1095&state=annealed&fieldUm=90&austenitizingTempC=820`);
  await waitForSummary(page, /particles drawn/);
  const particlesAtStart = Number(/(\d+) particles drawn/.exec(await summaryText(page))?.[1] ?? NaN);
  await page.getByRole("button", { name: "Play" }).click();
  const result = await record(page, "carbides:step", "carbides:draw");
  const particlesAtEnd = Number(/(\d+) particles drawn/.exec(await summaryText(page))?.[1] ?? NaN);
  await page.context().close();
  return {
    description: "carbide field, annealed 1095-type, 90 µm field, coarsening at 820 °C (radii grow ≈ 0.05 % per frame): per frame the visible particles are reselected (LSW growth, no overlap), small ones stamped into one Konva.Image and large ones drawn in one Konva Shape",
    particlesAtStart,
    particlesAtEnd,
    ...result,
  };
}

async function main() {
  const server = await startTestServer();
  const browser = await launchBrowser();
  try {
    const passiveFilm = await benchPassiveFilm(browser, server.baseUrl);
    console.log("passiveFilm", JSON.stringify(passiveFilm, null, 2));
    const carbides = await benchCarbides(browser, server.baseUrl);
    console.log("carbides", JSON.stringify(carbides, null, 2));
    const results = existsSync(RESULTS) ? JSON.parse(readFileSync(RESULTS, "utf8")) : {};
    results.browser = {
      ...(results.browser ?? {}),
      passiveFilm: { ...passiveFilm, measuredAt: new Date().toISOString() },
      carbides: { ...carbides, measuredAt: new Date().toISOString() },
      environment: {
        chromium: browser.version(),
        cpus: cpus().length,
        loadAverage1m: round(loadavg()[0]),
        note: "headless Chromium (--disable-gpu) on the 2-core reference machine; other jobs may share the CPU",
      },
    };
    writeFileSync(RESULTS, `${JSON.stringify(results, null, 2)}\n`);
    console.log(`merged into ${RESULTS} (browser.passiveFilm, browser.carbides)`);
  } finally {
    await browser.close();
    await server.close();
  }
}

await main();
