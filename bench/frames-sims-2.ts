/**
 * Frame-time and compute benchmark of the second set of simulations (issue 5) in a real browser:
 * the ingot playback, the atomising tower, and the alloy explorer's cost per slider move, in the
 * built app served by createApp, driven by playwright-core with Debian's Chromium.
 *
 *   npx vite build && node --import tsx bench/frames-sims-2.ts
 *
 * The page is opened with `window.__simBench = true`: the simulations then record a
 * `performance.measure` per frame ("ingot:frame" + "ingot:draw", "powder:step" + "powder:draw") and
 * per recomputation ("alloy:compute"), and the ingot and powder hooks push their workers' compute
 * times to `window.__ingotTimings` / `window.__powderTimings`. A requestAnimationFrame recorder gives
 * the frame intervals. Results are merged into bench/results.json under browser.ingot,
 * browser.powder and browser.alloy, leaving every other key alone.
 */
import type { Browser, Page } from "playwright-core";
import { launchBrowser, startTestServer } from "../tests/support/browser";
import { mergeBrowserResults, newBenchPage, recordFrames, round, stats, waitForSummary } from "./browser-harness";

/** Wall time from a slider change to the live summary showing the new state. */
async function timedChange(page: Page, slider: string, value: string, expect: RegExp): Promise<number> {
  const start = Date.now();
  await page.getByRole("slider", { name: slider }).fill(value);
  await waitForSummary(page, expect);
  return Date.now() - start;
}

async function benchIngot(browser: Browser, baseUrl: string) {
  const page = await newBenchPage(browser);
  await page.goto(`${baseUrl}/lab/ingot?grade=D2&sizeMm=1500&mould=sand`);
  await waitForSummary(page, /^At .* 1500 mm ingot is/);
  // Playing (20 s for the whole freeze at 1×): every frame interpolates 50 nodes and redraws the section.
  const playback = await recordFrames(page, ["ingot:frame", "ingot:draw"]);
  // Compute per slider move: the worker runs the solver to the last liquid (plus the Chvorinov sweep).
  const moves: { sizeMm: number; summaryLatencyMs: number }[] = [];
  for (const sizeMm of [200, 600, 1200, 300]) {
    const latency = await timedChange(page, "Ingot diameter", String(sizeMm), new RegExp(`${sizeMm} mm ingot`));
    moves.push({ sizeMm, summaryLatencyMs: latency });
  }
  const timings = (await page.evaluate("window.__ingotTimings")) as { computeMs: number; busyMs: number }[];
  await page.context().close();
  return {
    description:
      "ingot section, D2, 1500 mm sand mould, playing at 1×: per frame the recorded frames are interpolated (50 nodes) and the section redrawn in one Konva Shape (100 half-rings, fronts, carbides); slider moves rerun the solver in the Web Worker (time-sliced, 24 ms slices) while the old run stays on screen with a progress bar; sliderMoves' summaryLatencyMs includes the live summary's 1.5 s announcement throttle (for screen readers), so compute is workerRunPerSliderMove",
    playback,
    workerRunPerSliderMove: {
      computeMs: stats(timings.slice(1).map((t) => t.computeMs)),
      busyMs: stats(timings.slice(1).map((t) => t.busyMs)),
      runs: timings.map((t) => ({ computeMs: round(t.computeMs), busyMs: round(t.busyMs) })),
    },
    sliderMoves: moves,
  };
}

async function benchPowder(browser: Browser, baseUrl: string) {
  const page = await newBenchPage(browser);
  await page.goto(`${baseUrl}/lab/powder?grade=A11`);
  await waitForSummary(page, /times finer/);
  const playback = await recordFrames(page, ["powder:step", "powder:draw"]);
  const moves: { gasVelocityMPerS: number; summaryLatencyMs: number }[] = [];
  for (const v of [50, 200, 300, 100]) {
    moves.push({ gasVelocityMPerS: v, summaryLatencyMs: await timedChange(page, "Gas velocity", String(v), new RegExp(`nitrogen at ${v} m/s`)) });
  }
  const timings = (await page.evaluate("window.__powderTimings")) as { stage: string; computeMs: number }[];
  await page.context().close();
  return {
    description:
      "atomising tower, A11, D50 80 µm, σg 2, N2 at 100 m/s: about 140 droplets in flight, each read from its size class's recorded flight and drawn in one Konva Shape; slider moves recompute the 14 droplet flights (core simulateDropletFlight) in the Web Worker, then the comparison ingot",
    playback,
    workerPerSliderMove: {
      dropletClassesMs: stats(timings.filter((t) => t.stage === "droplets").slice(1).map((t) => t.computeMs)),
      comparisonIngotMs: stats(timings.filter((t) => t.stage === "ingot").map((t) => t.computeMs)),
    },
    sliderMoves: moves,
  };
}

async function benchAlloy(browser: Browser, baseUrl: string) {
  const page = await newBenchPage(browser);
  await page.goto(`${baseUrl}/lab/alloy?a=440C&a=D2&a=A11`);
  await waitForSummary(page, /^Comparing/);
  // Input-to-paint latency of each slider step: from the input event to the second animation frame after it.
  await page.evaluate(`(() => {
    performance.clearMeasures();
    window.__latencies = [];
    document.addEventListener("input", () => {
      const t0 = performance.now();
      requestAnimationFrame(() => requestAnimationFrame((t) => window.__latencies.push(t - t0)));
    }, true);
  })()`);
  const slider = page.getByRole("slider", { name: "Carbon (C)" });
  await slider.focus();
  for (let k = 0; k < 40; k++) {
    await page.keyboard.press(k < 20 ? "ArrowRight" : "ArrowLeft");
    await page.waitForTimeout(60);
  }
  const raw = (await page.evaluate(`(() => ({
    compute: performance.getEntriesByName("alloy:compute", "measure").map((e) => e.duration),
    latency: window.__latencies,
  }))()`)) as { compute: number[]; latency: number[] };
  await page.context().close();
  return {
    description:
      "alloy explorer with three alloys (440C, D2, A11): 40 keyboard steps of the carbon slider of the first alloy; each step recomputes that alloy's figures on the main thread (carbide allocation, hardened state, Ms, wear indices, freezing, DI) and re-renders the figures and charts",
    computePerSliderMoveMs: stats(raw.compute),
    inputToPaintMs: stats(raw.latency),
  };
}

async function main() {
  const server = await startTestServer();
  const browser = await launchBrowser();
  try {
    const ingot = await benchIngot(browser, server.baseUrl);
    console.log("ingot", JSON.stringify(ingot, null, 2));
    const powder = await benchPowder(browser, server.baseUrl);
    console.log("powder", JSON.stringify(powder, null, 2));
    const alloy = await benchAlloy(browser, server.baseUrl);
    console.log("alloy", JSON.stringify(alloy, null, 2));
    mergeBrowserResults({ ingot, powder, alloy }, "environmentSims2", browser);
  } finally {
    await browser.close();
    await server.close();
  }
}

await main();
