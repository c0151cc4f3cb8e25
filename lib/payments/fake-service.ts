import { randomBytes } from "node:crypto";
import http from "node:http";
import type { AddressInfo } from "node:net";
import { parse as parseForm } from "qs";
import { checkoutPage } from "./fake-checkout-page";
import { signatureHeader } from "./signature";

/**
 * A local stand-in for the payment service, on loopback only, for development, the demo and the tests.
 * It implements the endpoints Glowbench calls through the Stripe Node SDK — creating and retrieving a
 * Checkout Session — plus a hosted checkout page whose "Pay" button posts a signed
 * `checkout.session.completed` event to our webhook and then redirects to the session's success URL.
 * No money moves; nothing leaves the machine.
 */

export interface FakeSession {
  id: string;
  object: "checkout.session";
  mode: "payment";
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  amount_subtotal: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  success_url: string;
  cancel_url: string | null;
  url: string | null;
  created: number;
  expires_at: number;
  livemode: false;
  payment_intent: string | null;
  line_items: { name: string; unit_amount: number; quantity: number }[];
}

export interface FakePaymentService {
  url: string;
  sessions: Map<string, FakeSession>;
  close(): Promise<void>;
}

export interface FakeOptions {
  secretKey: string;
  webhookSecret: string;
  /** Where events go; by default /api/payments/webhook on the success URL's origin. */
  webhookUrl?: string;
  port?: number;
}

const id = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;
const now = () => Math.floor(Date.now() / 1000);

function sendJson(res: http.ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

function apiError(res: http.ServerResponse, status: number, message: string, param?: string) {
  sendJson(res, status, { error: { type: "invalid_request_error", message, ...(param ? { param } : {}) } });
}

async function readBody(req: http.IncomingMessage): Promise<string> {
  let body = "";
  for await (const chunk of req) {
    body += chunk;
    if (body.length > 256 * 1024) throw new Error("body too large");
  }
  return body;
}

type Params = Record<string, unknown>;
// The SDK's form bodies (`line_items[0][price_data][currency]=gbp`); qs makes arrays only up to index 20 unless told.
const readForm = (body: string): Params => parseForm(body, { arrayLimit: 1000, parameterLimit: 10_000 });
const str = (v: unknown) => (typeof v === "string" ? v : undefined);
const int = (v: unknown) => (typeof v === "string" && /^\d+$/.test(v) ? Number(v) : undefined);

function createSession(params: Params, base: string): FakeSession | { error: string; param: string } {
  if (params.mode !== "payment") return { error: "Only mode=payment is supported by the fake.", param: "mode" };
  const success = str(params.success_url);
  if (!success) return { error: "success_url is required.", param: "success_url" };
  const rawItems = Array.isArray(params.line_items) ? (params.line_items as Params[]) : [];
  if (!rawItems.length) return { error: "line_items must have at least one item.", param: "line_items" };
  const items: FakeSession["line_items"] = [];
  let currency = "";
  for (const [i, item] of rawItems.entries()) {
    const price = (item.price_data ?? {}) as Params;
    const product = (price.product_data ?? {}) as Params;
    const unit = int(price.unit_amount);
    const quantity = int(item.quantity);
    const cur = str(price.currency)?.toLowerCase();
    if (unit === undefined || quantity === undefined || !cur || !/^[a-z]{3}$/.test(cur)) {
      return { error: "Each line item needs price_data.currency, price_data.unit_amount and quantity.", param: `line_items[${i}]` };
    }
    if (currency && cur !== currency) return { error: "All line items must share one currency.", param: `line_items[${i}]` };
    currency = cur;
    items.push({ name: str(product.name) ?? "Item", unit_amount: unit, quantity });
  }
  const total = items.reduce((sum, it) => sum + it.unit_amount * it.quantity, 0);
  const sessionId = id("cs_test");
  const created = now();
  return {
    id: sessionId,
    object: "checkout.session",
    mode: "payment",
    status: "open",
    payment_status: "unpaid",
    amount_total: total,
    amount_subtotal: total,
    currency,
    client_reference_id: str(params.client_reference_id) ?? null,
    customer_email: str(params.customer_email) ?? null,
    metadata: Object.fromEntries(Object.entries((params.metadata ?? {}) as Params).map(([k, v]) => [k, String(v)])),
    success_url: success,
    cancel_url: str(params.cancel_url) ?? null,
    url: `${base}/checkout/${sessionId}`,
    created,
    expires_at: created + 24 * 3600,
    livemode: false,
    payment_intent: null,
    line_items: items,
  };
}

/** Public shape of a session: the API does not return line items unless expanded. */
function publicSession(s: FakeSession) {
  const { line_items: _items, ...rest } = s;
  return rest;
}

async function deliver(url: string, event: unknown, secret: string): Promise<boolean> {
  const payload = JSON.stringify(event);
  // Retried a little, as the real service retries failed deliveries.
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const res = await fetch(url, {
        method: "POST",
        headers: {
          "content-type": "application/json; charset=utf-8",
          "stripe-signature": signatureHeader(payload, secret),
          "user-agent": "glowbench-fake-payments",
        },
        body: payload,
      });
      if (res.ok) return true;
    } catch {
      // the app may be restarting; try again
    }
    await new Promise((r) => setTimeout(r, 200 * (attempt + 1)));
  }
  return false;
}

export async function startFakePaymentService(options: FakeOptions): Promise<FakePaymentService> {
  const sessions = new Map<string, FakeSession>();
  let base = "";

  const server = http.createServer(async (req, res) => {
    try {
      const url = new URL(req.url ?? "/", base);
      const path = url.pathname;
      if (path.startsWith("/v1/")) {
        if (req.headers.authorization !== `Bearer ${options.secretKey}`) return apiError(res, 401, "Invalid API key provided.");
        if (req.method === "POST" && path === "/v1/checkout/sessions") {
          const created = createSession(readForm(await readBody(req)), base);
          if ("error" in created) return apiError(res, 400, created.error, created.param);
          sessions.set(created.id, created);
          return sendJson(res, 200, publicSession(created));
        }
        const match = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(path);
        if (req.method === "GET" && match) {
          const session = sessions.get(match[1]);
          return session ? sendJson(res, 200, publicSession(session)) : apiError(res, 404, `No such checkout.session: '${match[1]}'`, "id");
        }
        return apiError(res, 404, `Unrecognized request URL (${req.method}: ${path}).`);
      }

      const page = /^\/checkout\/([\w-]+)(\/pay)?$/.exec(path);
      const session = page ? sessions.get(page[1]) : undefined;
      if (!page || !session) {
        res.writeHead(404, { "content-type": "text/plain" });
        return res.end("No such checkout.");
      }
      if (req.method === "GET" && !page[2]) {
        res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
        return res.end(checkoutPage(session));
      }
      if (req.method === "POST" && page[2]) {
        await readBody(req);
        if (session.status === "open") {
          session.status = "complete";
          session.payment_status = "paid";
          session.payment_intent = id("pi_test");
          const event = {
            id: id("evt_test"),
            object: "event",
            type: "checkout.session.completed",
            api_version: req.headers["stripe-version"] ?? null,
            created: now(),
            livemode: false,
            pending_webhooks: 1,
            request: { id: null, idempotency_key: null },
            data: { object: publicSession(session) },
          };
          const target = options.webhookUrl ?? new URL("/api/payments/webhook", session.success_url).toString();
          await deliver(target, event, options.webhookSecret);
        }
        res.writeHead(303, { location: session.success_url.replace("{CHECKOUT_SESSION_ID}", session.id) });
        return res.end();
      }
      res.writeHead(405, { "content-type": "text/plain" });
      res.end("Method not allowed.");
    } catch (err) {
      apiError(res, 500, err instanceof Error ? err.message : "Fake payment service error.");
    }
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? 0, "127.0.0.1", () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  base = `http://127.0.0.1:${port}`;
  return {
    url: base,
    sessions,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
