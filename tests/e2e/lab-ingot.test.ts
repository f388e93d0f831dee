/**
 * The ingot simulation in the built app: it computes in its worker, shows the section, reacts to a
 * slider with a new live summary, reads URL parameters, passes axe at desktop and phone width and
 * keeps to the Content-Security-Policy. Screenshots go to tests/artifacts/.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

const summary = (page: Page) => page.getByTestId("live-summary");

async function summaryText(page: Page): Promise<string> {
  return (await summary(page).textContent()) ?? "";
}

/** Wait until the live summary matches (the solver runs in a worker; the region is throttled). */
async function waitForSummary(page: Page, pattern: RegExp, timeout = 60_000): Promise<string> {
  await page.waitForFunction((source) => new RegExp(source).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""), pattern.source, { timeout });
  return summaryText(page);
}

describe("ingot simulation", () => {
  it("freezes the chosen ingot and updates the summary when the diameter slider moves", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/ingot?grade=D2&sizeMm=300&element=V`);
    // Reduced motion (set by openPage): the frozen ingot is shown at once, paused.
    const before = await waitForSummary(page, /300 mm ingot was fully solid/);
    expect(before).toMatch(/V runs from/);
    await page.locator("canvas").first().waitFor();

    await page.getByRole("slider", { name: "Ingot diameter" }).fill("800");
    const after = await waitForSummary(page, /800 mm ingot was fully solid/);
    expect(after).not.toBe(before);

    // Switching the mapped element changes the words without a new run.
    await page.getByRole("radio", { name: "Cr" }).check({ force: true });
    await waitForSummary(page, /Cr runs from/);

    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("marks coarse primary carbides in a high-vanadium ingot and explains the powder route", async () => {
    const { context, page } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/ingot?grade=A11&sizeMm=400&mould=metal`);
    const text = await waitForSummary(page, /fully solid/);
    expect(text).toMatch(/Coarse primary carbides are likely/);
    const panel = page.getByRole("region", { name: "Coarse primary carbides" });
    await expect(panel.textContent()).resolves.toMatch(/powder route/);
    await expect(panel.textContent()).resolves.toMatch(/Common practice, no published source/i);
    await context.close();
  });

  it("opens a grade whose id looks like a number (?grade=1095) at that grade, without a preset error", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/ingot?grade=1095&sizeMm=200&element=C`);
    const text = await waitForSummary(page, /200 mm ingot was fully solid/);
    expect(text).toMatch(/C runs from/);
    expect(await page.getByLabel("Steel", { exact: true }).inputValue()).toBe("1095");
    // 1095 is a plain carbon steel: the composition boxes show its 0.95 % C and no chromium.
    expect(await page.getByLabel("Carbon (C), exact value in %").inputValue()).toBe("0.95");
    expect(Number(await page.getByLabel("Chromium (Cr), exact value in %").inputValue())).toBe(0);
    expect(await page.getByText("The preset could not be used").count()).toBe(0);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`has no serious accessibility violations at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(env.browser, viewport);
      await page.goto(`${env.server.baseUrl}/lab/ingot`);
      await waitForSummary(page, /fully solid/);
      await page.getByText("Freezing time (minutes) against casting modulus").waitFor();
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `lab-ingot-${viewport.width}`);
      expect(problems.csp, problems.csp.join("\n")).toEqual([]);
      await context.close();
    });
  }
});
