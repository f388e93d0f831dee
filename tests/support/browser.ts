/**
 * Browser-test support: the real product (built client + API, via createApp) on a temporary
 * SQLite database with the demo school, served on a free port, driven by Debian's Chromium
 * through playwright-core. `npm test` builds dist/ before vitest runs.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { AddressInfo } from "node:net";
import type { Server } from "node:http";
import { chromium, type Browser, type BrowserContext, type Page } from "playwright-core";
import AxeBuilder from "@axe-core/playwright";
import { afterAll, beforeAll } from "vitest";
import { createApp, type GrainEdgeApp } from "../../server/app";
import { loadConfig, PROJECT_ROOT } from "../../server/config";
import { DEMO_PASSWORD } from "../../server/db/seed/demo";

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
  "--disable-quic",
];
export const ARTIFACTS_DIR = path.join(PROJECT_ROOT, "tests", "artifacts");

export const DEMO_ACCOUNTS = {
  student: { email: "student@grain-edge.test", password: DEMO_PASSWORD, home: "/learn" },
  instructor: { email: "instructor@grain-edge.test", password: DEMO_PASSWORD, home: "/teach" },
  admin: { email: "admin@grain-edge.test", password: DEMO_PASSWORD, home: "/admin" },
} as const;
export type DemoRole = keyof typeof DEMO_ACCOUNTS;

export const VIEWPORTS = {
  desktop: { width: 1280, height: 900 },
  phone: { width: 390, height: 844 },
} as const;

export interface TestServer {
  baseUrl: string;
  /** The running product, for tests that check what it stored. */
  product: GrainEdgeApp;
  close(): Promise<void>;
}

/** The product on 127.0.0.1 and a free port, over a fresh database seeded with the demo school. */
export async function startTestServer(): Promise<TestServer> {
  // CLIENT_DIST_DIR lets a developer test a private build while others rebuild dist/.
  const distDir = process.env.CLIENT_DIST_DIR ? path.resolve(PROJECT_ROOT, process.env.CLIENT_DIST_DIR) : path.join(PROJECT_ROOT, "dist");
  const distIndex = path.join(distDir, "index.html");
  if (!fs.existsSync(distIndex)) {
    throw new Error("dist/index.html is missing: browser tests run against the built client. Run `npx vite build` first.");
  }
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "grain-edge-e2e-"));
  const config = loadConfig({
    NODE_ENV: "test",
    DATABASE_PATH: path.join(dataDir, "e2e.sqlite"),
    SESSION_SECRET: "e2e-session-secret-that-is-long-enough-0123456789",
    SEED_DEMO: "1",
    LOG_LEVEL: "silent",
    CLIENT_DIST_DIR: distDir,
  });
  const product = await createApp(config);
  const server: Server = await new Promise((resolve, reject) => {
    const s = product.app.listen(0, "127.0.0.1", () => resolve(s));
    s.once("error", reject);
  });
  const { port } = server.address() as AddressInfo;

  return {
    baseUrl: `http://127.0.0.1:${port}`,
    product,
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await product.close();
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/**
 * The product and a browser for one test file: started before its tests, closed after them.
 * Read `env.server` and `env.browser` inside tests (they are set once beforeAll has run).
 */
export function useServerAndBrowser(): { server: TestServer; browser: Browser } {
  const env = {} as { server: TestServer; browser: Browser };
  beforeAll(async () => {
    env.server = await startTestServer();
    env.browser = await launchBrowser();
  });
  afterAll(async () => {
    await env.browser?.close();
    await env.server?.close();
  });
  return env;
}

export function launchBrowser(): Promise<Browser> {
  if (!fs.existsSync(CHROMIUM_PATH)) {
    throw new Error(`Chromium not found at ${CHROMIUM_PATH}. Install it with: apt-get install -y chromium`);
  }
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

/** What went wrong inside the page while a test ran. */
export interface PageProblems {
  /** Content-Security-Policy violations reported by the browser. */
  csp: string[];
  /** Uncaught exceptions in page scripts. */
  pageErrors: string[];
  /** URLs of every script the page requested, to check what the bundle pulled in. */
  scripts: string[];
}

export interface OpenedPage {
  context: BrowserContext;
  page: Page;
  problems: PageProblems;
}

/**
 * A page in its own browser context (axe needs a context; separate contexts also mean separate
 * cookie jars, so each test starts signed out).
 */
export async function openPage(browser: Browser, viewport: { width: number; height: number } = VIEWPORTS.desktop): Promise<OpenedPage> {
  const context = await browser.newContext({ viewport, locale: "en-GB", reducedMotion: "reduce" });
  const problems: PageProblems = { csp: [], pageErrors: [], scripts: [] };

  // The securitypolicyviolation event is the browser's own report; the console text is a fallback.
  await context.exposeBinding("__gePolicyViolation", (_source, text: string) => {
    problems.csp.push(text);
  });
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (event) => {
      const report = (window as unknown as { __gePolicyViolation?: (t: string) => void }).__gePolicyViolation;
      report?.(`${event.violatedDirective} blocked ${event.blockedURI || "inline"} (${event.sourceFile}:${event.lineNumber})`);
    });
  });

  const page = await context.newPage();
  page.on("console", (message) => {
    if (/content[ -]security[ -]policy/i.test(message.text())) problems.csp.push(message.text());
  });
  page.on("pageerror", (error) => problems.pageErrors.push(error.message));
  page.on("request", (request) => {
    if (request.resourceType() === "script") problems.scripts.push(request.url());
  });
  return { context, page, problems };
}

export async function signIn(page: Page, baseUrl: string, role: DemoRole, password: string = DEMO_ACCOUNTS[role].password) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel("E-mail address").fill(DEMO_ACCOUNTS[role].email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
}

/** Violations axe rates serious or critical, as "rule: target" lines, for a readable assertion. */
export async function seriousAxeViolations(page: Page): Promise<string[]> {
  const results = await new AxeBuilder({ page }).withTags(["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "best-practice"]).analyze();
  return results.violations
    .filter((v) => v.impact === "serious" || v.impact === "critical")
    .flatMap((v) => v.nodes.map((n) => `${v.id} (${v.impact}): ${n.target.join(" ")} — ${v.help}`));
}

export async function screenshot(page: Page, name: string, options: { fullPage?: boolean } = {}): Promise<string> {
  fs.mkdirSync(ARTIFACTS_DIR, { recursive: true });
  const file = path.join(ARTIFACTS_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: options.fullPage ?? true });
  return file;
}

/** Wait until the fonts the page uses have loaded, so screenshots show the real type. */
export async function fontsReady(page: Page): Promise<void> {
  await page.evaluate(() => document.fonts.ready.then(() => undefined));
}
