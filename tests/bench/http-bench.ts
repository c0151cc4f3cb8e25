/**
 * HTTP load with autocannon on one production server (`next start`, temporary database):
 * POST /api/calculators/cathode-bias against GET /api/health, alternated over several rounds
 * (health first in even rounds, the calculator first in odd ones) so drift in the machine's load
 * falls on both alike. /api/health is force-dynamic, so both routes run a handler per request.
 * Run alone: `npx tsx tests/bench/http-bench.ts` (needs `npx next build` first).
 */
import { spawn } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import autocannon from "autocannon";
import { samples } from "./samples";

export const HTTP_TARGET_RATIO = 0.8;

export interface RouteFigures {
  route: string;
  /** Median over rounds. */
  requestsPerSecond: number;
  p50Ms: number;
  p99Ms: number;
  rounds: number[];
  /**
   * Server CPU time per request (user + system, from /proc), median over rounds; null off Linux.
   * On a shared machine throughput swings with other work, but this barely moves.
   */
  cpuMicrosPerRequest: number | null;
  non2xx: number;
  errors: number;
}

export interface HttpReport {
  connections: number;
  seconds: number;
  health: RouteFigures;
  calculator: RouteFigures;
  ratio: number;
  /** health's CPU per request ÷ the calculator's: the throughput ratio a quiet, CPU-bound server would show. */
  cpuRatio: number | null;
  meetsTarget: boolean;
}

const ROOT = process.cwd();

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

const TICK_MICROS = 1e6 / 100; // USER_HZ is 100 on Linux

/** CPU ticks (user + system) used so far by a process and all its descendants; null without /proc. */
function cpuTicks(root: number): number | null {
  try {
    const stats = fs
      .readdirSync("/proc")
      .filter((d) => /^\d+$/.test(d))
      .map((d) => {
        try {
          // Fields after the ")" that ends the command name: state ppid ... utime(12th) stime(13th)
          const rest = fs.readFileSync(`/proc/${d}/stat`, "utf8").split(") ")[1].split(" ");
          return { pid: Number(d), ppid: Number(rest[1]), ticks: Number(rest[11]) + Number(rest[12]) };
        } catch {
          return null;
        }
      })
      .filter((x): x is { pid: number; ppid: number; ticks: number } => x !== null);
    const tree = new Set([root]);
    for (let grew = true; grew;) {
      grew = false;
      for (const p of stats) {
        if (!tree.has(p.pid) && tree.has(p.ppid)) {
          tree.add(p.pid);
          grew = true;
        }
      }
    }
    return stats.filter((p) => tree.has(p.pid)).reduce((n, p) => n + p.ticks, 0);
  } catch {
    return null;
  }
}

async function startServer(): Promise<{ base: string; pid: number; stop: () => void }> {
  if (!fs.existsSync(path.join(ROOT, ".next", "BUILD_ID"))) throw new Error("No build: run `npx next build` first.");
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-http-bench-"));
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    GLOWBENCH_DB: path.join(dir, "glowbench.db"),
    GLOWBENCH_UPLOADS: path.join(dir, "uploads"),
    SESSION_SECRET: "bench-secret-bench-secret-bench-secret-0123",
    PORT: String(port),
  };
  const child = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    env,
    stdio: "ignore",
  });
  const base = `http://127.0.0.1:${port}`;
  const stop = () => {
    child.kill("SIGTERM");
    fs.rmSync(dir, { recursive: true, force: true });
  };
  for (let i = 0; i < 240; i++) {
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return { base, pid: child.pid as number, stop };
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  stop();
  throw new Error("The server did not answer /api/health within 60 s");
}

interface Load {
  route: string;
  opts: { method: "GET" | "POST"; path: string; headers?: Record<string, string>; body?: string };
}

const BODY = JSON.stringify(samples["cathode-bias"]);
const HEALTH: Load = { route: "GET /api/health", opts: { method: "GET", path: "/api/health" } };
const CALC: Load = {
  route: "POST /api/calculators/cathode-bias",
  opts: { method: "POST", path: "/api/calculators/cathode-bias", headers: { "content-type": "application/json" }, body: BODY },
};

async function fire(base: string, pid: number, load: Load, seconds: number, connections: number) {
  const { method, path: route, headers, body } = load.opts;
  const before = cpuTicks(pid);
  const r = await autocannon({ url: `${base}${route}`, method, headers, body, connections, duration: seconds });
  const after = cpuTicks(pid);
  const cpu = before === null || after === null || r.requests.total === 0 ? null : ((after - before) * TICK_MICROS) / r.requests.total;
  return { rps: r.requests.total / (r.duration || seconds), p50: r.latency.p50, p99: r.latency.p99, cpu, non2xx: r.non2xx, errors: r.errors + r.timeouts };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
}

export async function runHttpBench(o: { rounds?: number; seconds?: number; connections?: number } = {}): Promise<HttpReport> {
  const rounds = o.rounds ?? 6;
  const seconds = o.seconds ?? 4;
  const connections = o.connections ?? 10;
  const server = await startServer();
  try {
    // The calculator must answer 200 before its throughput means anything.
    const check = await fetch(`${server.base}${CALC.opts.path}`, { method: "POST", headers: CALC.opts.headers, body: BODY });
    if (check.status !== 200) throw new Error(`cathode-bias answered ${check.status}: ${(await check.text()).slice(0, 200)}`);
    await fire(server.base, server.pid, HEALTH, 2, connections); // warm-up: JIT and route loading
    await fire(server.base, server.pid, CALC, 2, connections);
    const runs = new Map<Load, Awaited<ReturnType<typeof fire>>[]>([
      [HEALTH, []],
      [CALC, []],
    ]);
    for (let r = 0; r < rounds; r++) {
      for (const load of r % 2 === 0 ? [HEALTH, CALC] : [CALC, HEALTH]) runs.get(load)!.push(await fire(server.base, server.pid, load, seconds, connections));
    }
    const figures = (load: Load): RouteFigures => {
      const xs = runs.get(load)!;
      return {
        route: load.route,
        requestsPerSecond: median(xs.map((x) => x.rps)),
        p50Ms: median(xs.map((x) => x.p50)),
        p99Ms: median(xs.map((x) => x.p99)),
        rounds: xs.map((x) => Math.round(x.rps)),
        cpuMicrosPerRequest: xs.every((x) => x.cpu !== null) ? median(xs.map((x) => x.cpu as number)) : null,
        non2xx: xs.reduce((n, x) => n + x.non2xx, 0),
        errors: xs.reduce((n, x) => n + x.errors, 0),
      };
    };
    const health = figures(HEALTH);
    const calculator = figures(CALC);
    const ratio = calculator.requestsPerSecond / health.requestsPerSecond;
    const cpuRatio = health.cpuMicrosPerRequest && calculator.cpuMicrosPerRequest ? health.cpuMicrosPerRequest / calculator.cpuMicrosPerRequest : null;
    return { connections, seconds, health, calculator, ratio, cpuRatio, meetsTarget: ratio >= HTTP_TARGET_RATIO && calculator.non2xx === 0 };
  } finally {
    server.stop();
  }
}

if (process.argv[1] && /http-bench\.ts$/.test(process.argv[1])) {
  runHttpBench().then(
    (r) => console.log(JSON.stringify(r, null, 2)),
    (err) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
