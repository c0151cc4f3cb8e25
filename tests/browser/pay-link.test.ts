import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, expect, test } from "vitest";
import { inject } from "vitest";
import { launchBrowser } from "../helpers/browser";
import { baseUrl } from "../helpers/http";
import { linkIn, waitForMail } from "../helpers/mail";
import { createJob, ownWorkshop } from "../helpers/money-fixtures";

/**
 * The invoice the customer pays in Chromium: the owner e-mails it from the invoice page, the customer opens
 * the link on a phone (390 px, no sideways scroll), pays through the fake Checkout, and the owner sees
 * sent, opened and paid.
 */

const shots = process.env.GLOWBENCH_SCREENSHOTS; // folder for screenshots, when set
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function shot(page: Page, name: string) {
  if (shots) await page.screenshot({ path: path.join(shots, `${name}.png`), fullPage: true });
}

const sideways = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
const done = (page: Page, step: string) => page.getByTestId(`delivery-${step}`).getAttribute("data-done");

test("the owner e-mails the invoice, the customer pays from a phone, the owner sees sent, opened and paid", { timeout: 90_000 }, async () => {
  const shop = await ownWorkshop("Fernhill");
  const email = `phone-${Date.now()}@example.com`;
  const { jobId } = createJob(shop.workshopId, { status: "at-the-counter", customerEmail: email });
  const issued = await shop.owner.post(`/api/jobs/${jobId}/invoices`, {
    lines: [
      { kind: "labour", description: "Replace every paper and electrolytic capacitor, then bring up slowly on the bench supply", quantity: "1.5" },
      { kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "25.00" },
    ],
  });
  expect(issued.status).toBe(201);
  const invoice = (await issued.json()) as { id: number };

  // The owner sends it from the invoice page.
  const ownerCtx = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  ownerCtx.setDefaultTimeout(10_000);
  expect((await ownerCtx.request.post(`${baseUrl()}/api/auth/sign-in`, { data: { email: shop.email, password: "a sturdy passphrase" } })).status()).toBe(200);
  const owner = await ownerCtx.newPage();
  await owner.goto(`${baseUrl()}/invoices/${invoice.id}`, { waitUntil: "networkidle" });
  expect(await done(owner, "sent")).toBe("no");
  await owner.getByLabel(/A note at the top of the e-mail/).fill("Your radio is playing again. Thank you for waiting.");
  await owner.getByRole("button", { name: `E-mail it to ${email}` }).click();
  // Rendering the PDF and handing the mail over can take a few seconds on a busy machine.
  await expect.poll(() => owner.getByText(`Sent to ${email} with the PDF and a link to pay.`).count(), { timeout: 15_000 }).toBe(1);
  await expect.poll(() => done(owner, "sent"), { timeout: 5_000 }).toBe("yes");
  const mail = await waitForMail(email);
  expect(mail.attachments.map((a) => a.contentType)).toContain("application/pdf");
  const link = linkIn(mail, "/pay/");

  // The customer opens it on a phone: the lines stack, nothing scrolls sideways.
  const phone = await (await browser.newContext({ viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true })).newPage();
  await phone.goto(link, { waitUntil: "networkidle" });
  expect(await phone.getByTestId("total").textContent()).toBe("£111.00");
  expect(await phone.getByText("Please keep the back on").count()).toBe(1);
  expect(await sideways(phone)).toBeLessThanOrEqual(0);
  await shot(phone, "pay-link-390");
  const desk = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await desk.goto(link, { waitUntil: "networkidle" });
  expect(await sideways(desk)).toBeLessThanOrEqual(0);
  await shot(desk, "pay-link-1280");

  await owner.reload({ waitUntil: "networkidle" });
  expect(await done(owner, "viewed")).toBe("yes");
  expect(await done(owner, "paid")).toBe("no");

  // Pay by card through the payment service's page, and back to a thank-you.
  await phone.getByRole("button", { name: "Pay £111.00 by card" }).click();
  await phone.waitForURL(new RegExp(`^${inject("paymentsUrl")}/checkout/`));
  await phone.getByRole("button", { name: /^Pay / }).click();
  await phone.waitForURL(/\/pay\/done\?session=/);
  expect(await phone.getByTestId("paid").textContent()).toBe("Paid, thank you");
  expect(await sideways(phone)).toBeLessThanOrEqual(0);
  await shot(phone, "pay-done-390");
  // The link now only thanks.
  await phone.goto(link, { waitUntil: "networkidle" });
  expect(await phone.getByTestId("paid").textContent()).toBe("Paid, thank you");
  expect(await phone.getByRole("button", { name: /by card/ }).count()).toBe(0);

  await owner.reload({ waitUntil: "networkidle" });
  expect(await owner.getByTestId("invoice-status").textContent()).toBe("Paid");
  expect(await done(owner, "paid")).toBe("yes");
  await shot(owner, "invoice-sent-opened-paid");
});
