/**
 * Signed-out visitors: the landing page, the sign-in page, the phone navigation and the lab,
 * in the built app served by Express. Also checks that the first page stays light (no konva,
 * no mathjs) and that the strict Content-Security-Policy is never violated.
 */
import { describe, expect, it } from "vitest";
import {
  fontsReady,
  openPage,
  screenshot,
  seriousAxeViolations,
  VIEWPORTS,
  useServerAndBrowser,
} from "../support/browser";

const env = useServerAndBrowser();

describe("landing page", () => {
  it("says what the product is, links to sign-in, and loads no simulation libraries", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/`);

    await page.getByRole("heading", { level: 1, name: /see the steel/i }).waitFor();
    const lede = await page.locator("main").textContent();
    expect(lede).toMatch(/students/i);
    expect(lede).toMatch(/instructors/i);
    expect(lede).toMatch(/learning on their own|self-learners/i);

    await page.getByRole("link", { name: "Sign in to your school" }).click();
    await page.waitForURL(`${env.server.baseUrl}/sign-in`);
    await page.getByRole("heading", { level: 1, name: "Sign in" }).waitFor();

    // The first page must not download the heavy simulation stack.
    expect(problems.scripts.length).toBeGreaterThan(0);
    expect(problems.scripts.filter((url) => /konva|mathjs|recharts/i.test(url))).toEqual([]);
    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`has no serious accessibility violations on the landing and sign-in pages at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(env.browser, viewport);
      await page.goto(`${env.server.baseUrl}/`);
      await page.getByRole("heading", { level: 1, name: /see the steel/i }).waitFor();
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `landing-${viewport.width}`);

      await page.goto(`${env.server.baseUrl}/sign-in`);
      await page.getByLabel("E-mail address").waitFor();
      await fontsReady(page);
      expect(await seriousAxeViolations(page)).toEqual([]);
      await screenshot(page, `sign-in-${viewport.width}`);
      expect(problems.csp, problems.csp.join("\n")).toEqual([]);
      await context.close();
    });
  }
});

describe("phone navigation", () => {
  it("opens an accessible menu from a button and follows its links", async () => {
    const { context, page, problems } = await openPage(env.browser, VIEWPORTS.phone);
    await page.goto(`${env.server.baseUrl}/`);

    const menuButton = page.getByRole("button", { name: "Menu" });
    await expect(menuButton.getAttribute("aria-expanded")).resolves.toBe("false");
    // The desktop navigation is hidden at phone width: the menu is the way in.
    await expect(page.getByRole("navigation", { name: "Main", exact: true }).isVisible()).resolves.toBe(false);

    await menuButton.click();
    await expect(menuButton.getAttribute("aria-expanded")).resolves.toBe("true");
    const phoneNav = page.getByRole("navigation", { name: "Main, phone" });
    await expect(phoneNav.isVisible()).resolves.toBe(true);
    await screenshot(page, "menu-open-390", { fullPage: false });

    await page.keyboard.press("Escape");
    await expect(menuButton.getAttribute("aria-expanded")).resolves.toBe("false");

    await menuButton.click();
    await phoneNav.getByRole("link", { name: "Lab" }).click();
    await page.waitForURL(`${env.server.baseUrl}/lab`);
    await page.getByRole("heading", { level: 1, name: /models you can take apart/i }).waitFor();
    // The menu closes after navigating.
    await expect(menuButton.getAttribute("aria-expanded")).resolves.toBe("false");
    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    await context.close();
  });
});

describe("simulation lab and unknown pages", () => {
  it("lists every simulation and opens one on its own page", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/lab`);
    await page.getByRole("heading", { level: 1, name: /models you can take apart/i }).waitFor();
    const links = page.locator("main ul a");
    await expect(links.count()).resolves.toBe(5);

    await page.getByRole("link", { name: /Passive film/ }).first().click();
    await page.waitForURL(`${env.server.baseUrl}/lab/passive-film`);
    await page.getByRole("heading", { level: 1, name: "Passive film" }).waitFor();
    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });

  it("shows a not-found page for an unknown address and an unknown simulation", async () => {
    const { context, page } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/no/such/page`);
    await page.getByRole("heading", { level: 1, name: /nothing on this bench/i }).waitFor();
    await page.goto(`${env.server.baseUrl}/lab/no-such-simulation`);
    await page.getByRole("heading", { level: 1, name: /nothing on this bench/i }).waitFor();
    await context.close();
  });
});
