import "server-only";
import { localMailEnabled, mailDir } from "./config";
import { startMailSink } from "@/lib/mail/sink";

const globalForSink = globalThis as unknown as { __glowbenchSink?: Promise<void> };

/**
 * Called once per server process from instrumentation.ts: with no SMTP_URL outside a real production
 * deployment, start the loopback sink and point SMTP_URL at it, so mail works with no setup.
 */
export function startLocalMailSinkIfWanted(): Promise<void> {
  if (process.env.SMTP_URL || !localMailEnabled()) return Promise.resolve();
  globalForSink.__glowbenchSink ??= startMailSink(mailDir(), Number(process.env.GLOWBENCH_MAIL_PORT ?? 0)).then((sink) => {
    process.env.SMTP_URL = sink.url;
    console.log(`Local mail sink on ${sink.url}, storing messages in ${mailDir()}`);
  });
  return globalForSink.__glowbenchSink;
}
