/** Runs once when the server starts (Next.js instrumentation): local stand-ins for outside services. */
export async function register() {
  // Next's own variable, read before anything loads: server/env.ts and the services need Node, not the edge runtime.
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  // A stand-in that cannot start must not take the server down with it (server/startup.ts says why).
  const { startStandIn, startServerTasks } = await import("./server/startup");
  await startStandIn("fake payment service", "FakePayments", async () => (await import("./server/payments/local-service")).startLocalPaymentsIfWanted());
  await startStandIn("mail sink", "Sink", async () => (await import("./server/mail/local-sink")).startLocalMailSinkIfWanted());
  startServerTasks();
}
