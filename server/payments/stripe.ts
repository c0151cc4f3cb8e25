import "server-only";
import Stripe from "stripe";
import { processSingletonFor } from "@/lib/singleton";
import { serverEnv } from "@/server/env";

/**
 * The one payment-service client of the process, through the Stripe Node SDK. In development, the demo and
 * the tests STRIPE_API_BASE points it at the local fake (lib/payments/fake-service.ts); in production it is
 * unset and the SDK talks to the real service with a real STRIPE_SECRET_KEY.
 */

export class PaymentsNotConfigured extends Error {}

function required(name: "STRIPE_SECRET_KEY" | "STRIPE_WEBHOOK_SECRET"): string {
  const value = serverEnv()[name];
  if (!value) throw new PaymentsNotConfigured(`${name} is not set, so card payments are switched off.`);
  return value;
}

export function getStripe(): Stripe {
  const key = required("STRIPE_SECRET_KEY");
  const base = serverEnv().STRIPE_API_BASE ?? "";
  // Made again if the key or the address changes (the local fake fills them in after start).
  return processSingletonFor("Stripe", `${key} ${base}`, () => {
    let options: Stripe.StripeConfig = { maxNetworkRetries: 1, timeout: 15_000, telemetry: false };
    if (base) {
      const url = new URL(base);
      options = {
        ...options,
        host: url.hostname,
        port: url.port || (url.protocol === "https:" ? 443 : 80),
        protocol: url.protocol === "https:" ? "https" : "http",
      };
    }
    return new Stripe(key, options);
  });
}

export function webhookSecret(): string {
  return required("STRIPE_WEBHOOK_SECRET");
}
