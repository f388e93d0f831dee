/**
 * The demo student reads a lesson (table of contents, formulas, a glossary term, a
 * check question), moves a simulation control, answers the lesson's quiz, sees the
 * graded result, reloads and finds the result and the reading progress stored.
 * Screenshots of the lesson and the quiz result at 1280 and 390 px go to tests/artifacts/;
 * axe checks the lesson page.
 */
import { describe, expect, it } from "vitest";
import type { Page } from "playwright-core";
import type { LessonProgress } from "../../shared/api/lessons";
import type { AttemptHistory } from "../../shared/api/quizzes";
import { fontsReady, openPage, screenshot, seriousAxeViolations, signIn, VIEWPORTS, useServerAndBrowser } from "../support/browser";

/** A lesson the demo student has not opened in the seed, with a simulation and a quiz. */
const MODULE = "why-stainless";
const LESSON = "the-passive-film";
const LESSON_PATH = `/learn/${MODULE}/${LESSON}`;

const env = useServerAndBrowser();

async function signedInPage(viewport: { width: number; height: number }) {
  const opened = await openPage(env.browser, viewport);
  // Two cores shared with builds and a Monte-Carlo simulation in the page: allow for a slow machine.
  opened.page.setDefaultTimeout(60_000);
  await signIn(opened.page, env.server.baseUrl, "student");
  await opened.page.waitForURL(/\/learn$/);
  return opened;
}

/** Scroll through the whole page in screen-sized steps, as a reader would. */
async function readThrough(page: Page) {
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  const step = Math.round((page.viewportSize()?.height ?? 800) * 0.8);
  for (let y = 0; y <= height; y += step) {
    await page.evaluate((top) => window.scrollTo(0, top), y);
    await page.waitForTimeout(60);
  }
}

async function quizId(page: Page): Promise<string> {
  const res = await page.request.get(`${env.server.baseUrl}/api/modules`);
  const body = (await res.json()) as { modules: { lessons: { slug: string; quizId: string | null }[] }[] };
  const lesson = body.modules.flatMap((m) => m.lessons).find((l) => l.slug === LESSON);
  expect(lesson?.quizId, "the lesson has a quiz").toBeTruthy();
  return lesson!.quizId!;
}

/** Make sure the student has a stored attempt (so this test does not depend on the one before it). */
async function ensureAttempt(page: Page) {
  const id = await quizId(page);
  const history = (await (await page.request.get(`${env.server.baseUrl}/api/quizzes/${id}/attempts`)).json()) as AttemptHistory;
  if (history.attempts.length > 0) return;
  const { csrfToken } = (await (await page.request.get(`${env.server.baseUrl}/api/auth/csrf`)).json()) as { csrfToken: string };
  const view = (await (await page.request.get(`${env.server.baseUrl}/api/quizzes/${id}`)).json()) as { drawId: number };
  const res = await page.request.post(`${env.server.baseUrl}/api/quizzes/${id}/attempts`, {
    headers: { "x-csrf-token": csrfToken },
    data: { idempotencyKey: `e2e-${Date.now()}`, drawId: view.drawId, answers: {} },
  });
  expect(res.status()).toBe(201);
}

describe("lesson and quiz, as the demo student", () => {
  it("reads a lesson, moves a simulation control, answers the quiz and finds the result stored after a reload", { timeout: 300_000 }, async () => {
    const { context, page, problems } = await signedInPage(VIEWPORTS.desktop);
    try {
      // The module list links to the lesson.
      await page.goto(`${env.server.baseUrl}/learn/modules`);
      await page.locator(`a[href="${LESSON_PATH}"]`).first().click();
      await page.waitForURL(new RegExp(`${LESSON_PATH}$`));
      await page.locator("article.lesson-prose h2[data-section]").first().waitFor();

      // Table of contents from the ## headings; formulas typeset by KaTeX with its own fonts.
      const tocLinks = page.getByRole("navigation", { name: "Lesson contents" }).first().getByRole("link");
      expect(await tocLinks.count()).toBeGreaterThanOrEqual(3);
      expect(await page.locator("article .katex").count()).toBeGreaterThan(0);
      await fontsReady(page);
      expect(await page.evaluate(() => document.fonts.check("16px KaTeX_Main"))).toBe(true);

      // A glossary term shows its definition on keyboard focus.
      const term = page.locator(".term-trigger").first();
      await term.focus();
      const tipId = await term.getAttribute("aria-describedby");
      await expect(page.locator(`[id="${tipId}"]`).getAttribute("data-open")).resolves.toBe("true");
      expect((await page.locator(`[id="${tipId}"]`).textContent())?.length).toBeGreaterThan(20);
      await page.keyboard.press("Escape");

      // A check question: answer it and read the feedback.
      const check = page.locator("section.check").first();
      const checkId = await page.evaluate(() => document.querySelector("section.check") !== null);
      expect(checkId).toBe(true);
      await check.locator("input[type=radio]").first().check();
      await check.getByRole("button", { name: "Check my answer" }).click();
      await check.locator(".check-feedback").waitFor();

      // Read through: sections reached are saved.
      await readThrough(page);

      // The embedded simulation: move its first slider with the keyboard.
      const sim = page.locator(".sim-frame").first();
      await sim.scrollIntoViewIfNeeded();
      const slider = sim.locator("input[type=range]").first();
      await slider.waitFor({ timeout: 90_000 });
      const before = await slider.inputValue();
      await slider.focus();
      for (let i = 0; i < 5; i += 1) await page.keyboard.press("ArrowRight");
      await expect.poll(() => slider.inputValue()).not.toBe(before);

      // Progress reached the server: opened, several sections, the check answer.
      await expect
        .poll(async () => ((await (await page.request.get(`${env.server.baseUrl}/api/lessons/${LESSON}/progress`)).json()) as LessonProgress).sectionsReached.length, { timeout: 10_000 })
        .toBeGreaterThanOrEqual(3);
      const progress = (await (await page.request.get(`${env.server.baseUrl}/api/lessons/${LESSON}/progress`)).json()) as LessonProgress;
      expect(progress.openedAt).not.toBeNull();
      expect(Object.keys(progress.checks).length).toBeGreaterThanOrEqual(1);

      // The quiz: answer the first choice question and the first numeric one, submit.
      const id = await quizId(page);
      const panel = page.locator(".quiz-panel");
      await panel.scrollIntoViewIfNeeded();
      await panel.locator("form input[type=radio]").first().check();
      const numeric = panel.getByLabel("Your answer").first();
      if (await numeric.count()) await numeric.fill("0.15");
      await panel.getByRole("button", { name: "Submit answers" }).click();
      const result = panel.getByTestId("quiz-result").first();
      await result.waitFor({ timeout: 20_000 });
      const scoreText = await result.getByRole("heading", { level: 3 }).textContent();
      expect(scoreText).toMatch(/Score \d+(\.\d+)? of \d+/);
      // Every question is listed with right/wrong and an explanation.
      expect(await result.locator("article").count()).toBeGreaterThan(2);
      expect(await result.getByText("Why:").count()).toBeGreaterThan(2);

      // Stored on the server: exactly one attempt.
      const history = (await (await page.request.get(`${env.server.baseUrl}/api/quizzes/${id}/attempts`)).json()) as AttemptHistory;
      expect(history.attempts).toHaveLength(1);

      // Reload: the stored result is shown again, with the history.
      await page.reload();
      await page.locator(".quiz-panel").scrollIntoViewIfNeeded();
      const again = page.locator(".quiz-panel").getByTestId("quiz-result").first();
      await again.waitFor({ timeout: 20_000 });
      expect(await again.getByRole("heading", { level: 3 }).textContent()).toBe(scoreText);
      await expect(page.getByRole("region", { name: "Attempts table" }).locator("tbody tr").count()).resolves.toBe(1);

      expect(problems.pageErrors).toEqual([]);
      expect(problems.csp).toEqual([]);
    } finally {
      await context.close();
    }
  });

  it.each(Object.entries(VIEWPORTS))("%s: a lesson page and a quiz result screenshot, and axe finds nothing serious", async (name, viewport) => {
    {
      const { context, page, problems } = await signedInPage(viewport);
      try {
        await ensureAttempt(page);
        await page.goto(`${env.server.baseUrl}${LESSON_PATH}`);
        await page.locator("article.lesson-prose h2[data-section]").first().waitFor();
        await fontsReady(page);
        await page.evaluate(() => window.scrollTo(0, 0));
        await screenshot(page, `lesson-${viewport.width}`);
        // Nothing in the lesson (inline formulas, glossary pop-ups) may widen the page sideways.
        const overflowPx = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
        expect(overflowPx).toBeLessThanOrEqual(0);

        // The quiz result (stored by the first test) as the student sees it after coming back.
        const panel = page.locator(".quiz-panel");
        await panel.scrollIntoViewIfNeeded();
        await panel.getByTestId("quiz-result").first().waitFor({ timeout: 20_000 });
        await readThrough(page);
        await page.locator(".sim-frame input[type=range]").first().waitFor({ timeout: 90_000 });
        // The score and the first questions' feedback (the whole panel is several screens tall):
        // a tall viewport with the panel scrolled to its top.
        await page.setViewportSize({ width: viewport.width, height: 1600 });
        // Clear of the sticky site header.
        await panel.evaluate((el) => window.scrollTo(0, el.getBoundingClientRect().top + window.scrollY - 84));
        await page.waitForTimeout(300);
        await page.screenshot({ path: `tests/artifacts/quiz-result-${viewport.width}.png` });
        await page.setViewportSize(viewport);

        const violations = await seriousAxeViolations(page);
        expect(violations, `${name}:\n${violations.join("\n")}`).toEqual([]);
        expect(problems.pageErrors).toEqual([]);
      } finally {
        await context.close();
      }
    }
  }, 300_000);

  it("prints as a clean handout: no site chrome, no simulation canvas, the title kept", { timeout: 180_000 }, async () => {
    const { context, page } = await signedInPage(VIEWPORTS.desktop);
    try {
      await page.goto(`${env.server.baseUrl}${LESSON_PATH}`);
      await page.locator("article.lesson-prose h2[data-section]").first().waitFor();
      await page.emulateMedia({ media: "print" });
      const visible = await page.evaluate(() => {
        const shown = (el: Element | null) => !!el && getComputedStyle(el).display !== "none";
        return {
          siteHeader: shown(document.querySelector("header:not(.lesson-header)")),
          toc: shown(document.querySelector('nav[aria-label="Lesson contents"]')),
          simStage: shown(document.querySelector(".sim-stage")),
          simNote: shown(document.querySelector(".sim-print-note")),
          title: shown(document.querySelector(".lesson-header h1")),
          quiz: shown(document.querySelector(".quiz-slot")),
        };
      });
      expect(visible).toEqual({ siteHeader: false, toc: false, simStage: false, simNote: true, title: true, quiz: false });
      await screenshot(page, "lesson-print-1280");
    } finally {
      await context.close();
    }
  });
});
