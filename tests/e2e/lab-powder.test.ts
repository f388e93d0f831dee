/**
 * The gas-atomised powder simulation in the built app: droplet classes from its worker, the tower,
 * the comparison ingot, HIP; a slider changes the live summary; axe, CSP, screenshots.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

async function waitForSummary(page: Page, pattern: RegExp, timeout = 60_000): Promise<string> {
  await page.waitForFunction((source) => new RegExp(source).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""), pattern.source, { timeout });
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

/**
 * The size-class table's warnings: each message once (the per-class cooling-rate warning, repeated
 * with a new number in every class, is one line naming "all N size classes"), none cut off.
 */
async function expectWarningsOncePerMessage(page: Page, atLeast: number) {
  const section = page.getByRole("region", { name: "Dendrite arm spacing and carbide size per size class" });
  const classCount = (await section.getByRole("table").getByRole("row").count()) - 1;
  const items = (await section.getByRole("listitem").allTextContents()).map((t) => t.trim());
  expect(items.length).toBeGreaterThanOrEqual(atLeast);
  expect(new Set(items).size).toBe(items.length);
  await section.getByRole("heading", { name: `Model warnings (${items.length})` }).waitFor();
  const cooling = items.filter((t) => /Cooling rate/.test(t));
  expect(cooling).toHaveLength(1);
  expect(cooling[0]).toMatch(new RegExp(`^All ${classCount} size classes: Cooling rate [0-9.e+]+–[0-9.e+]+ °C/s is above the casting data`));
}

describe("powder simulation", () => {
  it("follows the droplets and updates the summary when the gas velocity and the HIP pressure move", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/powder?grade=A11&gas=N2`);
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

  it("opens a numeric-looking grade (?grade=52100) and lists every distinct model warning once, naming the size classes", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/powder?grade=52100&medianDiameterUm=40`);
    await waitForSummary(page, /times finer/);
    expect(await page.getByText("The preset could not be used").count()).toBe(0);
    expect(await page.getByLabel("Steel", { exact: true }).inputValue()).toBe("52100");
    await expectWarningsOncePerMessage(page, 1);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`has no serious accessibility violations at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(env.browser, viewport);
      await page.goto(`${env.server.baseUrl}/lab/powder`);
      await waitForSummary(page, /times finer/);
      // The default high-carbon A11 run: 3 warnings about the melt's liquidus and solidus and 2 kinds
      // per class (cooling rate, carbon beyond the arm-spacing fit); the list used to stop at 4.
      await expectWarningsOncePerMessage(page, 5);
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `lab-powder-${viewport.width}`);
      expect(problems.csp, problems.csp.join("\n")).toEqual([]);
      await context.close();
    });
  }
});
