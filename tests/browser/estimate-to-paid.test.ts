import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { inject } from "vitest";
import path from "node:path";
import { launchBrowser } from "../helpers/browser";
import { DEMO_PASSWORD, baseUrl } from "../helpers/http";
import { approvalLinkFor, createJob, logTexts, ownMember, setJobStatus, workshopIdByName } from "../helpers/money-fixtures";

/** The whole money journey in Chromium: estimate → customer approval → invoice → paid through the fake checkout. */

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(inject("dataDir"), `${name}.png`), fullPage: true });

async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${baseUrl()}/sign-in`);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(/\/jobs$/);
}

// Four people sign in and three pages render PDFs or take payments: a minute on a busy two-core machine.
test("a technician quotes, the customer approves from the e-mail, the owner invoices and the card payment lands", { timeout: 90_000 }, async () => {
  const email = `journey-${Date.now()}@example.com`;
  const { jobId } = createJob(workshopIdByName("Lamplight Radio Workshop"), {
    status: "customer-weighing-up",
    customerEmail: email,
    parts: [{ designator: "C5a", unitCostMinor: 240 }],
  });

  // The technician prepares the estimate.
  const techPage = await (await browser.newContext()).newPage();
  await signIn(techPage, "tech@demo.test");
  await techPage.goto(`${baseUrl()}/jobs/${jobId}/estimate`);
  await techPage.getByRole("button", { name: "Add labour" }).click();
  await techPage.locator("#line-0-quantity").fill("2.5");
  await techPage.getByRole("button", { name: "Add fee" }).click();
  await techPage.locator("#line-1-price").fill("25");
  await techPage.getByRole("combobox").selectOption({ label: "C5a 0.047 µF (£2.40)" });
  // 2.5 h × £45 = £112.50; fee £25.00; C5a £2.40 → subtotal £139.90; 20% tax £27.98; total £167.88
  await expect.poll(() => techPage.getByTestId("editor-total").textContent()).toBe("£167.88");
  await techPage.getByRole("button", { name: /Save the estimate/ }).click();
  await expect.poll(() => techPage.getByTestId("estimate-status").textContent()).toBe("Draft");
  await shot(techPage, "estimate-editor");
  await techPage.getByRole("button", { name: "Send to the customer for approval" }).click();
  await expect.poll(() => techPage.getByRole("status").filter({ hasText: "Sent to" }).count()).toBe(1);

  // The customer opens the link without an account and approves.
  const link = await approvalLinkFor(email);
  const customer = await (await browser.newContext()).newPage();
  await customer.goto(link);
  expect(await customer.getByTestId("total").textContent()).toBe("£167.88");
  expect(await customer.getByText("Please keep the back on").count()).toBe(1);
  await shot(customer, "estimate-customer");
  await customer.getByRole("button", { name: "Approve the estimate" }).click();
  await expect.poll(() => customer.getByText("the workshop will go ahead").count()).toBe(1);
  expect(logTexts(jobId, "estimate").at(-1)).toBe("Iona Testwell approved the estimate.");

  // The set is ready; the owner issues the invoice from the approved lines and takes the payment.
  setJobStatus(jobId, "at-the-counter");
  const owner = await (await browser.newContext()).newPage();
  await signIn(owner, "owner@demo.test");
  await owner.goto(`${baseUrl()}/jobs/${jobId}`);
  await owner.getByRole("link", { name: "Estimate", exact: true }).click();
  await owner.waitForURL(/\/estimate$/);
  await expect.poll(() => owner.getByTestId("estimate-status").textContent()).toBe("Approved by the customer");
  await owner.getByRole("button", { name: "Issue the invoice" }).click();
  await owner.waitForURL(/\/invoices\/\d+$/);
  expect(await owner.getByTestId("invoice-status").textContent()).toBe("Issued, not paid");
  expect(await owner.getByTestId("total").textContent()).toBe("£167.88");
  await shot(owner, "invoice-issued");
  await owner.getByRole("button", { name: "Pay by card" }).click();
  await owner.waitForURL(new RegExp(`^${inject("paymentsUrl")}/checkout/`));
  expect(await owner.getByTestId("checkout-total").textContent()).toBe("£167.88");
  await shot(owner, "fake-checkout");
  await owner.getByRole("button", { name: /^Pay / }).click();
  await owner.waitForURL(/\/invoices\/\d+\?paid=1$/);
  expect(await owner.getByTestId("invoice-status").textContent()).toBe("Paid");
  expect(await owner.getByText("Payment received").count()).toBe(1);
  await shot(owner, "invoice-paid");
  expect(logTexts(jobId, "invoice").at(-1)).toMatch(/^Invoice \d+ paid by card\.$/);

  // The apprentice sees no prices.
  const apprentice = await (await browser.newContext()).newPage();
  const own = await ownMember(workshopIdByName("Lamplight Radio Workshop"), "apprentice");
  await signIn(apprentice, own.email, "a sturdy passphrase");
  await apprentice.goto(`${baseUrl()}/jobs/${jobId}/estimate`);
  expect(await apprentice.getByText("Prices are kept to the owner and technicians").count()).toBe(1);
  expect(await apprentice.getByText("£").count()).toBe(0);
  // The Log tells the story without amounts.
  await apprentice.goto(`${baseUrl()}/jobs/${jobId}/log`);
  await expect.poll(() => apprentice.getByText("Iona Testwell approved the estimate.").count()).toBe(1);
  expect(await apprentice.getByText(/paid by card/).count()).toBe(1);
  expect(await apprentice.getByText("£").count()).toBe(0);
  await shot(apprentice, "log-apprentice");
});
