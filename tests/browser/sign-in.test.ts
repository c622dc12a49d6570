// Signs in through the form as the demo director and reads the demo show's overview in headless Chromium.
import { afterAll, beforeAll, expect, test } from "vitest";
import { APP_URL, DEMO } from "../support/api";
import { launchBrowser, signIn, type BrowserSession } from "../support/browser";

let session: BrowserSession;

beforeAll(async () => {
  session = await launchBrowser();
});

afterAll(async () => {
  await session?.close();
});

test("a signed-out visitor is sent to the sign-in page and comes back after signing in", async () => {
  const { page } = session;
  await page.goto(`${APP_URL}/programs`);
  await page.waitForURL((url) => url.pathname === "/sign-in");
  expect(new URL(page.url()).searchParams.get("next")).toBe("/programs");
});

test("a wrong password shows the API's message and empties the password field", async () => {
  const { page } = session;
  await page.goto(`${APP_URL}/sign-in`);
  await page.getByLabel("E-mail").fill(DEMO.director);
  await page.getByLabel("Password").fill("not-the-password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect.poll(() => page.locator("#sign-in-status").textContent()).toContain("Wrong e-mail or password");
  expect(await page.getByLabel("Password").inputValue()).toBe("");
  expect(await page.getByLabel("E-mail").inputValue()).toBe(DEMO.director);
  // The 401 answer itself is logged by Chromium as a failed resource; it is expected here.
  session.problems.splice(0, session.problems.length, ...session.problems.filter((p) => !/status of 401/.test(p)));
});

test("the director signs in, opens Harbor Ridge and sees the show overview", async () => {
  const { page } = session;
  await signIn(page, DEMO.director);
  expect(new URL(page.url()).pathname).toBe("/programs");
  await expect.poll(() => page.getByRole("heading", { name: "Your programs" }).isVisible()).toBe(true);

  await page.getByRole("link", { name: /Harbor Ridge High School Marching Band/ }).click();
  await page.waitForURL(/\/programs\/[0-9a-f-]+$/);
  await page.getByRole("link", { name: /Lanterns on the Water/ }).click();
  await page.waitForURL(/\/shows\/[0-9a-f-]+$/);

  await expect.poll(() => page.getByRole("heading", { level: 1, name: "Lanterns on the Water" }).isVisible(), { timeout: 20_000 }).toBe(true);
  const sets = page.getByRole("list", { name: "Sets in order" }).getByRole("link");
  expect(await sets.count()).toBeGreaterThanOrEqual(12);
  // The sets read under the show's movements.
  expect(await page.getByTestId("movement-heading").allTextContents()).toEqual(["Harbor Lights", "Still Water", "Lantern Procession"]);
  const roster = page.getByRole("table", { name: /Roster/ });
  await expect.poll(() => roster.isVisible()).toBe(true);
  expect(await roster.locator("tbody tr").count()).toBeGreaterThanOrEqual(60);
  // The breadcrumbs lead back to the program.
  await expect.poll(() => page.getByRole("navigation", { name: "Breadcrumb" }).getByRole("link", { name: /Harbor Ridge/ }).isVisible()).toBe(true);
  // The header names the signed-in user.
  expect(await page.getByRole("banner").textContent()).toMatch(/Signed in as/);
});

test("no console errors and no CSP violations on the way", () => {
  expect(session.problems).toEqual([]);
});
