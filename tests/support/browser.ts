// Headless Chromium (Debian's /usr/bin/chromium) driven by playwright-core, with a throwaway profile,
// collecting every console error, page error and CSP violation so tests can fail on them.
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { chromium, type BrowserContext, type Page } from "playwright-core";
import { APP_URL, DEMO_PASSWORD } from "./api";

export const CHROMIUM_ARGS = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  /** Console errors, uncaught page errors and CSP violations seen so far, in order. */
  problems: string[];
  close(): Promise<void>;
}

export async function launchBrowser(options: { width?: number; height?: number } = {}): Promise<BrowserSession> {
  const base = process.env.TMPDIR ?? os.tmpdir();
  const profile = await mkdtemp(path.join(base, "chromium-profile-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: CHROMIUM_ARGS,
    headless: true,
    viewport: { width: options.width ?? 1366, height: options.height ?? 850 },
  });
  const problems: string[] = [];
  // A CSP violation is reported as an event too; log it so it reaches the console listener below.
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      console.error(`Refused to load (CSP ${e.violatedDirective}): ${e.blockedURI}`);
    });
  });
  const watch = (page: Page) => {
    page.on("console", (msg) => {
      if (msg.type() !== "error" && !msg.text().includes("Refused to")) return;
      const where = msg.location().url;
      problems.push(`console: ${msg.text()}${where ? ` (${where})` : ""}`);
    });
    page.on("pageerror", (err) => problems.push(`page error: ${err.message}`));
  };
  context.pages().forEach(watch);
  context.on("page", watch);
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    problems,
    async close() {
      await context.close().catch(() => {});
      await rm(profile, { recursive: true, force: true });
    },
  };
}

/** Signs in through the form and waits for the page it leads to (the programs list by default). */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto(`${APP_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL((url) => url.pathname !== "/sign-in", { timeout: 30_000 });
}
