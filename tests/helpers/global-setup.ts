import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { startFakePaymentService, type FakePaymentService } from "../../lib/payments/fake-service";
import { startMailSink, type MailSink } from "../../lib/mail/sink";

/**
 * Starts the real production server (`next start`) once for the whole run, on a free loopback port,
 * with a temporary database seeded with the demo scenario. Tests read its address with inject("baseUrl").
 * When the app has not been built (unit-only runs), no server starts and server tests say so.
 */

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
    /** The fake payment service's address and the webhook secret it signs with. */
    paymentsUrl: string;
    paymentsWebhookSecret: string;
    mailDir: string;
  }
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
    srv.on("error", reject);
  });
}

async function waitFor(url: string, child: ChildProcess, ms = 60_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}`);
    try {
      const res = await fetch(url);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`Server did not answer ${url} within ${ms} ms`);
}

let child: ChildProcess | undefined;
let payments: FakePaymentService | undefined;
let mailSink: MailSink | undefined;

const STRIPE_SECRET_KEY = "sk_test_glowbench_tests";
const STRIPE_WEBHOOK_SECRET = "whsec_glowbench_tests_0123456789";

export default async function setup(project: TestProject) {
  const root = process.cwd();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-test-"));
  project.provide("dataDir", dataDir);
  project.provide("paymentsWebhookSecret", STRIPE_WEBHOOK_SECRET);
  // Every message the server sends goes over real SMTP to this loopback sink; tests read tests/helpers/mail.ts.
  const mailDir = path.join(dataDir, "mail");
  project.provide("mailDir", mailDir);
  // GLOWBENCH_UNIT_ONLY=1 skips the server even when a build exists (fast runs of unit and calculator tests).
  if (process.env.GLOWBENCH_UNIT_ONLY === "1" || !fs.existsSync(path.join(root, process.env.GLOWBENCH_DIST_DIR || ".next", "BUILD_ID"))) {
    project.provide("baseUrl", "");
    project.provide("paymentsUrl", "");
    return;
  }
  const port = await freePort();
  payments = await startFakePaymentService({
    secretKey: STRIPE_SECRET_KEY,
    webhookSecret: STRIPE_WEBHOOK_SECRET,
    webhookUrl: `http://127.0.0.1:${port}/api/payments/webhook`,
  });
  project.provide("paymentsUrl", payments.url);
  const dbFile = path.join(dataDir, "glowbench.db");
  mailSink = await startMailSink(mailDir);
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    GLOWBENCH_DB: dbFile,
    GLOWBENCH_TRUST_PROXY: "1",
    GLOWBENCH_UPLOADS: path.join(dataDir, "uploads"),
    SESSION_SECRET: "test-secret-test-secret-test-secret-0123456789",
    STRIPE_SECRET_KEY,
    STRIPE_WEBHOOK_SECRET,
    STRIPE_API_BASE: payments.url,
    SMTP_URL: mailSink.url,
    GLOWBENCH_MAIL_DIR: mailDir,
    // Links in e-mails: a production server refuses to make them without it. The address the tests use.
    GLOWBENCH_PUBLIC_URL: `http://localhost:${port}`,
    // Test-only: scrypt at N = 2^12 instead of 2^17 for the seed and every sign-up (lib/auth/password.ts
    // honours it only under the test runner); hashes made by tests themselves keep the full cost.
    GLOWBENCH_SCRYPT_COST: "12",
  };
  // Seed before the server opens the file, through the same code as `npm run db:seed`.
  const seed = spawn(process.execPath, [path.join(root, "node_modules/tsx/dist/cli.mjs"), "db/seed.ts"], { env, stdio: "inherit" });
  await new Promise<void>((resolve, reject) => seed.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`seed exited ${code}`)))));

  child = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    env: { ...env, PORT: String(port) },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const log = fs.createWriteStream(path.join(dataDir, "server.log"));
  child.stdout?.pipe(log);
  child.stderr?.pipe(log);
  const baseUrl = `http://localhost:${port}`;
  await waitFor(`${baseUrl}/api/health`, child);
  project.provide("baseUrl", baseUrl);
  return async () => {
    child?.kill("SIGTERM");
    await payments?.close();
    await mailSink?.close();
    await new Promise((r) => setTimeout(r, 300));
  };
}
