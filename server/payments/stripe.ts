import "server-only";
import Stripe from "stripe";

/**
 * The one payment-service client of the process, through the Stripe Node SDK. In development, the demo and
 * the tests STRIPE_API_BASE points it at the local fake (lib/payments/fake-service.ts); in production it is
 * unset and the SDK talks to the real service with a real STRIPE_SECRET_KEY.
 */

export class PaymentsNotConfigured extends Error {}

function env(name: string): string {
  const value = process.env[name];
  if (!value) throw new PaymentsNotConfigured(`${name} is not set, so card payments are switched off.`);
  return value;
}

const globalForStripe = globalThis as unknown as { __glowbenchStripe?: { key: string; base: string; client: Stripe } };

export function getStripe(): Stripe {
  const key = env("STRIPE_SECRET_KEY");
  const base = process.env.STRIPE_API_BASE ?? "";
  const cached = globalForStripe.__glowbenchStripe;
  if (cached && cached.key === key && cached.base === base) return cached.client;
  let options: Stripe.StripeConfig = { maxNetworkRetries: 1, timeout: 15_000, telemetry: false };
  if (base) {
    const url = new URL(base);
    options = { ...options, host: url.hostname, port: url.port || (url.protocol === "https:" ? 443 : 80), protocol: url.protocol === "https:" ? "https" : "http" };
  }
  const client = new Stripe(key, options);
  globalForStripe.__glowbenchStripe = { key, base, client };
  return client;
}

export function webhookSecret(): string {
  return env("STRIPE_WEBHOOK_SECRET");
}

export function paymentsConfigured(): boolean {
  return !!process.env.STRIPE_SECRET_KEY && !!process.env.STRIPE_WEBHOOK_SECRET;
}
