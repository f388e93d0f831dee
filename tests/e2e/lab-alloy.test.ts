/**
 * The alloy explorer in the built app: a slider changes the figures and the live summary; the
 * comparison lives in the URL and survives a reload; a signed-in student saves a named alloy and
 * finds it again after a reload; axe, CSP, screenshots at desktop and phone width.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, signIn, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

async function waitForSummary(page: Page, pattern: RegExp, timeout = 30_000): Promise<string> {
  await page.waitForFunction((source) => new RegExp(source).test(document.querySelector("[data-testid=live-summary]")?.textContent ?? ""), pattern.source, { timeout });
  return (await page.getByTestId("live-summary").textContent()) ?? "";
}

describe("alloy explorer", () => {
  it("recomputes on a slider move, keeps the comparison in the URL and restores it after a reload", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab/alloy?a=440C&a=D2`);
    const before = await waitForSummary(page, /^Comparing AISI 440C and AISI D2\./);

    await page.getByRole("slider", { name: "Vanadium (V)" }).fill("3");
    const after = await waitForSummary(page, /AISI 440C \(modified\) \(1\.0\d % C, 17\.0 % Cr, 3\.00 % V\)/);
    expect(after).not.toBe(before);

    await page.waitForFunction(() => /V3/.test(decodeURIComponent(window.location.search)));
    const url = page.url();
    expect(decodeURIComponent(url)).toMatch(/a=AISI\+440C\+\(modified\)_C1\.075_Cr17_V3/);
    await page.reload();
    await waitForSummary(page, /AISI 440C \(modified\) \(1\.0\d % C, 17\.0 % Cr, 3\.00 % V\)/);
    expect(page.url()).toBe(url);

    // A shared link with a third alloy opens all three.
    await page.goto(`${env.server.baseUrl}/lab/alloy?a=440C&a=D2&a=Cinderfield+V_C1.3_Cr7_V4`);
    await waitForSummary(page, /Comparing AISI 440C, AISI D2 and Cinderfield V\./);

    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("lets a signed-in student save a named alloy and open it after a reload", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await signIn(page, env.server.baseUrl, "student");
    await page.waitForURL(`${env.server.baseUrl}/learn`);
    await page.goto(`${env.server.baseUrl}/lab/alloy?a=A11`);
    await waitForSummary(page, /AISI A11/);

    const name = "Cinderfield high-V trial";
    await page.getByLabel("Save the selected alloy as").fill(name);
    await page.getByRole("button", { name: "Save", exact: true }).click();
    await page.getByText(`Saved “${name}”.`).waitFor();

    await page.reload();
    const list = page.getByRole("list", { name: "Your saved alloys" });
    await list.getByRole("listitem").filter({ hasText: name }).waitFor();
    await expect(list.textContent()).resolves.toMatch(/2\.45\sC, 5\.25\sCr, 9\.75\sV/);

    // Opening it puts it into the comparison.
    await page.getByRole("button", { name: `Open ${name}` }).click();
    await waitForSummary(page, new RegExp(`Exploring ${name}`));
    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    await context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`has no serious accessibility violations at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(env.browser, viewport);
      await page.goto(`${env.server.baseUrl}/lab/alloy?a=440C&a=D2&a=A11`);
      await waitForSummary(page, /^Comparing/);
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `lab-alloy-${viewport.width}`);
      expect(problems.csp, problems.csp.join("\n")).toEqual([]);
      await context.close();
    });
  }
});
