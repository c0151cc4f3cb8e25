import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { ownMember } from "../helpers/money-fixtures";
import { address } from "../helpers/workshops";

// Pages are opened with waitUntil "networkidle" so React has hydrated the forms before we type.
const shots = process.env.GLOWBENCH_SCREENSHOTS; // folder for screenshots, when set
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function shot(page: Page, name: string) {
  if (shots) await page.screenshot({ path: path.join(shots, `${name}.png`), fullPage: true });
}

async function signedInContext(email: string, password: string): Promise<{ ctx: BrowserContext; page: Page }> {
  const ctx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  ctx.setDefaultTimeout(10_000);
  const res = await ctx.request.post(`${baseUrl()}/api/auth/sign-in`, { data: { email, password } });
  expect(res.status()).toBe(200);
  return { ctx, page: await ctx.newPage() };
}

test("the owner sets the hourly rate on /workshop; technicians see it, apprentices see no price at all", async () => {
  // A workshop of the test's own, opened through sign-up.
  const ownerCtx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  ownerCtx.setDefaultTimeout(10_000);
  const signUp = await ownerCtx.request.post(`${baseUrl()}/api/auth/sign-up`, {
    data: {
      workshopName: `Anode Street Repairs ${Date.now() % 100000}`,
      name: "Tamsin Brook",
      email: address("charges-owner"),
      password: "owner passphrase here",
    },
  });
  expect(signUp.status()).toBe(201);
  const workshopId = (await signUp.json()).workshop.id as number;

  const page = await ownerCtx.newPage();
  await page.goto(`${baseUrl()}/workshop`, { waitUntil: "networkidle" });
  expect(await page.getByTestId("no-rate-note").count()).toBe(1);
  const form = page.getByRole("form", { name: "Workshop charges" });
  await form.getByLabel("Hourly rate").fill("52.5");
  await form.getByLabel("Tax rate").fill("150");
  await form.getByRole("button", { name: "Save charges" }).click();
  await expect.poll(() => page.locator("#ch-tax-error").textContent()).toContain("100%");

  await form.getByLabel("Tax rate").fill("17.5");
  await form.getByRole("button", { name: "Save charges" }).click();
  await expect.poll(() => form.getByRole("status").textContent()).toBe("Charges saved.");
  await expect.poll(() => page.getByTestId("charges-rate").textContent()).toBe("£52.50 an hour");
  expect(await page.getByTestId("charges-tax").textContent()).toBe("17.5%");
  expect(await page.getByTestId("no-rate-note").count()).toBe(0);

  // It sticks: a fresh load shows the figures and the form holds the exact text.
  await page.reload({ waitUntil: "networkidle" });
  expect(await page.getByTestId("charges-rate").textContent()).toBe("£52.50 an hour");
  expect(await form.getByLabel("Hourly rate").inputValue()).toBe("52.50");
  expect(await form.getByLabel("Currency").inputValue()).toBe("GBP");
  await shot(page, "workshop-owner");

  // A technician sees the figures without a form.
  const tech = await ownMember(workshopId, "technician");
  const t = await signedInContext(tech.email, "a sturdy passphrase");
  await t.page.goto(`${baseUrl()}/workshop`, { waitUntil: "networkidle" });
  expect(await t.page.getByTestId("charges-rate").textContent()).toBe("£52.50 an hour");
  expect(await t.page.getByRole("form", { name: "Workshop charges" }).count()).toBe(0);
  await shot(t.page, "workshop-technician");

  // An apprentice's page has no Charges card and no currency symbol anywhere.
  const apprentice = await ownMember(workshopId, "apprentice");
  const a = await signedInContext(apprentice.email, "a sturdy passphrase");
  await a.page.goto(`${baseUrl()}/workshop`, { waitUntil: "networkidle" });
  await expect.poll(() => a.page.getByTestId("member-row").count()).toBe(3);
  expect(await a.page.getByRole("heading", { name: "Charges" }).count()).toBe(0);
  // innerText: what a person sees (textContent would include the inline scripts, full of "$").
  const text = await a.page.locator("body").innerText();
  expect(text).not.toMatch(/[£$€¥]|52\.5|GBP|hourly rate/i);
  expect(await a.page.content()).not.toMatch(/5250|52\.50|hourlyRate/);
  await shot(a.page, "workshop-apprentice");

  await ownerCtx.close();
  await t.ctx.close();
  await a.ctx.close();
}, 60_000);
