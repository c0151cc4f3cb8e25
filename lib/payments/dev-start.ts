import { randomBytes } from "node:crypto";
import { startFakePaymentService } from "./fake-service";

/**
 * Development and the demo pay through the local fake payment service, started here from instrumentation.ts
 * with a fresh key and webhook secret for this process. Nothing starts when the environment already names a
 * payment service (STRIPE_SECRET_KEY or STRIPE_API_BASE: production, or the tests' own fake), or in a
 * production build that is not the demo.
 */
export async function startLocalPaymentsIfWanted(): Promise<void> {
  if (process.env.STRIPE_SECRET_KEY || process.env.STRIPE_API_BASE) return;
  if (process.env.NODE_ENV === "production" && process.env.GLOWBENCH_DEMO !== "1") return;
  const state = globalThis as unknown as { __glowbenchFakePayments?: boolean };
  if (state.__glowbenchFakePayments) return;
  state.__glowbenchFakePayments = true;
  const secretKey = `sk_test_local_${randomBytes(12).toString("hex")}`;
  const webhookSecret = `whsec_local_${randomBytes(16).toString("hex")}`;
  const port = Number(process.env.STRIPE_FAKE_PORT ?? 0);
  const fake = await startFakePaymentService({ secretKey, webhookSecret, port });
  process.env.STRIPE_SECRET_KEY = secretKey;
  process.env.STRIPE_WEBHOOK_SECRET = webhookSecret;
  process.env.STRIPE_API_BASE = fake.url;
  console.log(`Local fake payment service on ${fake.url} (no real payments).`);
}
