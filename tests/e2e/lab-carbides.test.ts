/**
 * The carbide simulation in the built app: the field loads from its worker, a preset and a slider change the
 * live summary, the edge, sharpening and chart views render, axe passes at desktop and phone widths, and the
 * Content-Security-Policy is never violated.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

async function waitForSummary(page: Page, pattern: RegExp, timeout = 30_000): Promise<string> {
  await page.waitForFunction(
    ([source, flags]) => new RegExp(source, flags).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""),
    [pattern.source, pattern.flags] as const,
    { timeout },
  );
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

describe("carbide simulation", () => {
  it("loads 440C, follows a preset and a slider, and names a particle on hover", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/carbides`);
    const first = await waitForSummary(page, /AISI 440C, hardened from 1050 °C.*M7C3/);
    expect(first).toMatch(/model indices, not lifetimes/);

    await page.getByLabel("Preset grade").selectOption("A11");
    const a11 = await waitForSummary(page, /AISI A11/);
    expect(a11).toMatch(/MC \d+\.\d vol%/);

    // Move the vanadium slider by keyboard: the steel becomes a modified A11 with less MC.
    const slider = page.getByRole("slider", { name: "Vanadium" });
    await slider.focus();
    for (let i = 0; i < 20; i++) await slider.press("ArrowLeft");
    const modified = await waitForSummary(page, /AISI A11, modified/);
    expect(modified).not.toBe(a11);

    // Hover the centre of the largest particle: its type is named.
    const box = await page.getByRole("img", { name: /Micrograph-like field/ }).boundingBox();
    expect(box).not.toBeNull();
    let named = false;
    for (let k = 0; k < 60 && !named; k++) {
      await page.mouse.move(box!.x + 20 + ((k * 37) % (box!.width - 40)), box!.y + 20 + ((k * 53) % (box!.height - 40)));
      named = await page.getByText(/Typical hardness about \d+ HV/).isVisible();
    }
    expect(named).toBe(true);

    expect(problems.csp).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("shows edge wear, sharpening and the index charts", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/carbides?grade=A11&view=edge`);
    await waitForSummary(page, /Edge after 0 cutting cycles/);
    await page.getByRole("button", { name: "Play" }).click();
    await waitForSummary(page, /Edge after [1-9]\d* cutting cycles/);
    await page.getByRole("button", { name: "Pause" }).click();
    await fontsReady(page);
    await screenshot(page, "lab-carbides-edge-1280");

    await page.getByRole("radio", { name: "Sharpening", exact: true }).check({ force: true });
    await waitForSummary(page, /Sharpening on aluminium oxide/);
    await page.getByText(/Diamond: \d+/).waitFor({ timeout: 60_000 });
    await screenshot(page, "lab-carbides-sharpen-1280");

    await page.getByRole("radio", { name: "Index charts", exact: true }).check({ force: true });
    await page.getByRole("table").waitFor();
    await expect(page.getByRole("rowheader", { name: "AISI A11" }).isVisible()).resolves.toBe(true);
    await fontsReady(page);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "lab-carbides-chart-1280");
    expect(problems.csp).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("has no serious accessibility violations at desktop and phone widths", async () => {
    for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
      const { context, page, problems } = await openPage(env.browser, viewport);
      // A numeric grade id from the URL must stay a grade id.
      await page.goto(`${env.server.baseUrl}/lab/carbides?grade=52100&state=annealed`);
      await waitForSummary(page, /SAE 52100, annealed.*M3C/);
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await screenshot(page, `lab-carbides-${viewport.width}`);
      expect(problems.csp).toEqual([]);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    }
  });
});
