/**
 * The instructors' workflow in a real browser, on the demo school:
 *   the demo instructor invites a new student from the cohort page; an admin reads the invitation
 *   link in /admin/outbox; the student opens it, chooses a name and password, lands on their home
 *   page with the cohort's assignments, and completes a quiz; the instructor sees the score in the
 *   gradebook and exports it as CSV. Screenshots at 1280 and 390 px of the dashboard, cohort page,
 *   gradebook, admin users and outbox go to tests/artifacts/; axe checks each of those pages.
 *
 * Runs against the built client: dist/ (npm test builds it), or CLIENT_DIST_DIR if set.
 */
import fs from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { fontsReady, launchBrowser, openPage, screenshot, seriousAxeViolations, signIn, startTestServer, VIEWPORTS, type OpenedPage, type TestServer } from "../support/browser";

let server: TestServer;
let base: string;
let browser: Browser;

const NEW_STUDENT = { email: "nell.ashby@cinderfield.test", name: "Nell Ashby", password: "bright-straw-temper-41" };

beforeAll(async () => {
  server = await startTestServer();
  base = server.baseUrl;
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function signedIn(role: "instructor" | "admin", viewport: { width: number; height: number } = VIEWPORTS.desktop): Promise<OpenedPage> {
  const opened = await openPage(browser, viewport);
  await signIn(opened.page, base, role);
  await opened.page.waitForURL((url) => !url.pathname.startsWith("/sign-in"));
  return opened;
}

/** Screenshot, no sideways scrolling, no serious axe findings. */
async function check(page: Page, name: string, width: number) {
  await page.waitForLoadState("networkidle");
  await fontsReady(page);
  await screenshot(page, `${name}-${width}`);
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow, `${name}: page is ${overflow} px wider than the ${width} px viewport`).toBeLessThanOrEqual(0);
  expect(await seriousAxeViolations(page), name).toEqual([]);
}

/**
 * The gradebook grows with the page (it used to scroll inside a 70vh box that cut off after about
 * 9 rows with no sign of more): every student's row is in the page, the count says so, and the
 * header row follows the page down to the last student.
 */
async function expectEveryStudentReachable(page: Page) {
  const status = (await page.getByRole("status").filter({ hasText: /students shown/ }).textContent()) ?? "";
  const [, shown, total] = status.match(/(\d+) of (\d+) students shown/) ?? [];
  expect(Number(shown)).toBe(Number(total));
  expect(Number(total)).toBeGreaterThan(9);
  const box = page.getByRole("region", { name: /Gradebook table/ });
  expect(await box.getByRole("row").count()).toBe(Number(total) + 1);
  const innerScroll = await box.evaluate((el) => el.scrollHeight - el.clientHeight);
  expect(innerScroll, "the gradebook must not scroll vertically inside its own box").toBeLessThanOrEqual(1);

  // Scroll the page (not the box) to the last student: the row is on screen, the header above it.
  const lastRow = box.getByRole("row").last();
  await lastRow.evaluate((el) => el.scrollIntoView({ block: "end" }));
  await page.evaluate(() => new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(resolve))));
  const viewportHeight = page.viewportSize()!.height;
  const rowBox = (await lastRow.boundingBox())!;
  expect(rowBox.y + rowBox.height).toBeLessThanOrEqual(viewportHeight + 1);
  const siteHeaderBottom = await page.evaluate(() => document.querySelector("body header")!.getBoundingClientRect().bottom);
  const headBox = (await box.getByRole("columnheader", { name: /Student/ }).boundingBox())!;
  expect(headBox.y).toBeGreaterThanOrEqual(siteHeaderBottom - 1);
  expect(headBox.y).toBeLessThan(siteHeaderBottom + 8);
  expect(headBox.y + headBox.height).toBeLessThanOrEqual(rowBox.y + 1);
  await page.evaluate(() => window.scrollTo(0, 0));
}

/** Question analytics: the most common wrong answers stay inside the panel at every width. */
async function expectWrongAnswersInsidePanel(page: Page) {
  const panel = page.getByRole("region", { name: "Question by question" });
  const panelBox = (await panel.boundingBox())!;
  const answers = panel.getByRole("listitem").filter({ hasText: /^\d+×/ });
  expect(await answers.count()).toBeGreaterThan(0);
  for (const answer of await answers.all()) {
    const b = (await answer.boundingBox())!;
    expect(b.x + b.width, `"${await answer.textContent()}" runs past the panel`).toBeLessThanOrEqual(panelBox.x + panelBox.width);
    expect(await answer.isVisible()).toBe(true);
  }
  const overflow = await panel.evaluate((el) => [...el.querySelectorAll("*")].filter((e) => e.scrollWidth > e.clientWidth + 1 && getComputedStyle(e).overflowX !== "visible").length);
  expect(overflow, "no part of the question panel scrolls sideways").toBe(0);
}

let cohortPath = "";
let invitationLink = "";
let submittedScore = { score: 0, maxScore: 0 };

describe("instructor invites, student joins and takes a quiz, instructor grades", () => {
  it("the instructor invites a new student from the cohort page", async () => {
    const { context, page, problems } = await signedIn("instructor");
    await page.getByRole("heading", { level: 1, name: /Your cohorts, Hale/ }).waitFor();
    await page.getByRole("table").getByRole("link", { name: "Autumn Forge Cohort", exact: true }).click();
    await page.getByRole("heading", { level: 1, name: /Autumn Forge Cohort/ }).waitFor();
    cohortPath = new URL(page.url()).pathname;
    expect(cohortPath).toMatch(/^\/teach\/cohorts\/\d+$/);

    await page.getByLabel("E-mail address").fill(NEW_STUDENT.email);
    await page.getByLabel("Name (optional)").fill(NEW_STUDENT.name);
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(/Invitation queued/).waitFor();
    // The list refreshes while sending; the fake SMTP server takes it within a moment.
    const invitations = page.getByRole("region", { name: "Invitations" });
    await invitations.getByText(NEW_STUDENT.name).waitFor();
    await invitations.getByText("Sent", { exact: true }).waitFor({ timeout: 15_000 });
    expect(problems.pageErrors).toEqual([]);
    expect(problems.csp).toEqual([]);
    await context.close();
  });

  it("an admin finds the invitation link in the outbox", async () => {
    const { context, page } = await signedIn("admin");
    await page.goto(`${base}/admin/outbox`);
    await page.getByRole("heading", { level: 1, name: "Outbox" }).waitFor();
    const message = page.locator("main li").filter({ hasText: `to ${NEW_STUDENT.email}` }).first();
    await message.waitFor();
    const link = message.getByRole("link", { name: /Invitation link/ });
    invitationLink = (await link.getAttribute("href")) ?? "";
    expect(invitationLink).toMatch(/\/invite\/[A-Za-z0-9_-]{43}$/);
    await message.getByRole("button", { name: /You are invited to Autumn Forge Cohort/ }).click();
    await message.getByText(`Hello ${NEW_STUDENT.name},`).waitFor();
    await context.close();
  });

  it("the new student accepts the invitation, sees the cohort's work and completes a quiz", async () => {
    const { context, page, problems } = await openPage(browser, VIEWPORTS.desktop);
    await page.goto(invitationLink);
    await page.getByRole("heading", { level: 1, name: "Join your cohort" }).waitFor();
    await page.getByText("Autumn Forge Cohort").waitFor();
    expect(await page.getByLabel("Your name").inputValue()).toBe(NEW_STUDENT.name);
    expect(await seriousAxeViolations(page)).toEqual([]);
    await screenshot(page, "invite-accept-1280");
    await page.getByLabel("Choose a password").fill(NEW_STUDENT.password);
    await page.getByRole("button", { name: "Join the cohort" }).click();
    await page.waitForURL(`${base}/learn`);
    await page.getByRole("heading", { level: 1, name: /Welcome back, Nell/ }).waitFor();
    // The cohort's assignments, overdue first (the seed has one past its due date).
    const assignments = page.getByRole("region", { name: "Your assignments" });
    await assignments.getByText("Iron, carbon and hardness").waitFor();
    await assignments.getByText("Overdue", { exact: true }).first().waitFor();

    // The quiz at the end of the first lesson: answer the first question (the rest left blank) and submit.
    await page.goto(`${base}/learn/iron-carbon-hardness/iron-and-carbon`);
    const austenite = page.getByRole("radio", { name: /Austenite \(face-centred cubic/ });
    await austenite.waitFor({ timeout: 30_000 });
    await austenite.check();
    const [response] = await Promise.all([
      page.waitForResponse((r) => r.url().endsWith("/api/quizzes/iron-carbon-hardness-1/attempts") && r.request().method() === "POST"),
      page.getByRole("button", { name: "Submit answers" }).click(),
    ]);
    expect(response.status()).toBe(201);
    submittedScore = (await response.json()) as { score: number; maxScore: number };
    expect(submittedScore.score).toBeGreaterThan(0);
    expect(problems.pageErrors).toEqual([]);
    await context.close();

    // The same link cannot be used again, even in a fresh browser.
    const other = await openPage(browser, VIEWPORTS.desktop);
    await other.page.goto(invitationLink);
    await other.page.getByText(/already been used/).waitFor();
    await other.context.close();
  });

  it("the instructor sees the score in the gradebook, drills in, and exports the CSV", async () => {
    const { context, page, problems } = await signedIn("instructor");
    await page.goto(`${base}${cohortPath}/gradebook`);
    await page.getByRole("heading", { level: 1, name: "Autumn Forge Cohort" }).waitFor();
    await page.getByLabel("Find a student").fill("Nell");
    const table = page.getByRole("region", { name: /Gradebook table/ });
    const row = table.getByRole("row", { name: new RegExp(NEW_STUDENT.name) });
    await row.waitFor();
    const expected = `${((submittedScore.score / submittedScore.maxScore) * 100).toFixed(0)} %`;
    await expect(row.getByText(expected, { exact: false }).first().isVisible()).resolves.toBe(true);
    expect(await table.getByRole("row").count()).toBe(2); // header + Nell: the filter works

    // Drill into Nell's attempt: her answer, marked right.
    await row.getByRole("link", { name: NEW_STUDENT.name }).click();
    await page.getByRole("heading", { level: 1, name: NEW_STUDENT.name }).waitFor();
    await page.getByText(/Right: Austenite/).waitFor();
    await page.goBack();
    await page.getByRole("heading", { level: 1, name: "Autumn Forge Cohort" }).waitFor();

    const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Export CSV" }).click()]);
    expect(download.suggestedFilename()).toMatch(/^gradebook-cohort-\d+-\d{4}-\d{2}-\d{2}\.csv$/);
    const csv = fs.readFileSync(await download.path(), "utf8").replace(/^\uFEFF/, "");
    const rows = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
    const nell = rows.find((r) => r[1] === NEW_STUDENT.email)!;
    expect(nell[0]).toBe(NEW_STUDENT.name);
    const bestColumn = rows[0].indexOf("Iron, carbon and the phases of steel: best %");
    expect(bestColumn).toBeGreaterThan(0);
    expect(Number(nell[bestColumn])).toBeCloseTo((submittedScore.score / submittedScore.maxScore) * 100, 0);
    const exported = await server.product.db.models.AuditLog.count({ where: { action: "grades.exported" } });
    expect(exported).toBe(1);
    expect(problems.pageErrors).toEqual([]);
    await context.close();
  });
});

describe("screens at desktop and phone width", () => {
  for (const viewport of [VIEWPORTS.desktop, VIEWPORTS.phone]) {
    it(`teaching screens at ${viewport.width} px`, async () => {
      const { context, page, problems } = await signedIn("instructor", viewport);
      await page.getByRole("heading", { level: 1, name: /Your cohorts/ }).waitFor();
      await page.getByRole("region", { name: "Who is behind" }).waitFor();
      await check(page, "teach-dashboard", viewport.width);
      await page.goto(`${base}${cohortPath}`);
      await page.getByRole("region", { name: "Assignments" }).getByText("Iron, carbon and hardness").first().waitFor();
      await check(page, "teach-cohort", viewport.width);
      await page.goto(`${base}${cohortPath}/gradebook`);
      await page.getByRole("row", { name: new RegExp(NEW_STUDENT.name) }).waitFor();
      await page.getByRole("region", { name: "Question by question" }).getByText(/attempted it/).waitFor();
      await expectEveryStudentReachable(page);
      await expectWrongAnswersInsidePanel(page);
      await check(page, "teach-gradebook", viewport.width);
      expect(problems.pageErrors).toEqual([]);
      expect(problems.csp).toEqual([]);
      await context.close();
    });

    it(`admin screens at ${viewport.width} px`, async () => {
      const { context, page, problems } = await signedIn("admin", viewport);
      await page.goto(`${base}/admin/users`);
      await page.getByRole("row", { name: new RegExp(NEW_STUDENT.name) }).waitFor();
      await check(page, "admin-users", viewport.width);
      await page.goto(`${base}/admin/outbox`);
      await page.getByRole("link", { name: /Invitation link/ }).first().waitFor();
      await check(page, "admin-outbox", viewport.width);
      expect(problems.pageErrors).toEqual([]);
      await context.close();
    });
  }
});
