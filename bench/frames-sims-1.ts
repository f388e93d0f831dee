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
import type { Browser, Page } from "playwright-core";
import { launchBrowser, startTestServer } from "../tests/support/browser";
import { mergeBrowserResults, newBenchPage, recordFrames, summaryText, waitForSummary } from "./browser-harness";

/** Frame intervals and per-frame compute (a model step plus its drawing). */
async function record(page: Page, stepName: string, drawName: string) {
  const { measures, ...rest } = await recordFrames(page, [stepName, drawName]);
  return { ...rest, stepMs: measures[stepName], drawMs: measures[drawName] };
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
    mergeBrowserResults({ passiveFilm, carbides }, "environment", browser);
  } finally {
    await browser.close();
    await server.close();
  }
}

await main();
