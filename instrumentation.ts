/** Runs once when the server starts (Next.js instrumentation): local stand-ins for outside services. */
export async function register() {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startLocalPaymentsIfWanted } = await import("./lib/payments/dev-start");
  await startLocalPaymentsIfWanted();
  await (await import("./server/mail/local-sink")).startLocalMailSinkIfWanted();
  (await import("./server/startup")).startServerTasks();
}
