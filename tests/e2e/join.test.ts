/**
 * A visitor buys a self-study pass in the built app, against the in-process fake payment
 * service: the landing page links to /join, a declined test card shows the decline message and
 * leaves no account, then the good test card signs the person in and lands them on /learn.
 * Screenshots at 1280 and 390 px.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchBrowser, openPage, screenshot, seriousAxeViolations, startTestServer, fontsReady, VIEWPORTS, type TestServer } from "../support/browser";

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

async function fillForm(page: Page, email: string, card: string) {
  await page.getByLabel("Your name").fill("Ilse Marrow");
  await page.getByLabel("E-mail address").fill(email);
  await page.getByLabel("Choose a password").fill("quench-and-temper-9");
  await page.getByLabel("Card number").fill(card);
  await page.getByLabel("Expiry (MM/YY)").fill("12/34");
  await page.getByLabel("Security code").fill("123");
}

describe("/join: buying a self-study pass", () => {
  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`declined, then paid with the test card, lands on /learn at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(browser, viewport);
      const email = `ilse-${viewport.width}@self.test`;
      // Both ways in: the landing page's self-learner card (desktop) and the sign-in page (phone).
      if (viewport.width >= 768) {
        await page.goto(`${server.baseUrl}/`);
        await page.getByRole("link", { name: "Get a self-study pass" }).click();
      } else {
        await page.goto(`${server.baseUrl}/sign-in`);
        await page.getByRole("link", { name: "self-study pass" }).click();
      }
      await page.waitForURL(`${server.baseUrl}/join`);
      await page.getByRole("heading", { level: 1, name: "Get a self-study pass" }).waitFor();
      await page.getByRole("heading", { level: 2, name: "Self-study pass" }).waitFor(); // the offer has loaded
      const text = await page.locator("main").textContent();
      expect(text).toContain("€39.00");
      expect(text).toMatch(/No real money moves/);
      await fontsReady(page);
      await screenshot(page, `join-${viewport.width}`);
      expect(await seriousAxeViolations(page)).toEqual([]);

      await fillForm(page, email, "4000 0000 0000 0002");
      await page.getByRole("button", { name: /^Pay €39\.00/ }).click();
      const alert = page.getByRole("alert").filter({ hasText: "Payment declined" });
      await alert.waitFor();
      expect(await alert.textContent()).toMatch(/Your card was declined\..*No account was created/);
      expect(await page.getByLabel("Card number").inputValue()).toBe("");
      await screenshot(page, `join-declined-${viewport.width}`);
      expect(await server.product.db.models.User.count({ where: { email } })).toBe(0);

      await page.getByLabel("Card number").fill("4242 4242 4242 4242");
      await page.getByLabel("Expiry (MM/YY)").fill("12/34");
      await page.getByLabel("Security code").fill("123");
      await page.getByRole("button", { name: /^Pay €39\.00/ }).click();
      await page.waitForURL(`${server.baseUrl}/learn`);
      await page.getByRole("heading", { level: 1 }).first().waitFor();
      expect(await page.locator("header").textContent()).toMatch(/Ilse Marrow|Sign out|Account/);
      await fontsReady(page);
      await screenshot(page, `join-learn-${viewport.width}`);

      const user = await server.product.db.models.User.findOne({ where: { email } });
      expect(user?.kind).toBe("self");
      expect(await server.product.db.models.StudyPass.count({ where: { userId: user!.id, status: "succeeded" } })).toBe(1);
      expect(problems.csp).toEqual([]);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    });
  }
});
