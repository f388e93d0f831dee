/**
 * Each demo account signs in to its own home and sees its data; sign-out ends the session;
 * roles are enforced in the UI; a wrong password is explained. Screenshots of every home at
 * desktop and phone width go to tests/artifacts/, and axe checks every home.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { DEMO_ADMIN, DEMO_INSTRUCTORS, DEMO_OTHER_STUDENTS, DEMO_STUDENT } from "../../server/db/seed/demo";
import {
  DEMO_ACCOUNTS,
  fontsReady,
  openPage,
  screenshot,
  seriousAxeViolations,
  signIn,
  VIEWPORTS,
  type DemoRole,
  useServerAndBrowser,
} from "../support/browser";

const env = useServerAndBrowser();

const firstName = (displayName: string) => displayName.split(" ")[0];

/** What each home must show from /api/me/summary for the seeded demo school. */
const HOME_CHECKS: Record<DemoRole, { heading: RegExp; check: (page: Page) => Promise<void> }> = {
  student: {
    heading: new RegExp(`Welcome back, ${firstName(DEMO_STUDENT.displayName)}`),
    async check(page) {
      // The demo student is enrolled in both seeded cohorts; their instructor is named on the card.
      await page.getByRole("heading", { name: "Autumn Forge Cohort" }).waitFor();
      await page.getByRole("heading", { name: "Weekend Bladesmiths" }).waitFor();
      const main = await page.locator("main").textContent();
      expect(main).toContain(`Instructor: ${DEMO_INSTRUCTORS[0].displayName}`);
      // One lesson completed in the seed.
      const completed = page.locator("dt", { hasText: "Lessons completed" }).locator("xpath=following-sibling::dd[1]");
      await expect(completed.textContent()).resolves.toBe("1");
    },
  },
  instructor: {
    heading: new RegExp(`Your cohorts, ${firstName(DEMO_INSTRUCTORS[0].displayName)}`),
    async check(page) {
      const row = page.getByRole("row", { name: /Autumn Forge Cohort/ });
      await row.waitFor();
      // The seed puts the demo student and twelve others in this instructor's cohort.
      await expect(row.getByRole("cell").first().textContent()).resolves.toBe("13");
      // The other instructor's cohort is not listed.
      await expect(page.getByRole("row", { name: /Weekend Bladesmiths/ }).count()).resolves.toBe(0);
    },
  },
  admin: {
    heading: /The school at a glance/,
    async check(page) {
      const total = 1 + DEMO_INSTRUCTORS.length + 1 + DEMO_OTHER_STUDENTS.length;
      const allAccounts = page.locator("dt", { hasText: "All accounts" }).locator("xpath=following-sibling::dd[1]");
      await expect(allAccounts.textContent()).resolves.toBe(String(total));
      expect(await page.locator("main").textContent()).not.toContain(DEMO_ADMIN.email);
      await page.getByText("Server and database answering").waitFor();
    },
  },
};

describe("each demo account lands on its own home", () => {
  for (const role of Object.keys(DEMO_ACCOUNTS) as DemoRole[]) {
    it(`${role}: signs in, sees its data, passes axe, and signs out`, async () => {
      for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
        const { context, page, problems } = await openPage(env.browser, viewport);
        await signIn(page, env.server.baseUrl, role);
        await page.waitForURL(`${env.server.baseUrl}${DEMO_ACCOUNTS[role].home}`);
        // Client-side navigation changes the URL just before the new page renders: wait for the page itself.
        await page.getByRole("heading", { level: 1, name: HOME_CHECKS[role].heading }).waitFor();
        await HOME_CHECKS[role].check(page);

        await fontsReady(page);
        await screenshot(page, `home-${role}-${viewport.width}`);
        // Nothing may push the page sideways (wide tables scroll inside their own box).
        const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
        // Soft: report layout and accessibility faults together, then still test sign-out.
        expect.soft(overflow, `page is ${overflow} px wider than the ${viewport.width} px viewport`).toBeLessThanOrEqual(0);
        expect.soft(await seriousAxeViolations(page), `axe at ${viewport.width} px`).toEqual([]);

        // Sign out: from the header on desktop, from the menu on a phone.
        if (viewport.width < 768) await page.getByRole("button", { name: "Menu" }).click();
        await page.getByRole("button", { name: "Sign out" }).click();
        await page.waitForURL(`${env.server.baseUrl}/`);
        await page.getByRole("link", { name: "Sign in to your school" }).waitFor();

        // The session is gone on the server, not only in the page.
        const me = await page.request.get(`${env.server.baseUrl}/api/auth/me`);
        expect(me.status()).toBe(401);
        await page.goto(`${env.server.baseUrl}${DEMO_ACCOUNTS[role].home}`);
        await page.waitForURL(/\/sign-in\?next=/);
        expect(new URL(page.url()).searchParams.get("next")).toBe(DEMO_ACCOUNTS[role].home);

        expect(problems.csp, problems.csp.join("\n")).toEqual([]);
        expect(problems.pageErrors, problems.pageErrors.join("\n")).toEqual([]);
        await context.close();
      }
    });
  }
});

describe("access rules in the browser", () => {
  it("sends a signed-out visitor to sign-in and back to the page they asked for", async () => {
    const { context, page } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/account`);
    await page.waitForURL(`${env.server.baseUrl}/sign-in?next=%2Faccount`);
    await page.getByLabel("E-mail address").fill(DEMO_ACCOUNTS.student.email);
    await page.getByLabel("Password").fill(DEMO_ACCOUNTS.student.password);
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.waitForURL(`${env.server.baseUrl}/account`);
    await page.getByRole("heading", { level: 1, name: "Your account" }).waitFor();
    await context.close();
  });

  it("shows a student who opens /teach a clear not-allowed page", async () => {
    const { context, page, problems } = await openPage(env.browser);
    await signIn(page, env.server.baseUrl, "student");
    await page.waitForURL(`${env.server.baseUrl}/learn`);
    await page.goto(`${env.server.baseUrl}/teach`);
    await page.getByRole("heading", { level: 1, name: "Not allowed" }).waitFor();
    expect(await page.locator("main").textContent()).toMatch(/for instructors/);
    await page.getByRole("link", { name: "Go to your home page" }).click();
    await page.waitForURL(`${env.server.baseUrl}/learn`);
    await page.getByRole("heading", { level: 1, name: /Welcome back/ }).waitFor();
    expect(problems.csp, problems.csp.join("\n")).toEqual([]);
    await context.close();
  });

  it("explains a wrong password and stays on the sign-in page", async () => {
    const { context, page } = await openPage(env.browser);
    await signIn(page, env.server.baseUrl, "instructor", "not-the-password");
    const alert = page.getByRole("alert").filter({ hasText: "Sign-in failed" });
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/do not match/);
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    const me = await page.request.get(`${env.server.baseUrl}/api/auth/me`);
    expect(me.status()).toBe(401);
    await context.close();
  });

  it("checks the form before sending it", async () => {
    const { context, page } = await openPage(env.browser);
    await page.goto(`${env.server.baseUrl}/sign-in`);
    await page.getByLabel("E-mail address").fill("not-an-email");
    await page.getByRole("button", { name: "Sign in", exact: true }).click();
    await page.getByText("Enter a valid e-mail address.").waitFor();
    await expect(page.getByLabel("E-mail address").getAttribute("aria-invalid")).resolves.toBe("true");
    await context.close();
  });
});
