import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { contextFor, launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { makeTeam, type Team } from "../helpers/team";

/**
 * Links fetch the page behind them when someone reaches for one (a pointer over it, focus, a touch),
 * not all at once on arrival (components/ui/link.tsx). A job's Overview shows some thirty links; the
 * framework's default fetched every one as the page settled, which a phone on a slow line pays for.
 */

let browser: Browser;
let team: Team;
beforeAll(async () => {
  [browser, team] = await Promise.all([launchBrowser(), makeTeam("prefetch")]);
});
afterAll(async () => {
  await browser?.close();
});

/** Paths of the framework's page fetches (`?_rsc=`) the page makes from now on. */
function pageFetches(page: Page): string[] {
  const seen: string[] = [];
  page.on("request", (r) => {
    const url = new URL(r.url());
    if (url.searchParams.has("_rsc")) seen.push(url.pathname);
  });
  return seen;
}

test("a job's page fetches no other page on arrival; pointing at a tab fetches that one, and the tab opens", async () => {
  const { job } = await (await team.technician.post("/api/jobs", { title: "Mantel radio, 1948", equipmentKind: "table-radio" })).json();
  const page = await (await contextFor(browser, team.technician, 390, 844)).newPage();
  const fetched = pageFetches(page);
  await page.goto(`${baseUrl()}/jobs/${job.id}`, { waitUntil: "networkidle" });
  // The framework prefetches visible links once the browser is idle after load; give it that time.
  await page.waitForTimeout(1500);
  expect(fetched).toEqual([]);

  const parts = page.getByRole("navigation", { name: "Job sections" }).getByRole("link", { name: "Parts" });
  await parts.hover();
  await expect.poll(() => fetched).toContain(`/jobs/${job.id}/parts`);
  await parts.click();
  await page.waitForURL(new RegExp(`/jobs/${job.id}/parts$`));
  await page.getByRole("heading", { name: "Add a part" }).waitFor();
  await page.context().close();
});

test("the jobs list and the Bench fetch no other page on arrival either", async () => {
  const page = await (await contextFor(browser, team.technician, 390, 844)).newPage();
  const fetched = pageFetches(page);
  for (const path of ["/jobs", "/bench", "/bench/cathode-bias"]) {
    await page.goto(`${baseUrl()}${path}`, { waitUntil: "networkidle" });
    await page.waitForTimeout(1000);
  }
  expect(fetched).toEqual([]);
  await page.context().close();
});
