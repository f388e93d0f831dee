/**
 * Forge notebook in the browser: the demo student writes an entry (the form explains mistakes
 * first), sees the science core's numbers (checked against the core here), uploads a photo with
 * a visible progress bar, sees its thumbnail after a reload; the demo instructor marks the entry
 * reviewed. Screenshots of the list, the form and an entry with photos at 1280 and 390 px go to
 * tests/artifacts/, and axe checks each screen.
 */
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import {
  andrewsMsC,
  dissolvedFractionsForAustenitizing,
  findGrade,
  hardenedState,
  martensitePlateauHardnessHrc,
  retainedAusteniteFraction,
  temperingParameter,
} from "../../shared/metallurgy";
import { DEMO_OTHER_STUDENTS, DEMO_PASSWORD } from "../../server/db/seed/demo";
import { fontsReady, launchBrowser, openPage, screenshot, seriousAxeViolations, signIn, startTestServer, VIEWPORTS, type TestServer } from "../support/browser";

let server: TestServer;
let browser: Browser;

beforeAll(async () => {
  server = await startTestServer();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

/** A photo-like "etched pattern": wavy light and dark bands with grain noise, built at test time. */
async function etchedPhoto(width = 1400, height = 900): Promise<Buffer> {
  const px = Buffer.alloc(width * height * 3);
  let seed = 12345;
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      seed = (seed * 1103515245 + 12345) & 0x7fffffff;
      const band = Math.sin((x + 40 * Math.sin(y / 57) + 25 * Math.sin((x + y) / 131)) / 11);
      const v = 120 + 70 * band + ((seed >> 8) % 30) - 15;
      const i = (y * width + x) * 3;
      px[i] = Math.max(0, Math.min(255, v + 6));
      px[i + 1] = Math.max(0, Math.min(255, v + 2));
      px[i + 2] = Math.max(0, Math.min(255, v - 6));
    }
  }
  return sharp(px, { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}

/** Post an entry through the API as another demo student (cohort mate of the demo student). */
async function seedCohortEntry(context: BrowserContext, email: string, temperC: number, readings: number[]) {
  const api = context.request;
  const csrf = async () => ((await (await api.get(`${server.baseUrl}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;
  const login = await api.post(`${server.baseUrl}/api/auth/login`, { headers: { "x-csrf-token": await csrf() }, data: { email, password: DEMO_PASSWORD } });
  expect(login.status()).toBe(200);
  const res = await api.post(`${server.baseUrl}/api/notebook/entries`, {
    headers: { "x-csrf-token": await csrf() },
    data: {
      title: `Coupon tempered at ${temperC} °C`,
      workedOn: "2026-02-20",
      steel: "grade:52100",
      normalizingCycles: 3,
      austenitizeC: 845,
      soakMinutes: 10,
      quenchMedium: "fast-oil",
      coldTreatment: "none",
      temperCycles: 2,
      temperC,
      temperHours: 1,
      hardness: readings.map((hrc) => ({ hrc, spot: "" })),
      notes: "",
    },
  });
  expect(res.status(), await res.text()).toBe(201);
}

const dd = (page: Page, label: string | RegExp) => page.locator("dt", { hasText: label }).first().locator("xpath=following-sibling::dd[1]");

async function checkPage(page: Page, name: string, problems: { csp: string[]; pageErrors: string[] }) {
  await fontsReady(page);
  // The header is sticky: scroll to the top so the full-page capture shows it in place.
  await page.evaluate(() => window.scrollTo(0, 0));
  await screenshot(page, name);
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect.soft(overflow, `${name}: page is ${overflow} px wider than the viewport`).toBeLessThanOrEqual(0);
  expect.soft(await seriousAxeViolations(page), `axe on ${name}`).toEqual([]);
  expect(problems.csp, problems.csp.join("\n")).toEqual([]);
  expect(problems.pageErrors, problems.pageErrors.join("\n")).toEqual([]);
}

describe("forge notebook", () => {
  let entryUrl = "";

  it("the demo student writes an entry, sees the core's numbers, uploads a photo and sees its thumbnail after a reload", async () => {
    // Two cohort mates in the Autumn Forge Cohort logged the same steel.
    const seeding = await browser.newContext();
    await seedCohortEntry(seeding, DEMO_OTHER_STUDENTS[0].email, 180, [63, 62.5, 63.5]);
    await seeding.clearCookies();
    await seedCohortEntry(seeding, DEMO_OTHER_STUDENTS[1].email, 260, [58.5, 59]);
    await seeding.close();

    const { context, page, problems } = await openPage(browser, VIEWPORTS.desktop);
    await signIn(page, server.baseUrl, "student");
    await page.waitForURL(`${server.baseUrl}/learn`);
    await page.getByRole("navigation").getByRole("link", { name: "Notebook", exact: true }).first().click();
    await page.getByRole("heading", { level: 1, name: "Your forge notebook" }).waitFor();
    await page.getByText("No entries yet.").waitFor();

    await page.getByRole("link", { name: "New entry" }).click();
    await page.getByRole("heading", { level: 1, name: "A new entry" }).waitFor();

    // Saving an empty form explains each mistake, with links to the fields.
    await page.getByRole("button", { name: "Save entry" }).click();
    const summary = page.locator("#nb-form-errors");
    await summary.waitFor();
    const summaryText = await summary.textContent();
    expect(summaryText).toContain("Enter a title.");
    expect(summaryText).toContain("Choose the steel");
    expect(summaryText).toContain("Enter the austenitising temperature in °C.");
    expect(summaryText).toContain("Choose the quench medium.");
    expect(await page.getByLabel("Title", { exact: true }).getAttribute("aria-invalid")).toBe("true");

    await page.getByLabel("Title", { exact: true }).fill("Paring knife, 52100");
    await page.getByLabel("Steel").selectOption("grade:52100");
    await page.getByLabel("Normalising cycles").fill("3");
    await page.getByLabel("Austenitising temperature").fill("845");
    await page.getByLabel("Soak time").fill("10");
    await page.getByLabel("Quench medium").selectOption("fast-oil");
    await page.getByLabel("Cold treatment after the quench").selectOption("dry-ice");
    await page.getByLabel("Tempering cycles").fill("2");
    await page.getByLabel("Tempering temperature").fill("200");
    await page.getByLabel("Time per cycle").fill("1");
    for (const [i, [hrc, spot]] of ([["61.5", "edge"], ["62", "middle"], ["60.5", "spine"]] as const).entries()) {
      await page.getByRole("button", { name: "Add a reading" }).click();
      await page.getByLabel(`Reading ${i + 1}`, { exact: true }).fill(hrc);
      await page.getByLabel(`Where (reading ${i + 1})`).fill(spot);
    }
    await page.getByLabel("What you saw and would change").fill("Fine, silky fracture on the test tab. Slight warp, straightened while warm between tempers.");

    // The live estimate uses the core: P of 2 × 1 h at 200 °C (science-reference §5.1 check 1: 9605.43).
    const p = temperingParameter(200, 2).value;
    const pText = Math.round(p).toLocaleString("en-GB");
    await expect.poll(() => dd(page, "Tempering parameter P").textContent()).toBe(pText);
    await page.getByRole("button", { name: "Save entry" }).focus();
    await checkPage(page, "notebook-form-1280", problems);

    await page.getByRole("button", { name: "Save entry" }).click();
    await page.getByRole("heading", { level: 1, name: "Paring knife, 52100" }).waitFor();
    entryUrl = page.url();
    expect(entryUrl).toMatch(/\/notebook\/\d+$/);

    // The numbers shown are the core's.
    const comp = findGrade("52100")!.composition;
    const state = hardenedState(comp, { dissolvedFraction: dissolvedFractionsForAustenitizing(comp, 845).dissolvedFraction });
    const ms = andrewsMsC(state.solution.composition);
    expect(await dd(page, "Tempering parameter P").textContent()).toBe(pText);
    expect(await dd(page, "As-quenched hardness estimate").first().textContent()).toBe(`${martensitePlateauHardnessHrc(state.solution.carbonMassPct).value.toFixed(1)} HRC`);
    expect(await dd(page, "Martensite start, Ms").first().textContent()).toBe(`${Math.round(ms)} °C`);
    const ra = retainedAusteniteFraction(ms, 20);
    expect(await dd(page, "Retained austenite at 20 °C").first().textContent()).toBe(`${(ra * 100).toFixed(ra < 0.1 ? 1 : 0)} %`);
    // The equivalent time follows the temperature the student picks (same P at 220 °C: 0.3004 h = 18 min, science-reference §5.1 check 2).
    const other = page.getByLabel("Same temper at another temperature");
    await other.fill("220");
    await expect.poll(() => page.locator("output").first().textContent()).toBe("18 min in total");

    // Upload a photo over a throttled link, so the progress bar shows partial progress.
    const cdp = await context.newCDPSession(page);
    await cdp.send("Network.enable");
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 20, downloadThroughput: -1, uploadThroughput: 250 * 1024 });
    const photo = await etchedPhoto();
    await page.locator('input[type="file"]').setInputFiles({ name: "etched pattern.jpg", mimeType: "image/jpeg", buffer: photo });
    const bar = page.getByRole("progressbar", { name: "Upload of etched pattern.jpg" });
    await bar.waitFor();
    await expect.poll(async () => Number((await bar.getAttribute("aria-valuenow").catch(() => "0")) ?? 0), { timeout: 20_000 }).toBeGreaterThan(0);
    await page.getByText("uploaded", { exact: true }).waitFor({ timeout: 30_000 });
    await cdp.send("Network.emulateNetworkConditions", { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

    // After a reload the thumbnail is there, and it really loaded.
    await page.reload();
    await page.getByRole("heading", { level: 1, name: "Paring knife, 52100" }).waitFor();
    const thumb = page.getByRole("img", { name: "Photo: etched pattern.jpg" });
    await thumb.waitFor();
    await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    // The cohort's readings of 52100 are on the chart's description, anonymously.
    const chart = page.locator('[role="img"][aria-label^="Scatter chart"]');
    expect(await chart.getAttribute("aria-label")).toContain("Cohort, same steel: 5 readings from 58.5 to 63.5 HRC");
    await page.locator(".recharts-surface").first().waitFor();
    await checkPage(page, "notebook-entry-1280", problems);

    await page.getByRole("link", { name: "All entries" }).click();
    await page.getByRole("heading", { level: 1, name: "Your forge notebook" }).waitFor();
    await page.getByRole("link", { name: "Paring knife, 52100" }).waitFor();
    await expect.poll(() => page.locator("main li img").first().evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(0);
    await checkPage(page, "notebook-list-1280", problems);
    await context.close();
  });

  it("works at phone width", async () => {
    const { context, page, problems } = await openPage(browser, VIEWPORTS.phone);
    await signIn(page, server.baseUrl, "student");
    await page.waitForURL(`${server.baseUrl}/learn`);
    await page.goto(`${server.baseUrl}/notebook`);
    await page.getByRole("link", { name: "Paring knife, 52100" }).waitFor();
    await expect.poll(() => page.locator("main li img").first().evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBeGreaterThan(0);
    await checkPage(page, "notebook-list-390", problems);

    await page.goto(entryUrl);
    await page.getByRole("heading", { level: 1, name: "Paring knife, 52100" }).waitFor();
    await expect.poll(() => page.getByRole("img", { name: "Photo: etched pattern.jpg" }).evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth)).toBe(320);
    await checkPage(page, "notebook-entry-390", problems);

    await page.goto(`${server.baseUrl}/notebook/new`);
    await page.getByRole("heading", { level: 1, name: "A new entry" }).waitFor();
    await page.getByLabel("Steel").selectOption("grade:1080");
    await page.getByLabel("Austenitising temperature").fill("815");
    await dd(page, "As-quenched hardness estimate").first().waitFor();
    await checkPage(page, "notebook-form-390", problems);
    await context.close();
  });

  it("the demo instructor finds the entry in the review queue and marks it reviewed", async () => {
    const { context, page, problems } = await openPage(browser, VIEWPORTS.desktop);
    await signIn(page, server.baseUrl, "instructor");
    await page.waitForURL(`${server.baseUrl}/teach`);
    await page.getByRole("navigation").getByRole("link", { name: "Notebooks" }).first().click();
    await page.getByRole("heading", { level: 1, name: "Notebook reviews" }).waitFor();
    await page.getByRole("link", { name: "Paring knife, 52100" }).waitFor();
    await checkPage(page, "notebook-review-1280", problems);

    await page.getByRole("link", { name: "Paring knife, 52100" }).click();
    await page.getByRole("heading", { level: 1, name: "Paring knife, 52100" }).waitFor();
    expect(await page.getByRole("button", { name: "Edit entry" }).count()).toBe(0);
    await page.getByRole("radio", { name: /^Reviewed/ }).check();
    await page.getByLabel("Comment for the student").fill("Good record. Next time take the readings on a flat ground spot, away from the edge.");
    await page.getByRole("button", { name: "Save review" }).click();
    await page.getByText("Review saved. The student is being e-mailed.").waitFor();
    const review = page.getByRole("region", { name: "Review" });
    await review.getByText("Good record. Next time").waitFor();
    await expect.poll(() => review.locator("span", { hasText: /^Reviewed$/ }).count()).toBeGreaterThan(0);
    await checkPage(page, "notebook-reviewed-1280", problems);
    await context.close();
  });
});
