import fs from "node:fs";
import path from "node:path";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";

/**
 * The four newer pictures draw on their worked examples at desktop and phone widths, every line named
 * for what it is and none called safe, without widening the page.
 */

let browser: Browser;
const shots = process.env.GLOWBENCH_SCREENSHOTS; // folder for screenshots of each picture, when set

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const PICTURES: { slug: string; labels: string[] }[] = [
  { slug: "series-lamp", labels: ["25 W lamp", "40 W lamp", "60 W lamp", "100 W lamp", "Set alone, no lamp", "Dead short, 60 W lamp"] },
  { slug: "reforming", labels: ["Rated voltage (450 V)", "Voltage applied"] },
  { slug: "coupling-cap", labels: ["Corner (−3 dB)", "Signal reaching the next grid", "−3 dB (71 %)"] },
  { slug: "superhet", labels: ["Signal", "Oscillator", "Image", "One tuned circuit, Q 100"] },
];

test.each(PICTURES.flatMap((p) => [1280, 390].map((w) => [p.slug, w, p.labels] as const)))(
  "%s at %i px: the picture names every line",
  async (slug, width, labels) => {
    const page = await browser.newPage({ viewport: { width, height: 900 } });
    await page.goto(`${baseUrl()}/bench/${slug}`);
    const chart = page.getByTestId("chart").first();
    await chart.locator("svg.recharts-surface").first().waitFor({ timeout: 15_000 });
    await expect.poll(async () => (await chart.locator("svg text").allTextContents()).join(" | "), { timeout: 10_000 }).toContain(labels[labels.length - 1]);
    const texts = (await chart.locator("svg text").allTextContents()).join(" | ");
    for (const label of labels) expect(texts, `${slug}: "${label}"`).toContain(label);
    expect(await chart.textContent()).not.toMatch(/\bsafe(ly|ty)?\b/i);
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    if (shots) {
      fs.mkdirSync(shots, { recursive: true });
      await chart.scrollIntoViewIfNeeded();
      await chart.screenshot({ path: path.join(shots, `${slug}-chart-${width}.png`) });
      await page.screenshot({ path: path.join(shots, `${slug}-${width}.png`), fullPage: true });
    }
    await page.close();
  },
);
