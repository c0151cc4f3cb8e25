import "server-only";
import { serverEnv } from "@/server/env";
import { startUploadSweeps } from "@/server/files/sweep";
import { PUBLIC_URL_MISSING, realProduction } from "@/server/http/public-origin";
import { scryptParams } from "@/lib/auth/password";
import { forgetProcessSingleton } from "@/lib/singleton";

/**
 * Called once per server process from instrumentation.ts. Settings that would only fail later, on some
 * member's request, are checked now and said loudly in the log; then the background upload sweep starts.
 */
export function startServerTasks(): void {
  if (realProduction() && !serverEnv().GLOWBENCH_PUBLIC_URL) console.error(`Glowbench: ${PUBLIC_URL_MISSING}`);
  try {
    scryptParams();
  } catch (err) {
    console.error(`Glowbench: ${(err as Error).message}`);
  }
  startUploadSweeps();
}

/**
 * Starts a local stand-in (mail sink, fake payment service) from instrumentation.ts without ever failing
 * the server's start. Next 16 runs register() while preparing the server, every request awaits that, and a
 * failed preparation is kept: one throw there answered every later request with a bare 500 until the next
 * restart. On a fixed port (GLOWBENCH_MAIL_PORT, STRIPE_FAKE_PORT) that throw came after a restart whenever
 * the old process still held the port, which is why a restart sometimes left the server answering nothing
 * but errors. So: while the port is busy, wait and try again (the old process lets go within seconds);
 * any other failure is logged, and the app runs without that stand-in.
 */
export async function startStandIn(what: string, slot: string, start: () => Promise<void>, opts: { tries?: number; waitMs?: number } = {}): Promise<boolean> {
  const tries = opts.tries ?? 40;
  for (let attempt = 1; ; attempt++) {
    try {
      await start();
      return true;
    } catch (err) {
      forgetProcessSingleton(slot);
      if ((err as NodeJS.ErrnoException).code === "EADDRINUSE" && attempt < tries) {
        await new Promise((r) => setTimeout(r, opts.waitMs ?? 250));
        continue;
      }
      console.error(`Glowbench: the local ${what} did not start (${(err as Error).message}); the app runs without it.`);
      return false;
    }
  }
}
