/**
 * Page speed and accessibility: Lighthouse 12.2.3 (Debian Chromium) on /bench/cathode-bias, /jobs and a
 * job's page (signed in as the demo technician) with the desktop preset and the default (mobile)
 * settings, the first-load JS of /bench/[slug], and the
 * keystroke-to-result time in Chromium. Starts the built server itself (a seeded temporary database)
 * unless BENCH_BASE_URL names one. Run: `npx tsx tests/bench/ui-bench.ts` (add `--json`).
 */
import { execFile, spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { gzipSync } from "node:zlib";
import { chromium } from "playwright-core";

export const UI_TARGETS = { lighthouse: 95, firstLoadKb: 180, keystrokeMs: 16 } as const;

const ROOT = process.cwd();
const CHROME = process.env.CHROME_PATH ?? process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
const PAGE = "/bench/cathode-bias";

async function startServer(): Promise<{ baseUrl: string; stop: () => void }> {
  if (process.env.BENCH_BASE_URL) return { baseUrl: process.env.BENCH_BASE_URL.replace(/\/$/, ""), stop: () => {} };
  if (!fs.existsSync(path.join(ROOT, ".next", "BUILD_ID"))) throw new Error("Build first (`npx next build`), or set BENCH_BASE_URL.");
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "glowbench-ui-bench-"));
  const env = {
    ...process.env,
    NODE_ENV: "production" as const,
    GLOWBENCH_DB: path.join(dir, "glowbench.db"),
    SESSION_SECRET: "bench-secret-bench-secret-bench-secret-0123",
  };
  await new Promise<void>((resolve, reject) => {
    const seed = spawn(process.execPath, [path.join(ROOT, "node_modules/tsx/dist/cli.mjs"), "db/seed.ts"], { env, stdio: "ignore" });
    seed.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`seed exited ${code}`))));
  });
  const port = 20_000 + Math.floor(Math.random() * 20_000);
  const child: ChildProcess = spawn(process.execPath, [path.join(ROOT, "node_modules/next/dist/bin/next"), "start", "-p", String(port), "-H", "127.0.0.1"], {
    env,
    stdio: "ignore",
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return { baseUrl, stop: () => child.kill("SIGTERM") };
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  child.kill("SIGTERM");
  throw new Error("The server did not start");
}

/** The JS files the page's HTML loads (scripts and script preloads), read from the build output. */
async function firstLoadJs(baseUrl: string) {
  const html = await (await fetch(`${baseUrl}${PAGE}`)).text();
  const srcs = new Set<string>();
  // noModule scripts (the legacy polyfills) are never fetched by a modern browser, so they are not counted.
  for (const m of html.matchAll(/<script([^>]*)>/g)) {
    const src = /\ssrc="([^"]+\.js)"/.exec(m[1])?.[1];
    if (src && !/\snoModule/i.test(m[1])) srcs.add(src);
  }
  for (const m of html.matchAll(/<link[^>]+rel="preload"[^>]+as="script"[^>]*href="([^"]+)"|<link[^>]+href="([^"]+\.js)"[^>]+as="script"/g))
    srcs.add(m[1] ?? m[2]);
  let raw = 0;
  let gzip = 0;
  const files: { file: string; raw: number; gzip: number }[] = [];
  for (const src of srcs) {
    const rel = decodeURIComponent(src.replace(/^.*\/_next\//, "")).replace(/\?.*$/, "");
    const bytes = fs.readFileSync(path.join(ROOT, ".next", rel));
    const g = gzipSync(bytes, { level: 9 }).length;
    raw += bytes.length;
    gzip += g;
    files.push({ file: rel, raw: bytes.length, gzip: g });
  }
  return { files: files.length, rawKb: kb(raw), gzipKb: kb(gzip), meetsTarget: kb(gzip) <= UI_TARGETS.firstLoadKb };
}

const kb = (n: number) => Math.round((n / 1024) * 10) / 10;

/** JS the page fetches by network idle, then once in use (the calculator module and KaTeX load on first use). */
async function allJs(baseUrl: string) {
  const browser = await chromium.launch({ executablePath: CHROME, args: ["--no-sandbox", "--disable-gpu"] });
  const page = await browser.newPage();
  const sum = () =>
    page.evaluate(() => {
      const js = (performance.getEntriesByType("resource") as PerformanceResourceTiming[]).filter((e) => /\.js(\?|$)/.test(e.name));
      return { files: js.length, raw: js.reduce((n, e) => n + e.decodedBodySize, 0), encoded: js.reduce((n, e) => n + e.encodedBodySize, 0) };
    });
  await page.goto(`${baseUrl}${PAGE}`, { waitUntil: "networkidle" });
  const idle = await sum();
  await page.locator("#in-biasVoltage").focus();
  await page.keyboard.type("5");
  await page.waitForLoadState("networkidle");
  await page.waitForTimeout(500);
  const inUse = await sum();
  await browser.close();
  // The test server does not compress, so "raw" is what the files weigh uncompressed.
  return { untilIdle: { files: idle.files, rawKb: kb(idle.raw) }, onceInUse: { files: inUse.files, rawKb: kb(inUse.raw) } };
}

/** Time from the input event to the result's DOM update, per keystroke, with performance marks. */
async function keystrokes(baseUrl: string, n = 120) {
  const browser = await chromium.launch({ executablePath: CHROME, args: ["--no-sandbox", "--disable-gpu"] });
  const page = await browser.newPage();
  await page.goto(`${baseUrl}${PAGE}`);
  await page.locator("#in-biasVoltage").focus(); // the calculator module loads on first use of the form
  await page.waitForFunction(() => document.documentElement.dataset.benchReady === "1");
  await page.evaluate(() => {
    const w = window as unknown as { __gbTimes: number[] };
    w.__gbTimes = [];
    let pending = false;
    window.addEventListener(
      "input",
      () => {
        performance.mark("gb-input");
        pending = true;
      },
      { capture: true },
    );
    const target = document.querySelector('[data-testid="result"]')!.parentElement!;
    new MutationObserver(() => {
      if (!pending) return;
      pending = false;
      performance.mark("gb-result");
      w.__gbTimes.push(performance.measure("gb-keystroke", "gb-input", "gb-result").duration);
    }).observe(target, { subtree: true, childList: true, characterData: true });
  });
  const field = page.locator("#in-biasVoltage");
  await field.click();
  const digits = "123456789";
  for (let i = 0; i < n; i++) {
    if (i % 4 === 0) await page.keyboard.press("Control+A");
    await page.keyboard.type(digits[i % digits.length]);
    await page.waitForTimeout(25);
  }
  const times = (await page.evaluate(() => (window as unknown as { __gbTimes: number[] }).__gbTimes)).sort((a, b) => a - b);
  await browser.close();
  const q = (p: number) => Math.round(times[Math.min(times.length - 1, Math.floor(p * times.length))] * 100) / 100;
  return { samples: times.length, medianMs: q(0.5), p95Ms: q(0.95), meetsTarget: q(0.95) < UI_TARGETS.keystrokeMs };
}

/** The demo technician's session cookie, for Lighthouse's requests to signed-in pages. */
async function signInCookie(baseUrl: string): Promise<string> {
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: baseUrl },
    body: JSON.stringify({ email: "tech@demo.test", password: "glowbench-demo" }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.getSetCookie()[0].split(";")[0];
}

function lighthouse(url: string, desktop: boolean, cookie?: string): Promise<{ performance: number; accessibility: number }> {
  const out = path.join(os.tmpdir(), `glowbench-lh-${desktop ? "desktop" : "mobile"}-${process.pid}.json`);
  const args = [
    url,
    "--quiet",
    "--output=json",
    `--output-path=${out}`,
    "--only-categories=performance,accessibility",
    "--chrome-flags=--headless --no-sandbox --disable-gpu --disable-dev-shm-usage",
    ...(desktop ? ["--preset=desktop"] : []),
    ...(cookie ? [`--extra-headers=${JSON.stringify({ Cookie: cookie })}`] : []),
  ];
  return new Promise((resolve, reject) => {
    execFile(path.join(ROOT, "node_modules/.bin/lighthouse"), args, { env: { ...process.env, CHROME_PATH: CHROME }, maxBuffer: 1 << 26 }, (err) => {
      if (err) return reject(err);
      const r = JSON.parse(fs.readFileSync(out, "utf8"));
      fs.rmSync(out, { force: true });
      resolve({ performance: Math.round(r.categories.performance.score * 100), accessibility: Math.round(r.categories.accessibility.score * 100) });
    });
  });
}

export async function run(): Promise<Record<string, unknown>> {
  const server = await startServer();
  try {
    const cookie = await signInCookie(server.baseUrl);
    const jobs = (await (await fetch(`${server.baseUrl}/api/jobs`, { headers: { cookie } })).json()) as { jobs: { id: number }[] };
    const pages = [PAGE, "/jobs", `/jobs/${jobs.jobs[0].id}`];
    const lighthouseRuns: Record<string, unknown> = {};
    let meets = true;
    for (const page of pages) {
      const url = `${server.baseUrl}${page}`;
      const pageCookie = page === PAGE ? undefined : cookie;
      await fetch(url, { headers: pageCookie ? { cookie: pageCookie } : {} }); // warm the route once
      const desktop = await lighthouse(url, true, pageCookie);
      const mobile = await lighthouse(url, false, pageCookie);
      lighthouseRuns[page] = { desktopPreset: desktop, mobileDefault: mobile };
      meets &&= [desktop, mobile].every((s) => s.performance >= UI_TARGETS.lighthouse && s.accessibility >= UI_TARGETS.lighthouse);
    }
    return {
      page: PAGE,
      targets: UI_TARGETS,
      lighthouse: { ...lighthouseRuns, meetsTarget: meets },
      firstLoadJs: await firstLoadJs(server.baseUrl),
      allJs: await allJs(server.baseUrl),
      keystrokeToResult: await keystrokes(server.baseUrl),
    };
  } finally {
    server.stop();
  }
}

if (process.argv[1] && /ui-bench\.ts$/.test(process.argv[1])) {
  run().then(
    (r) => console.log(JSON.stringify(r, null, 2)),
    (err) => {
      console.error(err);
      process.exitCode = 1;
    },
  );
}
