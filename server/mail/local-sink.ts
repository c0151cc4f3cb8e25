import "server-only";
import { startMailSink } from "@/lib/mail/sink";
import { processSingleton } from "@/lib/singleton";
import { provideLocally, serverEnv } from "@/server/env";
import { localMailEnabled, mailDir } from "./config";

/**
 * Called once per server process from instrumentation.ts: with no SMTP_URL outside a real production
 * deployment, start the loopback sink and point SMTP_URL at it, so mail works with no setup.
 */
export function startLocalMailSinkIfWanted(): Promise<void> {
  const env = serverEnv();
  if (env.SMTP_URL || !localMailEnabled(env)) return Promise.resolve();
  return processSingleton("Sink", () =>
    startMailSink(mailDir(), env.GLOWBENCH_MAIL_PORT ?? 0).then((sink) => {
      provideLocally({ SMTP_URL: sink.url });
      console.log(`Local mail sink on ${sink.url}, storing messages in ${mailDir()}`);
    }),
  );
}
