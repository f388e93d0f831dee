/**
 * Task alloys, end to end: the demo instructor saves an alloy in the explorer and attaches it to a
 * lesson; the demo student finds it on that lesson page, opens it in the explorer, and the
 * instructor removes it again from the lesson page. Screenshots of the lesson with the task panel
 * at 1280 and 390 px; axe and CSP checked.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import { fontsReady, openPage, screenshot, seriousAxeViolations, signIn, VIEWPORTS, useServerAndBrowser } from "../support/browser";

const LESSON_PATH = "/learn/choosing-and-treating/steel-for-the-job";
const ALLOY = "Cinderfield task steel";
const NOTE = "Compare its free chromium with 440C before the next forge session.";

const env = useServerAndBrowser();

async function signedIn(role: "student" | "instructor", viewport: { width: number; height: number } = VIEWPORTS.desktop) {
  const opened = await openPage(env.browser, viewport);
  opened.page.setDefaultTimeout(60_000);
  await signIn(opened.page, env.server.baseUrl, role);
  await opened.page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return opened;
}

const taskPanel = (page: Page) => page.getByRole("region", { name: "Task alloys from your instructor" });

describe("alloys attached to a lesson task", () => {
  it("instructor attaches a saved alloy; a student sees it on the lesson and opens it in the explorer", async () => {
    const instructor = await signedIn("instructor");
    const ip = instructor.page;
    await ip.goto(`${env.server.baseUrl}/lab/alloy?a=Start_C1.1_Cr12.5_Mo0.8_V0.3`);
    await ip.getByTestId("live-summary").filter({ hasText: "Start" }).waitFor();
    await ip.getByLabel("Save the selected alloy as").fill(ALLOY);
    await ip.getByRole("button", { name: "Save", exact: true }).click();
    await ip.getByText(`Saved “${ALLOY}”.`).waitFor();

    const row = ip.getByRole("list", { name: "Your saved alloys" }).getByRole("listitem").filter({ hasText: ALLOY });
    await row.getByRole("button", { name: /^Attach to a lesson/ }).click();
    await ip.getByLabel("Lesson", { exact: true }).selectOption("steel-for-the-job");
    await ip.getByLabel("Note for the task (optional)").fill(NOTE);
    await ip.getByRole("button", { name: "Attach", exact: true }).click();
    const confirmation = ip.getByRole("status").filter({ hasText: "Attached to" });
    await confirmation.waitFor();
    expect(await confirmation.getByRole("link").getAttribute("href")).toBe(LESSON_PATH);
    expect(instructor.problems.csp).toEqual([]);
    await instructor.context.close();

    const student = await signedIn("student");
    const sp = student.page;
    await sp.goto(`${env.server.baseUrl}${LESSON_PATH}`);
    const panel = taskPanel(sp);
    await panel.waitFor();
    await expect(panel.textContent()).resolves.toContain(NOTE);
    await expect(panel.textContent()).resolves.toMatch(/1\.1\sC, 12\.5\sCr, 0\.3\sV, 0\.8\sMo/);
    // Only the owner may remove it.
    expect(await panel.getByRole("button", { name: "Remove from this lesson" }).count()).toBe(0);

    await panel.getByRole("link", { name: `Open ${ALLOY} in the alloy explorer` }).click();
    await sp.waitForURL(/\/lab\/alloy\?/);
    await sp.getByTestId("live-summary").filter({ hasText: `Exploring ${ALLOY}` }).waitFor();
    expect(student.problems.csp, student.problems.csp.join("\n")).toEqual([]);
    expect(student.problems.pageErrors).toEqual([]);
    await student.context.close();
  });

  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`shows the task panel cleanly at ${viewport.width} px`, async () => {
      const { context, page, problems } = await signedIn("student", viewport);
      await page.goto(`${env.server.baseUrl}${LESSON_PATH}`);
      const panel = taskPanel(page);
      await panel.waitFor();
      await fontsReady(page);
      // Below the sticky site header, so the whole panel is in the picture.
      await panel.evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 96));
      expect(await seriousAxeViolations(page)).toEqual([]);
      // Nothing on the lesson page may push it sideways on a phone.
      expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth)).toBeLessThanOrEqual(0);
      await screenshot(page, `lesson-task-alloys-${viewport.width}`, { fullPage: false });
      expect(problems.csp).toEqual([]);
      await context.close();
    });
  }

  it("lets the instructor who attached it remove it from the lesson page", async () => {
    const { context, page } = await signedIn("instructor");
    await page.goto(`${env.server.baseUrl}${LESSON_PATH}`);
    const panel = taskPanel(page);
    const item = panel.getByRole("listitem").filter({ hasText: ALLOY });
    await item.getByRole("button", { name: "Remove from this lesson" }).click();
    await item.getByRole("button", { name: "Remove", exact: true }).click();
    await item.waitFor({ state: "detached" });

    const res = await page.request.get(`${env.server.baseUrl}/api/lessons/steel-for-the-job/attached-alloys`);
    const body = (await res.json()) as { attachments: { name: string }[] };
    expect(body.attachments.map((a) => a.name)).not.toContain(ALLOY);
    // The saved alloy itself stays in the instructor's list.
    const saved = (await (await page.request.get(`${env.server.baseUrl}/api/alloys`)).json()) as { alloys: { name: string }[] };
    expect(saved.alloys.map((a) => a.name)).toContain(ALLOY);
    await context.close();
  });
});
