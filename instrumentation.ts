/** Runs once when the server starts (Next.js instrumentation): local stand-ins for outside services. */
export async function register() {
  // Next's own variable, read before anything loads: server/env.ts and the services need Node, not the edge runtime.
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  await (await import("./server/payments/local-service")).startLocalPaymentsIfWanted();
  await (await import("./server/mail/local-sink")).startLocalMailSinkIfWanted();
  (await import("./server/startup")).startServerTasks();
}
