import fs from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { contextFor, launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { makeTeam, samplePng, type Team } from "../helpers/team";

/** A technician's journey: book in a set, list a part, add a reading and a photo, download the bench sheet. */

let browser: Browser;
let team: Team;
const shots = process.env.GLOWBENCH_SCREENSHOTS; // folder for screenshots of each section, when set

beforeAll(async () => {
  [browser, team] = await Promise.all([launchBrowser(), makeTeam("browser")]);
});
afterAll(async () => {
  await browser?.close();
});

async function signedInPage(): Promise<Page> {
  const context = await contextFor(browser, team.technician);
  return context.newPage();
}
async function shot(page: Page, name: string) {
  if (!shots) return;
  fs.mkdirSync(shots, { recursive: true });
  await page.screenshot({ path: path.join(shots, `${name}.png`), fullPage: true });
}

test("book in a set, add a part, a reading and a photo, and download the bench sheet", async () => {
  const page = await signedInPage();
  await page.goto(`${baseUrl()}/jobs`);
  await expect.poll(() => page.getByText("No sets on the bench yet").count()).toBe(1);
  await page.getByRole("button", { name: "Book in a set" }).click();
  await page.getByRole("button", { name: "Book in" }).click();
  await expect.poll(() => page.locator("#job-title-error").textContent()).toMatch(/short title/);
  await page.getByLabel("Title").fill("Six-tube tabletop superhet, 1954");
  await page.getByLabel("Kind of set").selectOption("table-radio");
  await page.getByLabel("Year").fill("1954");
  await page.getByLabel("Customer name").fill("Orla Penrice");
  await page.getByRole("button", { name: "Book in" }).click();
  await page.waitForURL(/\/jobs\/\d+$/);
  const jobUrl = page.url();
  expect(await page.getByTestId("job-title").textContent()).toBe("Six-tube tabletop superhet, 1954");
  expect(await page.getByRole("note", { name: "High voltage" }).count()).toBeGreaterThan(0);
  await page.getByRole("button", { name: "Move to “Inspecting”" }).click();
  await expect.poll(() => page.getByTestId("status-badge").first().textContent()).toBe("Inspecting");
  await shot(page, "job-overview");

  await page.getByRole("navigation", { name: "Job sections" }).getByRole("link", { name: "Parts" }).click();
  await page.waitForURL(/\/parts$/);
  await page.getByLabel("Ref.").fill("C5a");
  await page.getByLabel("Kind").selectOption("electrolytic");
  await page.getByLabel("Original value").fill("40 µF");
  await page.getByLabel("Original rating").fill("450 V");
  await page.getByLabel("Replacement value").fill("47 µF");
  await page.getByLabel("Replacement rating").fill("350 V");
  await page.getByRole("button", { name: "Add part" }).click();
  await expect.poll(() => page.getByTestId("part-C5a").count()).toBe(1);
  expect(await page.getByTestId("part-cautions").textContent()).toMatch(/C5a: the replacement is rated 350 V, below the original 450 V/);
  await page.getByLabel("State of C5a").selectOption("fitted");
  await expect.poll(() => page.getByTestId("parts-summary").textContent()).toMatch(/1\s*fitted/);
  await shot(page, "job-parts");

  await page.getByRole("navigation", { name: "Job sections" }).getByRole("link", { name: "Readings" }).click();
  await page.waitForURL(/\/readings$/);
  await page.getByLabel("Ref.").fill("R4");
  await page.getByLabel("Marked value").fill("470k");
  await page.getByLabel("Measured").fill("655k");
  await page.getByRole("button", { name: "Add reading" }).click();
  await expect.poll(() => page.getByTestId("reading-R4").textContent()).toMatch(/\+39\.4 %.*Drifted high/);
  await shot(page, "job-readings");

  await page.getByRole("navigation", { name: "Job sections" }).getByRole("link", { name: "Files" }).click();
  await page.waitForURL(/\/files$/);
  await page.getByLabel("File").setInputFiles({ name: "chassis.png", mimeType: "image/png", buffer: await samplePng(800, 600) });
  await page.getByRole("button", { name: "Attach" }).click();
  const img = page.getByTestId("files").getByRole("img", { name: "chassis.png" });
  await expect.poll(() => img.count()).toBe(1);
  await expect.poll(() => img.evaluate((el) => (el as HTMLImageElement).naturalWidth)).toBeGreaterThan(0);
  await shot(page, "job-files");

  const download = page.waitForEvent("download");
  await page.getByRole("link", { name: "Bench sheet (PDF)" }).click();
  const file = await (await download).path();
  expect(fs.readFileSync(file).subarray(0, 5).toString()).toBe("%PDF-");

  await page.goto(`${baseUrl()}/jobs`);
  await expect.poll(() => page.getByTestId("job-table").getByRole("link", { name: "Six-tube tabletop superhet, 1954" }).count()).toBe(1);
  expect(jobUrl).toMatch(/\/jobs\/\d+$/);
  await page.close();
});
