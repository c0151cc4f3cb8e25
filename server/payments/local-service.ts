import "server-only";
import { randomBytes } from "node:crypto";
import { startFakePaymentService } from "@/lib/payments/fake-service";
import { processSingleton } from "@/lib/singleton";
import { provideLocally, realProduction, serverEnv } from "@/server/env";

/**
 * Development and the demo pay through the local fake payment service, started here from instrumentation.ts
 * with a fresh key and webhook secret for this process. Nothing starts when the environment already names a
 * payment service (STRIPE_SECRET_KEY or STRIPE_API_BASE: production, or the tests' own fake), or in a
 * production build that is not the demo.
 */
export function startLocalPaymentsIfWanted(): Promise<void> {
  const env = serverEnv();
  if (env.STRIPE_SECRET_KEY || env.STRIPE_API_BASE || realProduction(env)) return Promise.resolve();
  return processSingleton("FakePayments", async () => {
    const secretKey = `sk_test_local_${randomBytes(12).toString("hex")}`;
    const webhookSecret = `whsec_local_${randomBytes(16).toString("hex")}`;
    const fake = await startFakePaymentService({ secretKey, webhookSecret, port: env.STRIPE_FAKE_PORT ?? 0 });
    provideLocally({ STRIPE_SECRET_KEY: secretKey, STRIPE_WEBHOOK_SECRET: webhookSecret, STRIPE_API_BASE: fake.url });
    console.log(`Local fake payment service on ${fake.url} (no real payments).`);
  });
}
