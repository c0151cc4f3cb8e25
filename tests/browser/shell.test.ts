import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { DEMO_PASSWORD, baseUrl } from "../helpers/http";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

test("the owner signs in, sees the shell with name and role, and signs out", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/sign-in`, { waitUntil: "networkidle" }); // hydrated before typing
  await page.getByLabel("E-mail").fill("owner@demo.test");
  await page.getByLabel("Password").fill(DEMO_PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/jobs$/);
  await expect.poll(() => page.getByTestId("member-name").textContent()).toBe("Maud Ferrier");
  expect(await page.getByTestId("role-badge").textContent()).toBe("owner");
  for (const name of ["Bench", "Jobs", "Workshop"]) {
    expect(await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name }).count()).toBe(1);
  }
  // The job list loads after the page (TanStack Query), so wait for it.
  await expect.poll(() => page.getByText("Five-tube AC/DC table radio, early 1950s").count()).toBeGreaterThan(0);
  await page.getByRole("button", { name: "Sign out" }).click();
  await page.waitForURL(/\/sign-in/);
  await page.goto(`${baseUrl()}/jobs`);
  await page.waitForURL(/\/sign-in/);
  await page.close();
});

test("sign-in shows field messages under the fields for empty input, and a plain message for a wrong password", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/sign-in`, { waitUntil: "networkidle" }); // hydrated before typing
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect.poll(() => page.locator("#email-error").textContent()).toContain("Enter your e-mail address");
  expect(await page.locator("#password").getAttribute("aria-invalid")).toBe("true");
  await page.getByLabel("E-mail").fill("tech@demo.test");
  await page.getByLabel("Password").fill("not the password");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect.poll(() => page.locator("#sign-in-error").textContent()).toBe("E-mail or password is wrong.");
  await page.close();
});
