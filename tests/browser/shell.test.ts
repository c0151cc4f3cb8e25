import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { contextFor, launchBrowser } from "../helpers/browser";
import { DEMO_PASSWORD, baseUrl, signedIn } from "../helpers/http";

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

test("on a phone a member's links fold into a Menu that opens, leads on and closes on the next page; a desk shows them as they are", async () => {
  const tech = await signedIn("tech@demo.test");
  const phone = await (await contextFor(browser, tech, 390, 844)).newPage();
  await phone.goto(`${baseUrl()}/jobs`, { waitUntil: "networkidle" });
  const menu = phone.getByRole("button", { name: "Menu" });
  const nav = phone.getByRole("navigation", { name: "Main" });
  expect(await menu.getAttribute("aria-expanded")).toBe("false");
  expect(await nav.isVisible()).toBe(false);
  // One row for the header, not three: the page starts near the top of a phone's screen.
  expect((await phone.locator("header").boundingBox())!.height).toBeLessThan(80);
  await menu.click();
  expect(await menu.getAttribute("aria-expanded")).toBe("true");
  expect(await nav.isVisible()).toBe(true);
  expect(await phone.getByTestId("member-name").isVisible()).toBe(true);
  await nav.getByRole("link", { name: "Bench" }).click();
  await phone.waitForURL(/\/bench$/);
  await expect.poll(() => menu.getAttribute("aria-expanded")).toBe("false");
  expect(await nav.isVisible()).toBe(false);
  await phone.context().close();

  const desk = await (await contextFor(browser, tech, 1280, 900)).newPage();
  await desk.goto(`${baseUrl()}/jobs`);
  expect(await desk.getByRole("button", { name: "Menu" }).isVisible()).toBe(false);
  expect(await desk.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Workshop" }).isVisible()).toBe(true);
  await desk.context().close();
});
