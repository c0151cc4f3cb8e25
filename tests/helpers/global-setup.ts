import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";

/**
 * Starts the real production server (`next start`) once for the whole run, on a free loopback port,
 * with a temporary database seeded with the demo scenario. Tests read its address with inject("baseUrl").
 * When the app has not been built (unit-only runs), no server starts and server tests say so.
 */

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    dataDir: string;
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

export default async function setup(project: TestProject) {
  const root = process.cwd();
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-test-"));
  project.provide("dataDir", dataDir);
  if (!fs.existsSync(path.join(root, ".next", "BUILD_ID"))) {
    project.provide("baseUrl", "");
    return;
  }
  const dbFile = path.join(dataDir, "glowbench.db");
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    GLOWBENCH_DB: dbFile,
    GLOWBENCH_TRUST_PROXY: "1",
    GLOWBENCH_UPLOADS: path.join(dataDir, "uploads"),
    SESSION_SECRET: "test-secret-test-secret-test-secret-0123456789",
  };
  // Seed before the server opens the file, through the same code as `npm run db:seed`.
  const seed = spawn(process.execPath, [path.join(root, "node_modules/tsx/dist/cli.mjs"), "db/seed.ts"], { env, stdio: "inherit" });
  await new Promise<void>((resolve, reject) => seed.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`seed exited ${code}`)))));

  const port = await freePort();
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
    await new Promise((r) => setTimeout(r, 300));
  };
}
