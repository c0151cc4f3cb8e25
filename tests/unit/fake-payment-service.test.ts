import http from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { startFakePaymentService, type FakePaymentService } from "@/lib/payments/fake-service";
import { signatureHeader } from "@/lib/payments/signature";

const KEY = "sk_test_fake_unit";
const SECRET = "whsec_fake_unit_secret";

let fake: FakePaymentService;
let receiver: http.Server;
let webhookUrl = "";
const received: { body: string; signature: string }[] = [];

function client(key = KEY) {
  const base = new URL(fake.url);
  return new Stripe(key, { host: base.hostname, port: base.port, protocol: "http", maxNetworkRetries: 0 });
}

beforeAll(async () => {
  receiver = http.createServer(async (req, res) => {
    let body = "";
    for await (const chunk of req) body += chunk;
    received.push({ body, signature: String(req.headers["stripe-signature"] ?? "") });
    res.writeHead(200, { "content-type": "application/json" });
    res.end("{}");
  });
  await new Promise<void>((r) => receiver.listen(0, "127.0.0.1", () => r()));
  webhookUrl = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/hook`;
  fake = await startFakePaymentService({ secretKey: KEY, webhookSecret: SECRET, webhookUrl });
});
afterAll(async () => {
  await fake?.close();
  await new Promise((r) => receiver?.close(r));
});

const params: Stripe.Checkout.SessionCreateParams = {
  mode: "payment",
  line_items: [{ quantity: 1, price_data: { currency: "gbp", unit_amount: 16992, product_data: { name: "Invoice 7" } } }],
  metadata: { invoiceId: "42" },
  client_reference_id: "42",
  success_url: "http://127.0.0.1:9/invoices/42?paid=1",
  cancel_url: "http://127.0.0.1:9/invoices/42",
};

describe("the fake payment service through the Stripe SDK", () => {
  test("creates and retrieves a Checkout Session", async () => {
    const stripe = client();
    const session = await stripe.checkout.sessions.create(params);
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.amount_total).toBe(16992);
    expect(session.currency).toBe("gbp");
    expect(session.status).toBe("open");
    expect(session.metadata).toEqual({ invoiceId: "42" });
    expect(session.url).toBe(`${fake.url}/checkout/${session.id}`);
    const again = await stripe.checkout.sessions.retrieve(session.id);
    expect(again.id).toBe(session.id);
    expect(again.payment_status).toBe("unpaid");
  });

  test("reads every line of a long form body (qs stops arrays at 20 unless told otherwise)", async () => {
    const line_items = Array.from({ length: 25 }, (_, i) => ({
      quantity: 2,
      price_data: { currency: "gbp", unit_amount: 100 + i, product_data: { name: `Line ${i}` } },
    }));
    const session = await client().checkout.sessions.create({ ...params, line_items });
    // 2 × (100 + 101 + … + 124) = 2 × 2800
    expect(session.amount_total).toBe(5600);
  });

  test("refuses a wrong key and reports a missing session as the SDK's errors", async () => {
    await expect(client("sk_test_wrong").checkout.sessions.create(params)).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    await expect(client().checkout.sessions.retrieve("cs_test_nope")).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(client().checkout.sessions.create({ ...params, line_items: [] })).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
  });

  test("Pay posts a checkout.session.completed event the SDK verifies, then redirects to the success URL", async () => {
    const stripe = client();
    const session = await stripe.checkout.sessions.create(params);
    const page = await fetch(session.url!);
    expect(await page.text()).toContain("£169.92");
    received.length = 0;
    const pay = await fetch(`${fake.url}/checkout/${session.id}/pay`, { method: "POST", redirect: "manual" });
    expect(pay.status).toBe(303);
    expect(pay.headers.get("location")).toBe(params.success_url);
    expect(received).toHaveLength(1);
    const event = stripe.webhooks.constructEvent(received[0].body, received[0].signature, SECRET);
    expect(event.type).toBe("checkout.session.completed");
    const paid = event.data.object as Stripe.Checkout.Session;
    expect(paid.id).toBe(session.id);
    expect(paid.payment_status).toBe("paid");
    expect(paid.amount_total).toBe(16992);
    // A second Pay on a completed session sends nothing more.
    await fetch(`${fake.url}/checkout/${session.id}/pay`, { method: "POST", redirect: "manual" });
    expect(received).toHaveLength(1);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("complete");
  });

  test("our signature helper matches the SDK's own test header and fails under another secret", () => {
    const stripe = client();
    const payload = JSON.stringify({ id: "evt_1", object: "event" });
    const t = Math.floor(Date.now() / 1000);
    expect(signatureHeader(payload, SECRET, t)).toBe(stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET, timestamp: t }));
    expect(() => stripe.webhooks.constructEvent(payload, signatureHeader(payload, "whsec_other", t), SECRET)).toThrow();
  });
});
