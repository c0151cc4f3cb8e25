import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { expectOutput, expectSteps, expected, ready } from "./bench-helpers";
import { getCalculator } from "@/lib/calc/registry";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function open(path: string): Promise<Page> {
  const page = await browser.newPage();
  await page.goto(`${baseUrl()}${path}`);
  await ready(page);
  return page;
}

test("cathode bias: typed values give the result and the substituted steps, and the address keeps them", async () => {
  const page = await open("/bench/cathode-bias");
  await page.fill("#in-biasVoltage", "2.5");
  await page.fill("#in-plateCurrent", "1.25m");
  await page.fill("#in-bypassCapacitance", "");
  const result = expected("cathode-bias", { biasVoltage: "2.5", plateCurrent: "1.25m", screenCurrent: "0" });
  await expect.poll(() => page.getByTestId("output-cathodeResistance").textContent()).toBe("2 kΩ"); // 2.5 V / 1.25 mA
  await expectOutput(page, "cathode-bias", result, "dissipation");
  await expectSteps(page, result);
  await expect.poll(() => new URL(page.url()).searchParams.get("plateCurrent")).toBe("1.25m");
  await page.reload();
  expect(await page.inputValue("#in-biasVoltage")).toBe("2.5");
  expect(await page.getByTestId("output-cathodeResistance").textContent()).toBe("2 kΩ");
  await page.close();
});

test("dropping resistor: engineering notation in, engineering notation out", async () => {
  const page = await open("/bench/dropping-resistor");
  const raw = { supplyVoltage: "350 V", loadVoltage: "275", loadCurrent: "4.5 mA" };
  for (const [k, v] of Object.entries(raw)) await page.fill(`#in-${k}`, v);
  const result = expected("dropping-resistor", raw);
  for (const name of ["resistance", "suggestedRating", "nearestPreferred", "loadVoltageWithPreferred"])
    await expectOutput(page, "dropping-resistor", result, name);
  await expectSteps(page, result);
  await page.close();
});

test("supply ripple: adding an LC stage shows the ripple after it, in the table and the picture", async () => {
  const page = await open("/bench/supply-ripple");
  await page.getByRole("button", { name: "Add LC stage" }).click();
  await page.fill("#in-stages-1-inductance", "8 H");
  // The page opens on the worked example of the calculator's descriptor; the test adds one LC stage to it.
  const example = getCalculator("supply-ripple")!.bench.example as Record<string, unknown>;
  const raw = {
    ...example,
    lineFrequency: "60",
    stages: [...(example.stages as unknown[]), { kind: "lc", inductance: "8 H", capacitance: "20 uF" }],
  };
  const result = expected("supply-ripple", raw);
  await expectOutput(page, "supply-ripple", result, "finalRippleRms");
  await expect.poll(() => page.locator('[data-testid="output-stages"] tbody tr').count()).toBe(2);
  await expect.poll(() => page.getByTestId("ripple-stages").locator("li").count()).toBe(3);
  expect(await page.getByTestId("chart").count()).toBeGreaterThan(0);
  await expectSteps(page, result);
  await page.close();
});

test("heater string: by heater rating, then a tube not in the table gets a field message", async () => {
  const page = await open("/bench/heater-string");
  await page.getByText("By heater rating").click();
  await page.getByRole("button", { name: "Add heater" }).click();
  await page.getByRole("button", { name: "Add heater" }).click();
  await page.fill("#in-heaters-1-voltage", "35");
  await page.fill("#in-lineVoltage", "117");
  const result = expected("heater-string", {
    lineVoltage: "117",
    heaters: [
      { voltage: "12.6", current: "150m" },
      { voltage: "35", current: "150m" },
    ],
  });
  await expectOutput(page, "heater-string", result, "droppingResistance");
  await expectOutput(page, "heater-string", result, "stringVoltage");
  await page.getByText("By tube type").click();
  await page.fill("#in-tubes-0", "99ZZ9");
  await expect.poll(() => page.locator("#in-tubes-0-error").textContent()).toContain("99ZZ9");
  expect(await page.getByTestId("result").count()).toBe(0);
  await page.close();
});

test("colour code: picking bands reads the value", async () => {
  const page = await open("/bench/colour-code");
  await page.selectOption("#in-bands-0", "brown");
  await page.selectOption("#in-bands-1", "black");
  await page.selectOption("#in-bands-2", "orange");
  await expect.poll(() => page.getByTestId("output-resistance").textContent()).toBe("10 kΩ");
  await page.getByRole("button", { name: "Add band" }).click();
  const result = expected("colour-code", { bands: ["brown", "black", "black", "orange", "gold"] });
  await expectOutput(page, "colour-code", result, "resistance");
  await page.close();
});

test("bad input shows a plain message under the field and no result", async () => {
  const page = await open("/bench/cathode-bias");
  await page.fill("#in-plateCurrent", "lots");
  await expect.poll(() => page.locator("#in-plateCurrent-error").textContent()).toMatch(/Plate current could not read "lots"/);
  expect(await page.getAttribute("#in-plateCurrent", "aria-invalid")).toBe("true");
  expect(await page.getAttribute("#in-plateCurrent", "aria-describedby")).toContain("in-plateCurrent-error");
  expect(await page.getByTestId("result").count()).toBe(0);
  expect(await page.getByTestId("no-result").count()).toBe(1);
  await page.fill("#in-plateCurrent", "2m");
  await expect.poll(() => page.getByTestId("result").count()).toBe(1);
  expect(await page.locator("#in-plateCurrent-error").textContent()).toBe("");
  await page.close();
});

test("the danger banner: above 50 V, always on arc clearance and bleeder, absent at low voltage", async () => {
  const page = await open("/bench/ohms-law");
  expect(await page.getByTestId("danger-banner").count()).toBe(1); // the example is 250 V
  await page.fill("#in-voltage", "6.3");
  await expect.poll(() => page.getByTestId("danger-banner").count()).toBe(0);
  await page.fill("#in-voltage", "90");
  await expect.poll(() => page.getByTestId("danger-banner").count()).toBe(1);
  expect(await page.getByTestId("danger-banner").textContent()).toContain("verify with a meter");
  await page.close();
  for (const slug of ["arc-clearance", "bleeder"]) {
    const p = await open(`/bench/${slug}`);
    expect(await p.getByTestId("danger-banner").count()).toBe(1);
    await p.fill(slug === "bleeder" ? "#in-capacitance" : "#in-peakVoltage", "");
    await expect.poll(() => p.getByTestId("no-result").count()).toBe(1);
    expect(await p.getByTestId("danger-banner").count()).toBe(1);
    await p.close();
  }
});

async function signedInPage(email: string): Promise<Page> {
  const context = await browser.newContext();
  const res = await context.request.post(`${baseUrl()}/api/auth/sign-in`, { data: { email, password: "glowbench-demo" } });
  expect(res.status()).toBe(200);
  return context.newPage();
}

test("an apprentice sees the working open; a technician opens it by keyboard", async () => {
  const apprentice = await signedInPage("apprentice@demo.test");
  await apprentice.goto(`${baseUrl()}/bench/time-constant`);
  expect(await apprentice.getAttribute('[data-testid="working"]', "open")).not.toBeNull();
  expect(await apprentice.getByTestId("steps").isVisible()).toBe(true);
  await apprentice.context().close();

  const tech = await signedInPage("tech@demo.test");
  await tech.goto(`${baseUrl()}/bench/time-constant`);
  await ready(tech);
  expect(await tech.getAttribute('[data-testid="working"]', "open")).toBeNull();
  expect(await tech.getByTestId("steps").isVisible()).toBe(false);
  await tech.locator('[data-testid="working"] > summary').focus();
  await tech.keyboard.press("Enter");
  await expect.poll(() => tech.getByTestId("steps").isVisible()).toBe(true);
  expect(await tech.getByTestId("sign-in-invitation").count()).toBe(0);
  await tech.context().close();
});
