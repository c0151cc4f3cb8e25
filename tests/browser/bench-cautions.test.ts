import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { ready } from "./bench-helpers";

/**
 * Cautions that follow the inputs (docs/PRODUCT.md "Safety rules": any voltage typed above 50 V shows the
 * danger banner, even while another field is invalid), the short caution on the pages that lead to the
 * calculators, and the working's formulas: they wrap or scroll in their own box, never the page.
 */

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function open(path: string, width = 1280, height = 900): Promise<Page> {
  const page = await browser.newPage({ viewport: { width, height } });
  await page.goto(`${baseUrl()}${path}`);
  await ready(page);
  return page;
}

const banner = (page: Page) => page.getByTestId("danger-banner");

test("a typed 350 V shows the danger banner while another field is invalid", async () => {
  const page = await open("/bench/ohms-law");
  await page.fill("#in-voltage", "6.3");
  await page.fill("#in-resistance", "lots");
  await expect.poll(() => page.getByTestId("no-result").count()).toBe(1);
  expect(await banner(page).count()).toBe(0); // 6.3 V: no caution that fires wrongly
  await page.fill("#in-voltage", "350 V");
  await expect.poll(() => banner(page).count()).toBe(1);
  expect(await page.getByTestId("danger-typed").textContent()).toBe("Voltage across: 350 V, above 50 V.");
  const text = (await banner(page).textContent()) ?? "";
  // The same points as lib/calc/safety.ts's caution, and nothing called safe.
  for (const point of ["can kill", "Discharge every capacitor", "current-limited supply", "one hand", "local electrical codes and licensed practice"]) {
    expect(text).toContain(point);
  }
  expect(text).not.toMatch(/\bsafe\b/i);
  expect(await page.getByTestId("no-result").count()).toBe(1);
  await page.fill("#in-voltage", "0,35 kV"); // a decimal comma and a prefix, read by the same parser
  await expect.poll(() => page.getByTestId("danger-typed").textContent()).toBe("Voltage across: 350 V, above 50 V.");
  await page.fill("#in-voltage", "48");
  await expect.poll(() => banner(page).count()).toBe(0);
  await page.close();
});

test("a heater's voltage inside the list counts too, with the line voltage blank", async () => {
  const page = await open("/bench/heater-string");
  await page.getByText("By heater rating").click();
  await page.getByRole("button", { name: "Add heater" }).click();
  await page.fill("#in-lineVoltage", "");
  await page.fill("#in-heaters-0-voltage", "6.3");
  await page.fill("#in-heaters-0-current", "300m");
  await expect.poll(() => page.getByTestId("no-result").count()).toBe(1);
  await expect.poll(() => banner(page).count()).toBe(0);
  await page.fill("#in-heaters-0-voltage", "117");
  await expect.poll(() => banner(page).count()).toBe(1);
  expect(await page.getByTestId("danger-typed").textContent()).toMatch(/^Heater 1 voltage: 117 V/);
  await page.close();
});

test("cathode bias and supply ripple always carry the banner, like bleeder and arc clearance", async () => {
  for (const [slug, field] of [
    ["cathode-bias", "#in-biasVoltage"],
    ["supply-ripple", "#in-loadCurrent"],
  ] as const) {
    const page = await open(`/bench/${slug}`);
    expect(await banner(page).count(), slug).toBe(1);
    await page.fill(field, "");
    await expect.poll(() => page.getByTestId("no-result").count()).toBe(1);
    expect(await banner(page).count(), slug).toBe(1);
    await page.close();
  }
});

test("the home page and the Bench index carry the short caution", async () => {
  const page = await browser.newPage();
  for (const path of ["/", "/bench"]) {
    await page.goto(`${baseUrl()}${path}`);
    const note = page.getByTestId("hv-note");
    expect(await note.count(), path).toBe(1);
    const text = (await note.textContent()) ?? "";
    expect(text).toMatch(/lethal/);
    expect(text).toMatch(/local electrical codes and licensed practice/);
    expect(text).not.toMatch(/\bsafe\b/i);
  }
  await page.close();
});

/** Opens the working and waits until KaTeX has drawn the steps (or the page says there are none). */
async function openWorking(page: Page) {
  const working = page.getByTestId("working");
  if ((await working.getAttribute("open")) === null) await working.locator("summary").click();
  await page.waitForFunction(() => {
    const steps = document.querySelector('[data-testid="steps"]');
    return !steps || steps.querySelectorAll(".katex-display").length > 0;
  });
  await page.evaluate(() => document.fonts.ready);
}

/** Each formula in the working: inside its box, and its content either fits or scrolls there. */
function clippedFormulas(page: Page) {
  return page.evaluate(() => {
    const scrolls = (el: Element) => ["auto", "scroll"].includes(getComputedStyle(el).overflowX);
    const bad: string[] = [];
    for (const d of document.querySelectorAll<HTMLElement>('[data-testid="working"] .katex-display')) {
      const container = d.parentElement!;
      const box = (d.closest("li") ?? container).getBoundingClientRect();
      const r = d.getBoundingClientRect();
      const inside = r.left >= box.left - 1 && r.right <= box.right + 1;
      const fits = d.scrollWidth <= container.clientWidth + 1 || scrolls(d) || scrolls(container);
      if (!inside || !fits) bad.push(`${d.textContent?.slice(0, 60)} (${d.scrollWidth} in ${container.clientWidth})`);
    }
    return bad;
  });
}

test("the working never pushes the page sideways at 390 px, nor clips a formula at 1280 px, on every calculator", async () => {
  const list = (await (await fetch(`${baseUrl()}/api/calculators`)).json()) as { slug: string }[];
  expect(list.length).toBeGreaterThan(10);
  for (const width of [390, 1280]) {
    const page = await browser.newPage({ viewport: { width, height: 900 } });
    for (const { slug } of list) {
      await page.goto(`${baseUrl()}/bench/${slug}`);
      await ready(page);
      await openWorking(page);
      const sideways = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(sideways, `${slug} at ${width} px scrolls sideways by ${sideways} px`).toBeLessThanOrEqual(0);
      expect(await clippedFormulas(page), `${slug} at ${width} px`).toEqual([]);
    }
    await page.close();
  }
}, 240_000);
