import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { DEMO_PASSWORD, baseUrl } from "../helpers/http";
import { expected, ready, shown } from "./bench-helpers";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signedIn(email: string): Promise<BrowserContext> {
  const context = await browser.newContext();
  const res = await context.request.post(`${baseUrl()}/api/auth/sign-in`, { data: { email, password: DEMO_PASSWORD } });
  expect(res.status()).toBe(200);
  return context;
}

/** The "Save to a job" form, which loads its code and the job list as it nears the screen: scroll to it, as a reader would. */
async function saveForm(page: Page) {
  await page.getByRole("heading", { name: "Save to a job" }).scrollIntoViewIfNeeded();
  return page.getByRole("form", { name: "Save to a job" });
}

test("a technician books in a new job from the Bench and saves the calculation to it with a note", async () => {
  const context = await signedIn("tech@demo.test");
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/bench/bleeder`);
  await ready(page);
  await page.fill("#in-capacitance", "32 uF");
  await page.fill("#in-workingVoltage", "380");
  const save = await saveForm(page);
  await save.getByLabel("Job").selectOption("new");
  const title = `Bench save ${Date.now()}`;
  await save.getByLabel("New job title").fill(title);
  await save.getByLabel("Kind of set").selectOption("amplifier");
  await save.getByLabel("Note").fill("Bleeder for the reservoir, fitted across C12");
  await save.getByRole("button", { name: "Save to job" }).click();
  const link = save.getByRole("link", { name: title });
  await link.waitFor();
  const jobId = Number((await link.getAttribute("href"))!.split("/").pop());

  const res = await context.request.get(`${baseUrl()}/api/jobs/${jobId}/calculations`);
  expect(res.status()).toBe(200);
  const { calculations } = (await res.json()) as { calculations: { slug: string; note: string; outputs: Record<string, unknown> }[] };
  expect(calculations).toHaveLength(1);
  expect(calculations[0].slug).toBe("bleeder");
  expect(calculations[0].note).toBe("Bleeder for the reservoir, fitted across C12");
  const want = expected("bleeder", { capacitance: "32 uF", workingVoltage: "380" });
  expect(calculations[0].outputs.suggestedResistance).toBe(want.outputs.suggestedResistance);

  // The job page lists it, and reopens it in the Bench with the same answer.
  await page.goto(`${baseUrl()}/jobs/${jobId}/calculations`);
  const card = page.getByTestId("calculations").locator("li", { hasText: "Bleeder resistor" });
  await card.getByText("Bleeder for the reservoir, fitted across C12").waitFor();
  await card.getByRole("link", { name: "Reopen in the Bench" }).click();
  await page.waitForURL(/\/bench\/bleeder\?/);
  expect(await page.getByTestId("output-suggestedResistance").textContent()).toBe(shown("bleeder", want, "suggestedResistance"));
  await context.close();
});

test("an apprentice saves to an existing job but cannot book in a new one; a bad field disables saving", async () => {
  const context = await signedIn("apprentice@demo.test");
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/bench/resistor-drift`);
  await ready(page);
  const save = await saveForm(page);
  const job = save.getByLabel("Job");
  await job.waitFor();
  expect(await job.locator('option[value="new"]').count()).toBe(0);
  await page.fill("#in-measured", "");
  await expect.poll(() => save.getByRole("button", { name: "Save to job" }).isDisabled()).toBe(true);
  await page.fill("#in-measured", "131k");
  await save.getByLabel("Note").fill("R7 plate load, read cold");
  await save.getByRole("button", { name: "Save to job" }).click();
  await save.getByText("Saved to").waitFor();
  const jobId = Number((await save.getByRole("link").getAttribute("href"))!.split("/").pop());
  const { calculations } = (await (await context.request.get(`${baseUrl()}/api/jobs/${jobId}/calculations`)).json()) as {
    calculations: { slug: string; note: string; inputs: Record<string, unknown> }[];
  };
  const mine = calculations.find((c) => c.note === "R7 plate load, read cold");
  expect(mine?.slug).toBe("resistor-drift");
  expect(mine?.inputs.measured).toBe(131_000);
  await context.close();
});

test("a signed-out visitor is invited to sign in instead", async () => {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}/bench/bleeder`);
  expect(await page.getByTestId("sign-in-invitation").getByRole("link", { name: "Sign in to save it to a job" }).getAttribute("href")).toBe(
    "/sign-in?next=/bench/bleeder",
  );
  expect(await page.getByRole("form", { name: "Save to a job" }).count()).toBe(0);
  await page.close();
});
