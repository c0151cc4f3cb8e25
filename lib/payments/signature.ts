import { createHmac } from "node:crypto";

/**
 * The payment service's webhook signature, as its documentation describes it: the header
 * `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<raw body>" keyed with the endpoint secret>`.
 * The fake service signs with this; our webhook verifies with the SDK's own `webhooks.constructEvent`.
 */
export function signatureHeader(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}
