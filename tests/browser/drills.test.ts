import type Database from "better-sqlite3";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { formatAnswer, getDrillKind, type DrillSolution } from "@/lib/drills";
import { launchBrowser } from "../helpers/browser";
import { DEMO_PASSWORD, baseUrl } from "../helpers/http";
import { testDb } from "../helpers/workshops";

/**
 * An apprentice's journey through a drill: starts one from /drills, answers wrong, reads the verdict and the
 * working with the step to watch pointed out, tries a similar one and gets it right. The test reads the
 * expected answer from the server's database, as only the server knows it before the answer.
 */

const KIND = "cathode-bias/resistor";
let browser: Browser;
let db: Database.Database;
beforeAll(async () => {
  browser = await launchBrowser();
  db = testDb();
});
afterAll(async () => {
  await browser?.close();
  db?.close();
});

async function signedIn(email: string, width = 1280): Promise<BrowserContext> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  const res = await context.request.post(`${baseUrl()}/api/auth/sign-in`, { data: { email, password: DEMO_PASSWORD } });
  expect(res.status()).toBe(200);
  return context;
}

function solutionOf(page: Page): DrillSolution {
  const id = Number(new URL(page.url()).pathname.split("/").pop());
  const row = db.prepare("select solution from drills where id = ?").get(id) as { solution: string };
  return JSON.parse(row.solution) as DrillSolution;
}

/** Starts a drill of a kind from /drills, opening its group of the list first (groups start folded). */
async function startDrill(page: Page, kindId: string) {
  const button = page.getByRole("button", { name: `Start a drill: ${getDrillKind(kindId)!.title}` });
  const group = page.getByTestId("drill-kinds").locator("details", { has: page.locator(`[data-kind="${kindId}"]`) });
  if ((await group.getAttribute("open")) === null) await group.locator("summary").click();
  await button.click();
  await page.waitForURL(/\/drills\/\d+$/);
}

async function noSidewaysScroll(page: Page) {
  const [scroll, client] = await page.evaluate(() => [document.documentElement.scrollWidth, document.documentElement.clientWidth]);
  expect(scroll).toBeLessThanOrEqual(client);
}

test("an apprentice answers wrong, reads the working, then gets a similar one right", async () => {
  const context = await signedIn("apprentice@demo.test");
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/drills`);
  await page.getByRole("link", { name: "Drills", exact: true }).waitFor();
  const title = getDrillKind(KIND)!.title;
  await startDrill(page, KIND);
  await page.getByRole("heading", { name: title }).waitFor();
  // More than 50 V in the circuit: the Bench's danger caution comes with the problem.
  await page.getByTestId("danger-banner").waitFor();
  expect(await page.getByTestId("drill-working").count()).toBe(0);

  const first = solutionOf(page);
  // A typical slip of this kind (a factor of a thousand out, if nothing else), so the step it happens at is known.
  const slip = first.mistakes[0];
  await page.getByRole("textbox", { name: /Your answer/ }).fill(formatAnswer(slip.value, "Ω", 6));
  await page.getByRole("button", { name: "Check my answer" }).click();
  const verdict = page.getByTestId("drill-verdict");
  await verdict.waitFor();
  expect(await verdict.getAttribute("data-verdict")).toBe("wrong-number");
  expect(await page.getByTestId("drill-expected").textContent()).toBe(first.expectedText);
  // The working, step by step, with the step where the slip happens pointed out and explained.
  const steps = page.getByTestId("steps").locator("li");
  expect(await steps.count()).toBe(first.steps.length);
  const marked = page.getByTestId("marked-step");
  await marked.waitFor();
  expect(await marked.textContent()).toContain(slip.hint);
  expect(await marked.textContent()).toContain(slip.step);
  expect(await steps.nth(slip.stepIndex).getAttribute("data-testid")).toBe("marked-step");
  await page.locator(".katex").first().waitFor();

  const firstUrl = page.url();
  await page.getByRole("button", { name: "Try a similar one" }).click();
  await page.waitForURL((u) => /\/drills\/\d+$/.test(u.pathname) && u.toString() !== firstUrl);
  await page.getByRole("textbox", { name: /Your answer/ }).waitFor();
  const second = solutionOf(page);
  // The figure without its unit: a bare number is read in the unit asked for (Ω).
  await page.getByRole("textbox", { name: /Your answer/ }).fill(second.expectedText.replace(" Ω", ""));
  await page.getByRole("button", { name: "Check my answer" }).click();
  await page.locator('[data-testid="drill-verdict"][data-verdict="correct"]').waitFor();
  expect(await page.getByTestId("drill-verdict").textContent()).toContain("Right");

  // The progress on /drills counts both answers of this kind.
  await page.goto(`${baseUrl()}/drills`);
  const row = page.getByTestId("progress").locator(`[data-kind="${KIND}"]`);
  await row.waitFor();
  expect(await row.textContent()).toMatch(/\d+ of \d+ right/);
  await page.getByTestId("chart").waitFor();
  await context.close();
});

test("at 390 px the drills page and a drill read without sideways scrolling", async () => {
  const context = await signedIn("apprentice@demo.test", 390);
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/drills`);
  await page.getByTestId("drill-kinds").waitFor();
  await noSidewaysScroll(page);
  await startDrill(page, "triode-stage/gain");
  await page.getByRole("textbox", { name: /Your answer/ }).fill("1");
  await page.getByRole("button", { name: "Check my answer" }).click();
  await page.getByTestId("drill-working").waitFor();
  await page.locator(".katex").first().waitFor();
  await noSidewaysScroll(page);
  await context.close();
});
