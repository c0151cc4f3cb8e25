import type { Page } from "playwright-core";
import { expect } from "vitest";
import { formatOutput } from "../../lib/bench/display";
import { getCalculator } from "../../lib/calc/registry";
import { runCalculator, type CalculationResponse } from "../../lib/calc/run";

/** What the Bench should show for these inputs, worked out with the same calculator module. */
export function expected(slug: string, raw: Record<string, unknown>): CalculationResponse {
  const run = runCalculator(getCalculator(slug)!, raw);
  if (!run.ok) throw new Error(`test inputs rejected: ${run.error.message}`);
  return run.result;
}

export function shown(slug: string, result: CalculationResponse, name: string): string {
  const meta = getCalculator(slug)!.outputs.find((o) => o.name === name)!;
  return formatOutput(getCalculator(slug)!.bench, meta, result.outputs[name]);
}

export async function expectOutput(page: Page, slug: string, result: CalculationResponse, name: string) {
  await expect.poll(() => page.getByTestId(`output-${name}`).first().textContent()).toBe(shown(slug, result, name));
}

/** The LaTeX of the steps on the page (KaTeX keeps its source in an annotation), once KaTeX has drawn them. */
export async function expectSteps(page: Page, result: CalculationResponse) {
  const working = page.getByTestId("working");
  if ((await working.getAttribute("open")) === null) await working.locator("summary").click();
  await expect
    .poll(() => page.locator('[data-testid="steps"] annotation[encoding="application/x-tex"]').allTextContents(), { timeout: 10_000 })
    .toEqual(result.steps.map((s) => s.latex));
}

/** Start using the form (the calculator module loads on first use) and wait until results follow keystrokes. */
export async function ready(page: Page) {
  await page.locator('form[aria-labelledby="inputs-title"]').locator("input, select").first().focus();
  await page.waitForFunction(() => document.documentElement.dataset.benchReady === "1", null, { timeout: 15_000 });
}
