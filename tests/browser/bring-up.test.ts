import fs from "node:fs";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { contextFor as sharedContextFor, launchBrowser } from "../helpers/browser";
import { baseUrl, type Client } from "../helpers/http";
import { makeTeam, type Team } from "../helpers/team";

/**
 * A technician brings up a 1950s television and hunts a fault, in the browser: the tube line-up, a weak
 * tube with a substitute, a series-lamp power-up with a step over the stop current, a fault with
 * candidates ruled out until the cause, the Overview's open faults, and every new tab at 390 px.
 */

let browser: Browser;
let team: Team;
const shots = process.env.GLOWBENCH_SCREENSHOTS;

beforeAll(async () => {
  [browser, team] = await Promise.all([launchBrowser(), makeTeam("bring-up")]);
});
afterAll(async () => {
  await browser?.close();
});

function contextFor(client: Client, width = 1280): Promise<BrowserContext> {
  return sharedContextFor(browser, client, width);
}
async function shot(page: Page, name: string) {
  if (!shots) return;
  fs.mkdirSync(shots, { recursive: true });
  await page.screenshot({ path: path.join(shots, `${name}.png`), fullPage: true });
}
const tab = (page: Page, name: string) => page.getByRole("navigation", { name: "Job sections" }).getByRole("link", { name, exact: true });
/** Each change refreshes the page from the server; on a busy machine that takes a few seconds. */
const until = <T>(fn: () => Promise<T> | T) => expect.poll(fn, { timeout: 15_000, interval: 100 });
const HAZARD_RED = "rgb(179, 18, 31)"; // --gb-hazard in the day theme (app/globals.css)

test("a television's bring-up and fault hunt", async () => {
  const created = await team.technician.post("/api/jobs", {
    title: "17-inch console television, 1953",
    equipmentKind: "television",
    year: 1953,
    customerName: "Ansel Quarrie",
  });
  expect(created.status).toBe(201);
  const { job } = await created.json();
  const context = await contextFor(team.technician);
  const page = await context.newPage();

  // Tubes: the line-up pasted in one go, then one weak tube with a substitute.
  await page.goto(`${baseUrl()}/jobs/${job.id}/tubes`);
  await page.getByLabel("Tube line-up", { exact: true }).fill("6CB6 6SN7GT 6AQ5 6BQ6GT 6AU4GT 5U4GB");
  await page.getByLabel("Tube type from the tables").selectOption("17BP4A");
  await page.getByRole("button", { name: "Add to the line-up" }).click();
  expect(await page.getByLabel("Tube line-up", { exact: true }).inputValue()).toMatch(/5U4GB 17BP4A$/);
  await page.getByRole("button", { name: "Add these tubes" }).click();
  await until(() => page.getByTestId("tubes").locator(":scope > li").count()).toBe(7);
  // A picture tube takes the CRT position; the others are numbered in the order given.
  expect(await page.getByTestId("tube-CRT").textContent()).toContain("17BP4A");
  expect(await page.getByTestId("tube-V6").textContent()).toContain("5U4GB");

  await page.getByRole("button", { name: "Record result of V2 6SN7GT" }).click();
  const edit = page.getByRole("form", { name: "Edit V2" });
  await edit.getByLabel("Function").fill("Vertical oscillator and output");
  await edit.getByLabel("Tester reading").fill("28");
  await edit.getByLabel("Tester minimum").fill("40");
  await edit.getByLabel("Verdict").selectOption("weak");
  await edit.getByLabel("Substitute").fill("6SN7GTB");
  await edit.getByRole("button", { name: "Save" }).click();
  const v2 = page.getByTestId("tube-V2");
  await until(() => v2.locator("[data-verdict]").textContent()).toBe("Weak");
  expect(await v2.getByTestId("tube-test").textContent()).toMatch(/28.*against its minimum.*40.*below/);
  expect(await v2.getByTestId("tube-differences").textContent()).toMatch(/Heater voltage.*Heater current/s);
  // Every socket counts in the heater string, with the substitute in place of the weak tube.
  const heaterHref = await page.getByTestId("heater-string-link").getAttribute("href");
  expect(heaterHref).toMatch(/^\/bench\/heater-string\?/);
  // The picture tube is only in the tube table, so the heaters go as voltage and current, one per socket.
  const heaters = JSON.parse(new URLSearchParams(heaterHref!.split("?")[1]).get("heaters") ?? "[]") as unknown[];
  expect(heaters).toHaveLength(7);
  expect(await page.getByRole("button", { name: "Remove V1" }).count()).toBe(1);
  await shot(page, "bring-up-tubes");

  // Power-ups: a series-lamp session with a step over the stop current.
  await tab(page, "Power-ups").click();
  await page.waitForURL(/\/power-ups$/);
  expect(await page.getByRole("note", { name: "High voltage" }).count()).toBeGreaterThan(0);
  await page.getByLabel("Limiter").selectOption("series-lamp");
  await page.getByLabel("Stop current").fill("0.6 A");
  await page.getByRole("button", { name: "Start the session" }).click();
  await until(() => page.locator("#pu-lamp-error").textContent()).toMatch(/lamp/i);
  await page.getByLabel("Lamp wattage").fill("150 W");
  await page.getByLabel("Filter capacitors replaced or reformed").check();
  await page.getByLabel("No short on B+, measured with an ohmmeter").check();
  await page.getByRole("button", { name: "Start the session" }).click();
  const session = page.locator("[data-testid^='power-up-']").filter({ has: page.getByRole("heading", { name: /Series lamp, 150 W/ }) });
  await until(() => session.count()).toBe(1);
  expect(await session.getByTestId("checklist-warnings").locator("li").count()).toBe(5);

  const steps: [string, string, string, string][] = [
    ["60 V", "200 mA", "3", "Heaters glowing, lamp dim"],
    ["90 V", "0.45 A", "5", "Raster faint, no smell"],
    ["117 V", "750 mA", "1", "Lamp bright, hum from the flyback"],
  ];
  for (const [volts, amps, minutes, note] of steps) {
    await session.getByLabel("Supply voltage").fill(volts);
    await session.getByLabel("Current drawn").fill(amps);
    await session.getByLabel("Minutes held").fill(minutes);
    await session.getByLabel("What was seen, heard or smelt").fill(note);
    const before = await session.locator("tbody[data-testid^='step-']").count();
    await session.getByRole("button", { name: "Add step" }).click();
    await until(() => session.locator("tbody[data-testid^='step-']").count()).toBe(before + 1);
  }
  const over = session.getByTestId("step-3");
  expect(await over.getAttribute("data-over-stop")).toBe("true");
  expect(await session.getByTestId("step-2").getAttribute("data-over-stop")).toBe("false");
  expect(await over.textContent()).toMatch(/Over the stop current/);
  expect(await over.evaluate((el) => getComputedStyle(el).color)).toBe(HAZARD_RED);
  await until(() => session.getByTestId("power-up-chart").count()).toBe(1);
  await until(() => session.getByTestId("power-up-chart").locator("svg .recharts-reference-line").count()).toBeGreaterThan(0);
  const lampHref = await session.getByTestId("series-lamp-link").getAttribute("href");
  expect(lampHref).toMatch(/^\/bench\/series-lamp\?/);
  expect(new URLSearchParams(lampHref!.split("?")[1]).get("lampPower")).toBe("150");
  expect(new URLSearchParams(lampHref!.split("?")[1]).get("lineVoltage")).toBe("117");
  // The link opens the Bench with the lamp filled in.
  await page.goto(`${baseUrl()}${lampHref}`);
  expect(
    await page
      .getByLabel(/Lamp wattage/)
      .first()
      .inputValue(),
  ).toBe("150");
  await page.goto(`${baseUrl()}/jobs/${job.id}/power-ups`);

  // Passing needs a reason once a step went over.
  await session.getByRole("button", { name: "Mark passed" }).click();
  await until(() => session.locator("[id$='-reason-error']").textContent()).toMatch(/stop current/);
  expect(await session.getByTestId("power-up-outcome").textContent()).toBe("Under way");
  await session.getByLabel("Reason", { exact: true }).fill("Surge while the new filters formed; settled at 0.52 A after two minutes");
  await session.getByRole("button", { name: "Mark passed" }).click();
  await until(() => session.getByTestId("power-up-outcome").textContent()).toBe("Came up well");
  await shot(page, "bring-up-power-ups");

  // Faults: no vertical deflection, candidates in test order.
  await tab(page, "Faults").click();
  await page.waitForURL(/\/faults$/);
  await page.getByRole("button", { name: "Add fault" }).click();
  await until(() => page.locator("#fault-symptom-error").textContent()).toMatch(/symptom/i);
  await page.getByLabel("Symptom", { exact: true }).fill("No vertical deflection");
  await page.getByLabel("Section", { exact: true }).fill("Vertical sweep");
  await page.getByRole("button", { name: "Add fault" }).click();
  const fault = page.locator("article[data-testid^='fault-']").filter({ has: page.getByRole("heading", { name: "No vertical deflection" }) });
  await until(() => fault.count()).toBe(1);
  for (const [i, c] of ["Vertical oscillator", "Vertical output tube", "Vertical output transformer", "Deflection yoke"].entries()) {
    await fault.getByLabel("Next candidate").fill(c);
    await fault.getByRole("button", { name: "Add candidate" }).click();
    await until(() => fault.getByTestId(`candidate-${i + 1}`).count()).toBe(1);
  }
  expect(await fault.getByTestId("fault-state").textContent()).toBe("Open");
  await fault.getByRole("group", { name: "Status of Vertical oscillator" }).getByRole("button", { name: "Ruled out" }).click();
  await until(() => fault.getByTestId("candidate-1").getAttribute("data-status")).toBe("ruled-out");
  await fault.getByRole("group", { name: "Status of Vertical output tube" }).getByRole("button", { name: "Ruled out" }).click();
  await until(() => fault.getByTestId("candidate-2").getAttribute("data-status")).toBe("ruled-out");
  expect(await fault.getByTestId("candidate-3").textContent()).toContain("Test next");

  // The Overview lists the open fault.
  await tab(page, "Overview").click();
  await page.waitForURL(/\/jobs\/\d+$/);
  await until(() => page.getByTestId("open-faults").textContent()).toContain("No vertical deflection");
  await shot(page, "bring-up-overview");

  await tab(page, "Faults").click();
  await page.waitForURL(/\/faults$/);
  await fault.getByRole("button", { name: "Add evidence for Vertical output transformer" }).click();
  await fault.getByLabel("Evidence", { exact: true }).fill("Primary open: no continuity from B+ to the plate lead");
  await fault.getByRole("button", { name: "Save evidence" }).click();
  await until(() => fault.getByTestId("candidate-3").textContent()).toContain("Primary open");
  await fault.getByRole("group", { name: "Status of Vertical output transformer" }).getByRole("button", { name: "The cause" }).click();
  await until(() => fault.getByTestId("fault-state").textContent()).toBe("Cause found");
  await fault.getByRole("textbox", { name: "Resolution" }).fill("Rewound the vertical output transformer; full height, linearity set");
  await fault.getByRole("button", { name: "Save resolution" }).click();
  await until(() => fault.getByTestId("fault-state").textContent()).toBe("Fixed");
  await shot(page, "bring-up-faults");

  await tab(page, "Overview").click();
  await page.waitForURL(/\/jobs\/\d+$/);
  await until(() => page.getByTestId("no-open-faults").count()).toBe(1);
  expect(await page.getByTestId("open-faults").count()).toBe(0);
  await context.close();

  // An apprentice records but never removes.
  const apprentice = await contextFor(team.apprentice);
  const ap = await apprentice.newPage();
  await ap.goto(`${baseUrl()}/jobs/${job.id}/tubes`);
  await ap.getByTestId("tube-V1").waitFor();
  expect(await ap.getByRole("button", { name: /^Remove/ }).count()).toBe(0);
  expect(await ap.getByRole("button", { name: "Record result of V1 6CB6" }).count()).toBe(1);
  await apprentice.close();

  // At phone width every new tab fits without sideways scrolling.
  const phone = await contextFor(team.technician, 390);
  const small = await phone.newPage();
  for (const section of ["tubes", "power-ups", "faults", ""]) {
    await small.goto(`${baseUrl()}/jobs/${job.id}${section ? `/${section}` : ""}`);
    await small.getByRole("heading", { level: 1 }).waitFor();
    await small.waitForLoadState("networkidle");
    expect(await small.evaluate(() => document.documentElement.scrollWidth), section || "overview").toBeLessThanOrEqual(390);
    await shot(small, `bring-up-390-${section || "overview"}`);
  }
  await phone.close();
}, 120_000); // a long journey: every step refreshes the page from the server

test("moving to ready with an open fault lists the checks and goes on only with a reason", async () => {
  const created = await team.technician.post("/api/jobs", { title: "Table television, 1951", equipmentKind: "television" });
  const { job } = await created.json();
  expect((await team.technician.post(`/api/jobs/${job.id}/faults`, { symptom: "Picture rolls" })).status).toBe(201);
  const context = await contextFor(team.technician);
  const page = await context.newPage();
  await page.goto(`${baseUrl()}/jobs/${job.id}`);
  await page.getByLabel("Or set the status to").selectOption("at-the-counter");
  await page.getByRole("button", { name: "Set status" }).click();
  const checks = page.getByTestId("ready-checks");
  await until(() => checks.count()).toBe(1);
  expect(await checks.textContent()).toContain("Picture rolls");
  expect(await checks.locator("[data-check='no-passed-power-up']").count()).toBe(1);
  await shot(page, "bring-up-ready-checks");
  await checks.getByRole("button", { name: /anyway/ }).click();
  await until(() => page.locator("[id$='-reason-error']").first().textContent()).toMatch(/why/i);
  expect(await page.getByTestId("status-badge").first().textContent()).not.toBe("At the counter");
  await checks.getByLabel("Reason to continue").fill("Customer collects today; the roll is noted on the bench sheet");
  await checks.getByRole("button", { name: /anyway/ }).click();
  await until(() => page.getByTestId("status-badge").first().textContent()).toBe("At the counter");
  await context.close();
});
