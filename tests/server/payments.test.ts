import Stripe from "stripe";
import { beforeAll, describe, expect, test } from "vitest";
import { inject } from "vitest";
import { signatureHeader } from "@/lib/payments/signature";
import { baseUrl, signedIn, type Client } from "../helpers/http";
import { createJob, logTexts, ownWorkshop, testDb } from "../helpers/money-fixtures";

/**
 * Payments through the real server and the fake payment service: the invoice becomes paid only from a
 * verified checkout.session.completed event, once, and only for the session we created for it.
 */

const secret = () => inject("paymentsWebhookSecret");

const invoiceLines = [
  // 1.5 h × £45.00 = 6750; fee £25.00 = 2500; subtotal 9250; 20% tax 1850; total 11100
  { kind: "labour", description: "Recap and safety check", quantity: "1.5" },
  { kind: "fee", description: "Bench diagnosis", quantity: "1", unitPrice: "25.00" },
];

async function readyInvoice(owner: Client, workshopId: number) {
  const { jobId } = createJob(workshopId, { status: "at-the-counter" });
  const res = await owner.post(`/api/jobs/${jobId}/invoices`, { lines: invoiceLines });
  expect(res.status).toBe(201);
  return { jobId, invoice: await res.json() };
}

async function checkout(owner: Client, invoiceId: number) {
  const res = await owner.post(`/api/invoices/${invoiceId}/checkout`, {});
  expect(res.status).toBe(200);
  const { url } = await res.json();
  return { url: url as string, sessionId: new URL(url).pathname.split("/").pop()! };
}

function completedEvent(sessionId: string, invoice: { id: number; totalMinor: number }, workshopId: number, overrides: Record<string, unknown> = {}) {
  return {
    id: `evt_test_${Math.random().toString(36).slice(2)}`,
    object: "event",
    type: "checkout.session.completed",
    created: Math.floor(Date.now() / 1000),
    livemode: false,
    data: {
      object: {
        id: sessionId,
        object: "checkout.session",
        payment_status: "paid",
        status: "complete",
        amount_total: invoice.totalMinor,
        currency: "gbp",
        metadata: { invoiceId: String(invoice.id), workshopId: String(workshopId) },
        ...overrides,
      },
    },
  };
}

function deliver(payload: string, signature?: string) {
  const headers: Record<string, string> = { "content-type": "application/json" };
  if (signature !== undefined) headers["stripe-signature"] = signature;
  return fetch(`${baseUrl()}/api/payments/webhook`, { method: "POST", headers, body: payload });
}

async function invoiceStatus(owner: Client, id: number) {
  const res = await owner.get(`/api/invoices/${id}`);
  expect(res.status).toBe(200);
  return (await res.json()) as { status: string; paidAt: string | null; totalMinor: number };
}

let A: Awaited<ReturnType<typeof ownWorkshop>>;
let B: Awaited<ReturnType<typeof ownWorkshop>>;
beforeAll(async () => {
  A = await ownWorkshop("Amberley");
  B = await ownWorkshop("Brackwater");
});

describe("the payment webhook", () => {
  test("the invoice total is worked out on the server", async () => {
    const { invoice } = await readyInvoice(A.owner, A.workshopId);
    expect(invoice).toMatchObject({ subtotalMinor: 9250, taxMinor: 1850, totalMinor: 11100, status: "issued", currency: "GBP" });
    expect(invoice.lines.map((l: { amountMinor: number }) => l.amountMinor)).toEqual([6750, 2500]);
  });

  test("a bad, missing or stale signature changes nothing", async () => {
    const { invoice, jobId } = await readyInvoice(A.owner, A.workshopId);
    const { sessionId } = await checkout(A.owner, invoice.id);
    const payload = JSON.stringify(completedEvent(sessionId, invoice, A.workshopId));

    const wrongSecret = await deliver(payload, signatureHeader(payload, "whsec_not_ours"));
    expect(wrongSecret.status).toBe(400);
    const missing = await deliver(payload);
    expect(missing.status).toBe(400);
    const stale = await deliver(payload, signatureHeader(payload, secret(), Math.floor(Date.now() / 1000) - 3600));
    expect(stale.status).toBe(400);
    const tampered = await deliver(payload.replace(`"amount_total":${invoice.totalMinor}`, '"amount_total":1'), signatureHeader(payload, secret()));
    expect(tampered.status).toBe(400);
    expect((await wrongSecret.json()).error.message).toMatch(/signature/i);

    expect((await invoiceStatus(A.owner, invoice.id)).status).toBe("issued");
    expect(logTexts(jobId, "invoice").some((t) => /paid/.test(t))).toBe(false);
    // None of them was recorded as seen, so a properly signed delivery of the same event still counts.
    const good = await deliver(payload, signatureHeader(payload, secret()));
    expect(good.status).toBe(200);
    expect((await invoiceStatus(A.owner, invoice.id)).status).toBe("paid");
  });

  test("the same event delivered three times changes state once", async () => {
    const { invoice, jobId } = await readyInvoice(A.owner, A.workshopId);
    const { sessionId } = await checkout(A.owner, invoice.id);
    const event = completedEvent(sessionId, invoice, A.workshopId);
    const payload = JSON.stringify(event);
    const results: string[] = [];
    const paidAts: (string | null)[] = [];
    for (let i = 0; i < 3; i++) {
      const res = await deliver(payload, signatureHeader(payload, secret()));
      expect(res.status).toBe(200);
      results.push((await res.json()).result);
      paidAts.push((await invoiceStatus(A.owner, invoice.id)).paidAt);
    }
    expect(results).toEqual(["paid", "duplicate", "duplicate"]);
    expect(paidAts[0]).toBeTruthy();
    expect(new Set(paidAts).size).toBe(1);
    expect(logTexts(jobId, "invoice").filter((t) => /paid by card/.test(t))).toHaveLength(1);
    expect((testDb().prepare("SELECT count(*) AS n FROM payment_events WHERE id = ?").get(event.id) as { n: number }).n).toBe(1);
  });

  test("an event whose amount or currency differs from the invoice pays nothing", async () => {
    const { invoice } = await readyInvoice(A.owner, A.workshopId);
    const { sessionId } = await checkout(A.owner, invoice.id);
    for (const overrides of [{ amount_total: 1 }, { currency: "eur" }, { payment_status: "unpaid" }]) {
      const payload = JSON.stringify(completedEvent(sessionId, invoice, A.workshopId, overrides));
      const res = await deliver(payload, signatureHeader(payload, secret()));
      expect((await res.json()).result).toBe("ignored");
    }
    expect((await invoiceStatus(A.owner, invoice.id)).status).toBe("issued");
  });

  test("another workshop cannot create or pay a session for our invoice", async () => {
    const { invoice } = await readyInvoice(A.owner, A.workshopId);
    // B cannot see it, make a session for it or void it.
    expect((await B.owner.get(`/api/invoices/${invoice.id}`)).status).toBe(404);
    expect((await B.owner.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(404);
    expect((await B.owner.post(`/api/invoices/${invoice.id}/void`, {})).status).toBe(404);
    const other = await signedIn("other@demo.test");
    expect((await other.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(404);

    // B's own session, paid, whose metadata points at A's invoice: it is not the session A created.
    const own = await readyInvoice(B.owner, B.workshopId);
    const { sessionId: bSession } = await checkout(B.owner, own.invoice.id);
    await checkout(A.owner, invoice.id);
    for (const workshopId of [A.workshopId, B.workshopId]) {
      const payload = JSON.stringify(completedEvent(bSession, invoice, workshopId));
      const res = await deliver(payload, signatureHeader(payload, secret()));
      expect((await res.json()).result).toBe("ignored");
    }
    expect((await invoiceStatus(A.owner, invoice.id)).status).toBe("issued");
    expect((await invoiceStatus(B.owner, own.invoice.id)).status).toBe("issued");
  });

  test("paying through the fake checkout page marks the invoice paid and lands on the success URL", async () => {
    const { invoice } = await readyInvoice(A.owner, A.workshopId);
    const { url, sessionId } = await checkout(A.owner, invoice.id);
    expect(url.startsWith(inject("paymentsUrl"))).toBe(true);
    // Asking again reuses the open session instead of making a second one.
    expect((await checkout(A.owner, invoice.id)).sessionId).toBe(sessionId);
    const page = await fetch(url);
    expect(await page.text()).toContain("£111.00");
    const pay = await fetch(`${inject("paymentsUrl")}/checkout/${sessionId}/pay`, { method: "POST", redirect: "manual" });
    expect(pay.status).toBe(303);
    // The payment service sends the payer to /pay/done; the owner who took the payment goes on to the invoice.
    const back = new URL(pay.headers.get("location")!);
    expect(back.pathname + back.search).toBe(`/pay/done?session=${sessionId}`);
    const landing = await A.owner.get(back.pathname + back.search);
    expect(landing.status).toBe(307);
    expect(landing.headers.get("location")).toMatch(new RegExp(`/invoices/${invoice.id}\\?paid=1$`));
    expect((await invoiceStatus(A.owner, invoice.id)).status).toBe("paid");
    expect((await A.owner.post(`/api/invoices/${invoice.id}/checkout`, {})).status).toBe(409);
    // The SDK agrees the session completed.
    const stripe = new Stripe("sk_test_glowbench_tests", { host: "127.0.0.1", port: new URL(inject("paymentsUrl")).port, protocol: "http" });
    expect((await stripe.checkout.sessions.retrieve(sessionId)).payment_status).toBe("paid");
  });
});
