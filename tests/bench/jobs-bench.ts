/**
 * Jobs at scale: seeds 10,000 jobs with 100,000 readings into a temporary database, starts the
 * built server (`next start`) on it, and measures, through HTTP as a signed-in owner:
 *   - GET /api/jobs — a page of 50 with a status filter and a text search;
 *   - GET /api/jobs/[id] — a job page's data (details, parts, readings with verdicts, calculations, files, log).
 * Target: p95 ≤ 50 ms for both. Run `npx next build` first, then `npx tsx tests/bench/jobs-bench.ts` (`--json` for JSON).
 */
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { EQUIPMENT_KINDS, JOB_STATUSES } from "../../lib/vocabulary";

export const TARGET_P95_MS = 50;
const JOBS = 10_000;
const READINGS_PER_JOB = 10;
const SAMPLES = 400;

const ERAS = ["1930s", "late 1940s", "early 1950s", "mid 1950s", "1960s"];
const SETS = ["table radio", "console", "push-pull amplifier", "AM/FM tuner", "television", "signal generator", "radiogram", "portable"];
const SURNAMES = ["Marlow", "Oyelaran", "Castellane", "Hallorann", "Deverill", "Penrice", "Trask", "Quill", "Brennock", "Ferrier", "Osgood", "Ashdown"];
const SEARCHES = ["radio", "amplifier", "1950s", "Marlow", "Penrice"];

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.listen(0, "127.0.0.1", () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
    srv.on("error", reject);
  });
}

/** Bulk rows straight through better-sqlite3 prepared statements, in one transaction. */
async function seed(file: string): Promise<{ jobIds: number[] }> {
  const { openDatabase } = await import("../../db/client");
  const { seedDemo } = await import("../../db/seed");
  const { db, sqlite } = openDatabase(file);
  await seedDemo(db);
  const workshop = (sqlite.prepare("select id from workshops where name = 'Lamplight Radio Workshop'").get() as { id: number }).id;
  const insertJob = sqlite.prepare(
    "insert into jobs (workshop_id, title, equipment_kind, maker, year, customer_name, customer_email, status, created_at, updated_at) values (?, ?, ?, ?, ?, ?, ?, ?, ?, ?) returning id",
  );
  const insertReading = sqlite.prepare(
    "insert into readings (job_id, workshop_id, kind, designator, nominal, measured, tolerance) values (?, ?, ?, ?, ?, ?, ?)",
  );
  const jobIds: number[] = [];
  let r = 42; // fixed pseudo-random sequence, so runs are comparable
  const rnd = () => (r = (r * 16807) % 2147483647) / 2147483647;
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(rnd() * xs.length)];
  const now = Date.now();
  sqlite.transaction(() => {
    for (let i = 0; i < JOBS; i++) {
      const surname = pick(SURNAMES);
      const when = now - Math.floor(rnd() * 3 * 365 * 86_400_000);
      const { id } = insertJob.get(
        workshop,
        `${pick(["Five-tube", "Six-tube", "Eight-tube", "Battery", "Mains"])} ${pick(SETS)}, ${pick(ERAS)} #${i}`,
        pick(EQUIPMENT_KINDS),
        `Workshop stock ${i % 97}`,
        1930 + Math.floor(rnd() * 35),
        `${pick(["Ada", "Bram", "Cleo", "Dev", "Edie", "Finn"])} ${surname}`,
        `${surname.toLowerCase()}${i}@example.com`,
        pick(JOB_STATUSES),
        when,
        when + Math.floor(rnd() * 86_400_000),
      ) as { id: number };
      jobIds.push(id);
      for (let k = 0; k < READINGS_PER_JOB; k++) {
        const nominal = pick([100, 470, 2200, 10_000, 47_000, 100_000, 470_000, 1_000_000]);
        if (k < 8) insertReading.run(id, workshop, "resistor", `R${k + 1}`, nominal, rnd() < 0.03 ? null : nominal * (0.8 + rnd() * 0.7), 0.2);
        else insertReading.run(id, workshop, "voltage", k === 8 ? "B+" : "Screen", k === 8 ? 250 : 150, (k === 8 ? 250 : 150) * (0.85 + rnd() * 0.3), 0.1);
      }
    }
  })();
  sqlite.pragma("optimize");
  sqlite.close();
  return { jobIds };
}

function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil(q * s.length) - 1)];
}

async function time(url: string, cookie: string, n: number, vary: (i: number) => string) {
  const ms: number[] = [];
  let bytes = 0;
  for (let i = 0; i < n; i++) {
    const start = performance.now();
    const res = await fetch(`${url}${vary(i)}`, { headers: { cookie } });
    const body = await res.arrayBuffer();
    ms.push(performance.now() - start);
    if (res.status !== 200) throw new Error(`${vary(i)} answered ${res.status}`);
    bytes += body.byteLength;
  }
  const round = (x: number) => Math.round(x * 100) / 100;
  return { samples: n, p50Ms: round(quantile(ms, 0.5)), p95Ms: round(quantile(ms, 0.95)), maxMs: round(Math.max(...ms)), meanBytes: Math.round(bytes / n) };
}

export async function run(): Promise<Record<string, unknown>> {
  const root = process.cwd();
  if (!fs.existsSync(path.join(root, ".next", "BUILD_ID"))) throw new Error("No build: run `npx next build` first.");
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-jobs-bench-"));
  const file = path.join(dir, "bench.db");
  const seedStart = performance.now();
  const { jobIds } = await seed(file);
  const seedMs = Math.round(performance.now() - seedStart);

  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    GLOWBENCH_DB: file,
    GLOWBENCH_UPLOADS: path.join(dir, "uploads"),
    SESSION_SECRET: "bench-secret-bench-secret-bench-secret-0123",
    PORT: String(port),
  };
  const server = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    env,
    stdio: "ignore",
  });
  const base = `http://127.0.0.1:${port}`;
  try {
    for (let i = 0; ; i++) {
      if (i > 240) throw new Error("server did not start");
      try {
        if ((await fetch(`${base}/api/health`)).ok) break;
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 250));
    }
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ email: "owner@demo.test", password: "glowbench-demo" }),
    });
    if (signIn.status !== 200) throw new Error(`sign-in failed: ${signIn.status}`);
    const cookie = signIn.headers
      .getSetCookie()
      .map((c) => c.split(";")[0])
      .join("; ");
    const listPath = (i: number) =>
      `/api/jobs?pageSize=50&status=${JOB_STATUSES[i % JOB_STATUSES.length]}&q=${encodeURIComponent(SEARCHES[i % SEARCHES.length])}`;
    const detailPath = (i: number) => `/api/jobs/${jobIds[(i * 7919) % jobIds.length]}`;
    // Warm-up: compile paths, fill SQLite's page cache.
    await time(base, cookie, 40, listPath);
    await time(base, cookie, 40, detailPath);
    const list = await time(base, cookie, SAMPLES, listPath);
    const detail = await time(base, cookie, SAMPLES, detailPath);
    const sample = await (await fetch(`${base}${listPath(3)}`, { headers: { cookie } })).json();
    return {
      node: process.version,
      jobs: JOBS,
      readings: JOBS * READINGS_PER_JOB,
      seedMs,
      targetP95Ms: TARGET_P95_MS,
      list: { ...list, example: listPath(3), matches: sample.total },
      jobDetail: { ...detail, readingsPerJob: READINGS_PER_JOB },
      meetsTarget: list.p95Ms <= TARGET_P95_MS && detail.p95Ms <= TARGET_P95_MS,
    };
  } finally {
    server.kill("SIGTERM");
    await new Promise((r) => setTimeout(r, 300));
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && /jobs-bench\.ts$/.test(process.argv[1])) {
  run().then(
    (r) => {
      if (process.argv.includes("--json")) return console.log(JSON.stringify(r, null, 2));
      const l = r.list as Record<string, number>;
      const d = r.jobDetail as Record<string, number>;
      console.log(`Glowbench jobs at scale (Node ${r.node}): ${r.jobs} jobs, ${r.readings} readings, seeded in ${r.seedMs} ms`);
      console.log(`GET /api/jobs (50, status + search): p50 ${l.p50Ms} ms, p95 ${l.p95Ms} ms, max ${l.maxMs} ms over ${l.samples}`);
      console.log(`GET /api/jobs/[id] (job page data):  p50 ${d.p50Ms} ms, p95 ${d.p95Ms} ms, max ${d.maxMs} ms over ${d.samples}`);
      console.log(`Target p95 ≤ ${r.targetP95Ms} ms: ${r.meetsTarget ? "met" : "MISSED"}`);
    },
    (err) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
