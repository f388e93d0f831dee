/**
 * A visitor buys a self-study pass in the built app, against the in-process fake payment
 * service: the landing page links to /join, a declined test card shows the decline message and
 * leaves no account, then the good test card signs the person in and lands them on /learn.
 * Then renewal: once the pass has ended, /learn links to /join, which (signed in) shows the
 * renewal form; paying renews and /learn shows the new end date. A school account on /join gets a
 * note instead. Screenshots at 1280 and 390 px.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { openPage, screenshot, seriousAxeViolations, signIn, fontsReady, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const env = useServerAndBrowser();

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
      const { context, page, problems } = await openPage(env.browser, viewport);
      const email = `ilse-${viewport.width}@self.test`;
      // Both ways in: the landing page's self-learner card (desktop) and the sign-in page (phone).
      if (viewport.width >= 768) {
        await page.goto(`${env.server.baseUrl}/`);
        await page.getByRole("link", { name: "Get a self-study pass" }).click();
      } else {
        await page.goto(`${env.server.baseUrl}/sign-in`);
        await page.getByRole("link", { name: "self-study pass" }).click();
      }
      await page.waitForURL(`${env.server.baseUrl}/join`);
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
      expect(await env.server.product.db.models.User.count({ where: { email } })).toBe(0);

      await page.getByLabel("Card number").fill("4242 4242 4242 4242");
      await page.getByLabel("Expiry (MM/YY)").fill("12/34");
      await page.getByLabel("Security code").fill("123");
      await page.getByRole("button", { name: /^Pay €39\.00/ }).click();
      await page.waitForURL(`${env.server.baseUrl}/learn`);
      await page.getByRole("heading", { level: 1 }).first().waitFor();
      expect(await page.locator("header").textContent()).toMatch(/Ilse Marrow|Sign out|Account/);
      await fontsReady(page);
      await screenshot(page, `join-learn-${viewport.width}`);

      const user = await env.server.product.db.models.User.findOne({ where: { email } });
      expect(user?.kind).toBe("self");
      expect(await env.server.product.db.models.StudyPass.count({ where: { userId: user!.id, status: "succeeded" } })).toBe(1);
      expect(problems.csp).toEqual([]);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    });
  }
});

/** A date as the client shows it ("12 Mar 2027" in the browser's locale), formatted in the page itself. */
const shownDate = (page: Page, iso: Date) =>
  page.evaluate((ms) => new Intl.DateTimeFormat(undefined, { day: "numeric", month: "short", year: "numeric" }).format(new Date(ms)), iso.getTime());

describe("/join signed in: renewing a self-study pass", () => {
  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`after the pass ends, /learn links to the renewal form; paying shows the new date at ${viewport.width} px`, async () => {
      const { context, page, problems } = await openPage(env.browser, viewport);
      const email = `renew-${viewport.width}@self.test`;
      const { db } = env.server.product;
      await page.goto(`${env.server.baseUrl}/join`);
      await page.getByRole("heading", { level: 2, name: "Self-study pass" }).waitFor();
      await fillForm(page, email, "4242 4242 4242 4242");
      await page.getByRole("button", { name: /^Pay €39\.00/ }).click();
      await page.waitForURL(`${env.server.baseUrl}/learn`);

      // The learner home shows the pass and its end date.
      const user = (await db.models.User.findOne({ where: { email } }))!;
      const first = (await db.models.StudyPass.findOne({ where: { userId: user.id, status: "succeeded" } }))!;
      const passCard = page.locator("section", { has: page.getByRole("heading", { level: 2, name: "Your self-study pass" }) });
      await passCard.waitFor();
      expect(await passCard.textContent()).toContain(`until ${await shownDate(page, first.validUntil!)}`);

      // The pass ends (set directly in the database): /learn offers the renewal.
      const ended = new Date("2025-02-14T09:00:00Z");
      await db.write((tx) => db.models.StudyPass.update({ validUntil: ended }, { where: { id: first.id }, transaction: tx }));
      await page.goto(`${env.server.baseUrl}/learn`);
      await passCard.waitFor();
      expect(await passCard.textContent()).toContain(`Your pass ended on ${await shownDate(page, ended)}`);
      await fontsReady(page);
      await screenshot(page, `learn-pass-ended-${viewport.width}`);
      await passCard.getByRole("link", { name: "Renew your self-study pass" }).click();
      await page.waitForURL(`${env.server.baseUrl}/join`);
      await page.getByRole("heading", { level: 1, name: "Renew your self-study pass" }).waitFor();
      const status = page.locator("section", { has: page.getByRole("heading", { level: 2, name: "Self-study pass" }) });
      expect(await status.textContent()).toContain(`Ended on${await shownDate(page, ended)}`);
      // Card fields only: nothing about the account is asked again.
      expect(await page.getByLabel("E-mail address").count()).toBe(0);
      expect(await page.getByLabel("Choose a password").count()).toBe(0);
      await fontsReady(page);
      await screenshot(page, `join-renew-${viewport.width}`);
      expect(await seriousAxeViolations(page)).toEqual([]);

      // A declined card: the message, the fields emptied, the old end date unchanged.
      await page.getByLabel("Card number").fill("4000 0000 0000 0002");
      await page.getByLabel("Expiry (MM/YY)").fill("12/34");
      await page.getByLabel("Security code").fill("123");
      await page.getByRole("button", { name: "Renew for 12 months — €39.00" }).click();
      const alert = page.getByRole("alert").filter({ hasText: "Payment declined" });
      await alert.waitFor();
      expect(await alert.textContent()).toMatch(/Your card was declined\. Nothing was charged and your pass is unchanged/);
      expect(await page.getByLabel("Card number").inputValue()).toBe("");
      expect(await db.models.StudyPass.count({ where: { userId: user.id } })).toBe(1);

      await page.getByLabel("Card number").fill("4242 4242 4242 4242");
      await page.getByLabel("Expiry (MM/YY)").fill("12/34");
      await page.getByLabel("Security code").fill("123");
      const startedMs = Date.now();
      await page.getByRole("button", { name: "Renew for 12 months — €39.00" }).click();
      await page.getByRole("heading", { level: 2, name: "Pass renewed" }).waitFor();
      const renewed = (await db.models.StudyPass.findAll({ where: { userId: user.id, status: "succeeded" }, order: [["validUntil", "DESC"]] }))[0];
      expect(renewed.id).not.toBe(first.id);
      // Lapsed pass: the 12 months start at the payment (calendar months, as passValidUntil in tests/server/billing.test.ts).
      const expectedEnd = new Date(startedMs);
      expectedEnd.setUTCMonth(expectedEnd.getUTCMonth() + 12);
      expect(Math.abs(renewed.validUntil!.getTime() - expectedEnd.getTime())).toBeLessThan(60_000);
      const newDate = await shownDate(page, renewed.validUntil!);
      expect(await page.locator("main").textContent()).toContain(`now runs until ${newDate}`);
      await page.evaluate(() => window.scrollTo(0, 0)); // the sticky header otherwise lands mid-page in a full-page shot
      await fontsReady(page);
      await screenshot(page, `join-renewed-${viewport.width}`);

      await page.getByRole("link", { name: "Go to my learning" }).click();
      await page.waitForURL(`${env.server.baseUrl}/learn`);
      await passCard.waitFor();
      expect(await passCard.textContent()).toContain(`until ${newDate}`);
      expect(await passCard.getByRole("link", { name: "Go to the modules" }).count()).toBe(1);
      await fontsReady(page);
      await screenshot(page, `learn-pass-renewed-${viewport.width}`);
      expect(problems.csp).toEqual([]);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    });
  }

  it("a school account sees that the school provides access, with a link to /learn", async () => {
    const { context, page, problems } = await openPage(env.browser, VIEWPORTS.phone);
    await signIn(page, env.server.baseUrl, "student");
    await page.waitForURL(`${env.server.baseUrl}/learn`);
    await page.goto(`${env.server.baseUrl}/join`);
    await page.getByRole("heading", { level: 1, name: "Your school provides your access" }).waitFor();
    expect(await page.getByLabel("Card number").count()).toBe(0);
    await fontsReady(page);
    await screenshot(page, "join-school-390");
    expect(await seriousAxeViolations(page)).toEqual([]);
    await page.getByRole("link", { name: "Go to my learning" }).click();
    await page.waitForURL(`${env.server.baseUrl}/learn`);
    expect(problems.csp).toEqual([]);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });
});
