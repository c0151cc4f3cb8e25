import "server-only";
import { serverEnv } from "@/server/env";
import { startUploadSweeps } from "@/server/files/sweep";
import { PUBLIC_URL_MISSING, realProduction } from "@/server/http/public-origin";
import { scryptParams } from "@/lib/auth/password";

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
