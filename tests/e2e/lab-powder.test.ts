/**
 * The gas-atomised powder simulation in the built app: droplet classes from its worker, the tower,
 * the comparison ingot, HIP; a slider changes the live summary; axe, CSP, screenshots.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { fontsReady, launchBrowser, openPage, screenshot, seriousAxeViolations, startTestServer, VIEWPORTS, type TestServer } from "../support/browser";

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

async function waitForSummary(page: Page, pattern: RegExp, timeout = 60_000): Promise<string> {
  await page.waitForFunction((source) => new RegExp(source).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""), pattern.source, { timeout });
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

describe("powder simulation", () => {
  it("follows the droplets and updates the summary when the gas velocity and the HIP pressure move", async () => {
    const { context, page, problems } = await openPage(browser);
    await page.goto(`${server.baseUrl}/lab/powder?grade=A11&gas=N2`);
    const before = await waitForSummary(page, /times finer than the middle of a 500 mm ingot/);
    expect(before).toMatch(/nitrogen at 100 m\/s/);

    await page.getByRole("slider", { name: "Gas velocity" }).fill("250");
    const after = await waitForSummary(page, /nitrogen at 250 m\/s/);
    expect(after).not.toBe(before);

    await page.getByRole("slider", { name: "Gas pressure" }).fill("40");
    await waitForSummary(page, /Pressed at 40 MPa/);
    // The per-class table is real text (numbers for screen readers and copy-paste).
    const rows = await page.getByRole("table").getByRole("row").count();
    expect(rows).toBeGreaterThan(10);

    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`has no serious accessibility violations at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(browser, viewport);
      await page.goto(`${server.baseUrl}/lab/powder`);
      await waitForSummary(page, /times finer/);
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `lab-powder-${viewport.width}`);
      expect(problems.csp, problems.csp.join("\n")).toEqual([]);
      await context.close();
    });
  }
});
