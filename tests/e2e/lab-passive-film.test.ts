/**
 * The passive-film simulation in the built app: it loads, builds the lattice in its worker, answers a
 * slider (mouse-free, by keyboard and by the number box) with a new live summary, cuts a scratch, shows the
 * spanning view, passes axe, respects reduced motion and never trips the Content-Security-Policy.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

const summary = (page: Page) => page.getByTestId("live-summary");

async function waitForSummary(page: Page, pattern: RegExp, timeout = 30_000): Promise<string> {
  await page.waitForFunction(
    ([source, flags]) => new RegExp(source, flags).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""),
    [pattern.source, pattern.flags] as const,
    { timeout },
  );
  return (await summary(page).textContent()) ?? "";
}

describe("passive-film simulation", () => {
  it("loads, starts paused under reduced motion, and its summary follows the chromium slider", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/passive-film`);
    const before = await waitForSummary(page, /13\.0 % Cr.*chromium network/i);
    expect(before).toMatch(/not connected/);
    // prefers-reduced-motion: the animation waits for Play.
    await expect(page.getByRole("button", { name: "Play" }).getAttribute("aria-pressed")).resolves.toBe("false");
    expect(await page.locator("canvas").count()).toBeGreaterThan(0);

    // Move the chromium slider with the keyboard: 13 % → 15 % in 0.5 % steps.
    const slider = page.getByRole("slider", { name: "Chromium" });
    await slider.focus();
    for (let i = 0; i < 4; i++) await slider.press("ArrowRight");
    const after = await waitForSummary(page, /15\.0 % Cr/);
    expect(after).not.toBe(before);

    // Type an exact value well above the threshold of the default model: the network connects.
    const box = page.getByRole("textbox", { name: /Chromium, exact value/ });
    await box.fill("26");
    await box.press("Enter");
    await waitForSummary(page, /26\.0 % Cr.*network is connected/);

    // Run, then cut a scratch: on a connected network it heals.
    await page.getByRole("button", { name: "Play" }).click();
    await page.getByRole("button", { name: "Cut a scratch across the surface" }).click();
    await waitForSummary(page, /scratch (has healed|is \d+ % re-filmed)/);

    expect(problems.csp).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("opens from URL parameters and shows the spanning-probability view with progress and a result", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/passive-film?crMassPct=9&view=spanning`);
    const text = await waitForSummary(page, /Spanning view.*passes one half at about \d+\.\d % Cr/, 60_000);
    expect(text).toMatch(/free chromium/);
    await expect(page.getByText(/Which neighbour shells really count for passivity is an open question/).isVisible()).resolves.toBe(true);
    await fontsReady(page);
    await screenshot(page, "lab-passive-film-spanning-1280");
    expect(problems.csp).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("has no serious accessibility violations and lays out at desktop and phone widths", async () => {
    for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
      const { context, page, problems } = await openPage(env.browser, viewport);
      await page.goto(`${env.server.baseUrl}/lab/passive-film?crMassPct=19&environment=salt`);
      await waitForSummary(page, /19\.0 % Cr/);
      await page.getByRole("button", { name: "Play" }).click();
      await page.waitForTimeout(2500);
      await page.getByRole("button", { name: "Pause" }).click();
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      // The canvas fits the width: no horizontal scrolling on a phone.
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await screenshot(page, `lab-passive-film-${viewport.width}`);
      expect(problems.csp).toEqual([]);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    }
  });
});
