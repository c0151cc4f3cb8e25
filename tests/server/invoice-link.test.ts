import { beforeAll, describe, expect, test } from "vitest";
import { inject } from "vitest";
import { Client, baseUrl } from "../helpers/http";
import { linkIn, waitForMail, type ReceivedMail } from "../helpers/mail";
import { createJob, logTexts, ownMember, ownWorkshop, testDb } from "../helpers/money-fixtures";

/**
 * The invoice the customer can pay, through the real server: the owner e-mails it with its PDF and a
 * single-use link (hashed, expiring, retired by a new send); the customer opens it without an account, the
 * first open is recorded, "Pay by card" goes through the payment service's Checkout, and once paid the
 * link only says thank you (410 for a second payment).
 */

// 1.5 h × £45.00 = 6750; fee £25.00 = 2500; subtotal 9250; 20% tax 1850; total 11100 (£111.00)
const lines = [
  { kind: "labour", description: "Recap and safety check", quantity: "1.5" },
  { kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "25.00" },
];

let A: Awaited<ReturnType<typeof ownWorkshop>>;
let B: Awaited<ReturnType<typeof ownWorkshop>>;
beforeAll(async () => {
  A = await ownWorkshop("Ashcombe");
  B = await ownWorkshop("Birchover");
});

let counter = 0;
async function issuedInvoice(customerEmail: string | null = `pay-${Date.now()}-${counter++}@example.com`) {
  const { jobId } = createJob(A.workshopId, { status: "at-the-counter", customerEmail });
  const res = await A.owner.post(`/api/jobs/${jobId}/invoices`, { lines });
  expect(res.status).toBe(201);
  return { jobId, invoice: (await res.json()) as { id: number; number: number; totalMinor: number }, email: customerEmail };
}

/** Sends the invoice and returns the e-mail and the pay link's token (the nth message to that address). */
async function send(invoiceId: number, email: string, count = 1, body: Record<string, unknown> = {}) {
  const res = await A.owner.post(`/api/invoices/${invoiceId}/send`, body);
  expect(res.status).toBe(200);
  const mail = await waitForMail(email, { count });
  const link = linkIn(mail, "/pay/");
  return { res: await res.json(), mail, link, token: new URL(link).pathname.split("/pay/")[1] };
}

const pay = (token: unknown) => new Client().post("/api/pay/checkout", { token });
const page = async (token: string) => {
  const res = await fetch(`${baseUrl()}/pay/${token}`);
  return { status: res.status, html: await res.text() };
};
const owned = async (id: number) => (await (await A.owner.get(`/api/invoices/${id}`)).json()) as Record<string, unknown>;

describe("sending the invoice", () => {
  test("the e-mail carries the PDF and a pay link; only the token's hash is stored; the owner's outbox shows it", async () => {
    const { invoice, email, jobId } = await issuedInvoice();
    const { res, mail, token } = await send(invoice.id, email!, 1, { note: "Thank you for your patience with this one." });
    expect(res.sentTo).toBe(email);
    expect(JSON.stringify(res)).not.toMatch(/token/i);
    expect(token.length).toBeGreaterThanOrEqual(40);
    const pdf = mail.attachments.find((a) => a.contentType === "application/pdf");
    expect(pdf?.filename).toBe(`invoice-${invoice.number}.pdf`);
    expect(pdf!.content.subarray(0, 5).toString()).toBe("%PDF-");
    expect(mail.headers["x-glowbench-workshop"]).toBe(String(A.workshopId));
    expect(mail.subject).toContain("£111.00");
    expect(mail.text).toContain("Thank you for your patience with this one.");
    const stored = testDb().prepare("SELECT pay_token_hash AS h, pay_token_expires_at AS e FROM invoices WHERE id = ?").get(invoice.id) as {
      h: string;
      e: number;
    };
    expect(stored.h).toMatch(/^[0-9a-f]{64}$/);
    expect(stored.h).not.toContain(token);
    // About 30 days, give or take the test's own run time.
    expect(Math.round((stored.e - Date.now()) / 86_400_000)).toBe(30);
    const seen = await owned(invoice.id);
    expect(seen.sentTo).toBe(email);
    expect(seen.sentAt).toBeTruthy();
    expect(seen.viewedAt).toBeNull();
    expect(JSON.stringify(seen)).not.toMatch(/payTokenHash|checkoutSessionId/);
    expect(logTexts(jobId, "invoice").at(-1)).toBe(`Invoice ${invoice.number} e-mailed to ${email} with a link to pay by card.`);
  });

  test("the e-mail speaks to the customer: a plain reminder to keep the back on, none of the bench's procedure", async () => {
    const { invoice, email } = await issuedInvoice();
    const { mail } = await send(invoice.id, email!);
    assertCustomerWording(mail.text);
  });

  test("bad input is a 400 naming the field, never a 500", async () => {
    const { invoice } = await issuedInvoice();
    const long = await A.owner.post(`/api/invoices/${invoice.id}/send`, { note: "x".repeat(1001) });
    expect(long.status).toBe(400);
    expect((await long.json()).error.fields.note).toMatch(/1000/);
    const wrongType = await A.owner.post(`/api/invoices/${invoice.id}/send`, { note: 42 });
    expect(wrongType.status).toBe(400);
    expect((await wrongType.json()).error.fields.note).toBeTruthy();
    expect((await A.owner.post(`/api/invoices/${invoice.id}/send`, "note", { "content-type": "text/plain" })).status).toBe(415);
    expect((await A.owner.post(`/api/invoices/${invoice.id}/send`, "{not json", { "content-type": "application/json" })).status).toBe(400);
    for (const body of [{}, { token: 7 }, { token: "short" }, { token: "x".repeat(201) }]) {
      const res = await pay((body as { token?: unknown }).token);
      expect(res.status).toBe(400);
      expect((await res.json()).error.fields.token).toBeTruthy();
    }
    expect((await new Client().post("/api/pay/checkout", "token", { "content-type": "text/plain" })).status).toBe(415);
  });

  test("a job without the customer's e-mail, a void or a paid invoice cannot be sent (409)", async () => {
    const noMail = await issuedInvoice(null);
    const res = await A.owner.post(`/api/invoices/${noMail.invoice.id}/send`, {});
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/e-mail/);
    const voided = await issuedInvoice();
    await A.owner.post(`/api/invoices/${voided.invoice.id}/void`, {});
    expect((await A.owner.post(`/api/invoices/${voided.invoice.id}/send`, {})).status).toBe(409);
  });
});

describe("who may send", () => {
  test.each(["technician", "apprentice"] as const)("the %s role gets 403", async (role) => {
    const { invoice } = await issuedInvoice();
    const { client } = await ownMember(A.workshopId, role);
    expect((await client.post(`/api/invoices/${invoice.id}/send`, {})).status).toBe(403);
  });

  test("signed out is 401, another workshop's owner 404, a bad id 404", async () => {
    const { invoice } = await issuedInvoice();
    expect((await new Client().post(`/api/invoices/${invoice.id}/send`, {})).status).toBe(401);
    expect((await B.owner.post(`/api/invoices/${invoice.id}/send`, {})).status).toBe(404);
    expect((await A.owner.post(`/api/invoices/abc/send`, {})).status).toBe(404);
    expect((await A.owner.post(`/api/invoices/99999999/send`, {})).status).toBe(404);
    // None of those sent anything or touched the invoice.
    expect((await owned(invoice.id)).sentAt).toBeNull();
  });
});

describe("the customer's pay link", () => {
  test("opens without an account, records the first view once, and shows the bill and a Pay by card button", async () => {
    const { invoice, email, jobId } = await issuedInvoice();
    const { token } = await send(invoice.id, email!);
    const res = await fetch(`${baseUrl()}/pay/${token}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain("Ashcombe Valve Bench");
    expect(html).toContain("£111.00");
    expect(html).toContain("Recap and safety check");
    expect(html).toMatch(/Pay £111\.00 by card/);
    expect(html).toMatch(/<meta name="robots" content="noindex, nofollow"/);
    expect(html).toMatch(/<meta name="referrer" content="no-referrer"/);
    assertCustomerWording(html);
    const first = (await owned(invoice.id)).viewedAt as string;
    expect(first).toBeTruthy();
    await page(token);
    expect((await owned(invoice.id)).viewedAt).toBe(first);
    expect(logTexts(jobId, "invoice").filter((t) => t === `Invoice ${invoice.number} opened by the customer.`)).toHaveLength(1);
  });

  test("pays once: Checkout from the link, the webhook marks it paid, then the link says thank you and a second payment is 410", async () => {
    const { invoice, email, jobId } = await issuedInvoice();
    const { token } = await send(invoice.id, email!);
    const first = await pay(token);
    expect(first.status).toBe(200);
    const { url } = await first.json();
    expect(url.startsWith(inject("paymentsUrl"))).toBe(true);
    const sessionId = new URL(url).pathname.split("/").pop()!;
    // Asking again reuses the open session.
    expect((await (await pay(token)).json()).url).toBe(url);
    expect(await (await fetch(url)).text()).toContain("£111.00");

    const done = await fetch(`${inject("paymentsUrl")}/checkout/${sessionId}/pay`, { method: "POST", redirect: "manual" });
    expect(done.status).toBe(303);
    const back = new URL(done.headers.get("location")!);
    expect(back.pathname + back.search).toBe(`/pay/done?session=${sessionId}`);
    // The payer comes back to a thank-you that names no token; the pay link itself is not in any return address.
    expect(done.headers.get("location")).not.toContain(token);
    const thanks = await new Client().get(back.pathname + back.search);
    expect(thanks.status).toBe(200);
    expect(await thanks.text()).toMatch(/Paid, thank you/);

    const seen = await owned(invoice.id);
    expect(seen.status).toBe("paid");
    expect(seen.paidAt).toBeTruthy();
    expect(logTexts(jobId, "invoice").filter((t) => /paid by card/.test(t))).toHaveLength(1);

    const again = await pay(token);
    expect(again.status).toBe(410);
    expect((await again.json()).error.message).toMatch(/already paid/);
    const after = await page(token);
    expect(after.html).toContain("Paid, thank you");
    expect(after.html).not.toMatch(/by card<\/button>/);
  });

  test("an unknown or truncated token is 404; the page says the link is not valid", async () => {
    const { invoice, email } = await issuedInvoice();
    const { token } = await send(invoice.id, email!);
    const guessed = token.slice(0, -4) + (token.endsWith("AAAA") ? "BBBB" : "AAAA");
    expect((await pay(guessed)).status).toBe(404);
    expect((await pay(token.slice(0, 30))).status).toBe(404);
    expect((await page(guessed)).html).toContain("not valid");
    expect((await owned(invoice.id)).viewedAt).toBeNull();
  });

  test("an expired link is 410 and says so", async () => {
    const { invoice, email } = await issuedInvoice();
    const { token } = await send(invoice.id, email!);
    testDb()
      .prepare("UPDATE invoices SET pay_token_expires_at = ? WHERE id = ?")
      .run(Date.now() - 1000, invoice.id);
    expect((await pay(token)).status).toBe(410);
    const shown = await page(token);
    expect(shown.html).toContain("expired");
    expect(shown.html).not.toContain("£111.00");
  });

  test("sending again retires the old link; the new one works", async () => {
    const { invoice, email } = await issuedInvoice();
    const old = await send(invoice.id, email!, 1);
    await page(old.token);
    expect((await owned(invoice.id)).viewedAt).toBeTruthy();
    const fresh = await send(invoice.id, email!, 2);
    expect(fresh.token).not.toBe(old.token);
    expect((await pay(old.token)).status).toBe(404);
    expect((await page(old.token)).html).toContain("not valid");
    // "Viewed" starts over for the new e-mail.
    expect((await owned(invoice.id)).viewedAt).toBeNull();
    expect((await pay(fresh.token)).status).toBe(200);
  });

  test("a voided invoice's link is 410 and says the invoice was withdrawn", async () => {
    const { invoice, email } = await issuedInvoice();
    const { token } = await send(invoice.id, email!);
    expect((await A.owner.post(`/api/invoices/${invoice.id}/void`, {})).status).toBe(200);
    expect((await pay(token)).status).toBe(410);
    expect((await page(token)).html).toContain("withdrawn");
  });
});

/** Customer-facing words: the plain reminder, and none of the bench's safety procedure copied onto a bill. */
function assertCustomerWording(text: string | ReceivedMail["text"]) {
  expect(text).toMatch(/keep the back on/i);
  expect(text).not.toMatch(/current-limited|Discharge every filter capacitor|one hand away|Lethal voltage/i);
}
