import fs from "node:fs";
import path from "node:path";
import { expect, test } from "vitest";
import { ROOT, importsOf, moduleFile } from "../helpers/imports";

/**
 * What every page's first load may not carry. The shell (on every signed-in page) and the Bench's
 * client components load zod only when a calculator is first used (lib/bench/load-calculator.ts), and
 * the jobs list and a job's Overview load their forms only when one is opened (components/jobs/lazy-forms.tsx),
 * so these pages stay within their first-load budget (README, "Pages on a phone and a desk"). A static import that reaches
 * zod from one of them puts some 30 kB gzipped onto every page: this walks the static imports (not
 * `import()`, not `import type`) and fails on such a path, naming it.
 */

const HEAVY = ["zod", "katex", "recharts", "mathjs", "@react-pdf/renderer"];

/** Every module reached by static value imports from `entry`, each with the path that reached it (packages as "pkg:name"). */
function reach(entry: string): Map<string, string[]> {
  const seen = new Map<string, string[]>();
  const walk = (file: string, trail: string[]) => {
    if (seen.has(file)) return;
    seen.set(file, trail);
    if (file.startsWith("pkg:")) return;
    for (const { spec, target, typeOnly, dynamic } of importsOf(file)) {
      if (typeOnly || dynamic) continue;
      const next = spec.startsWith("@/") || spec.startsWith(".") ? moduleFile(target) : `pkg:${spec}`;
      if (next) walk(next, [...trail, next]);
    }
  };
  walk(entry, [entry]);
  return seen;
}

const isClient = (file: string) => fs.readFileSync(path.join(ROOT, file), "utf8").startsWith('"use client"');

/**
 * The client components a page's server code renders: the framework loads each one's static imports
 * with the page, rendered or not (a form that starts closed included), so these are where a heavy
 * import must be deferred with `import()` or `next/dynamic`.
 */
function clientComponentsOf(pages: string[]): string[] {
  const found = new Set<string>();
  const seen = new Set<string>();
  const walk = (file: string) => {
    if (seen.has(file)) return;
    seen.add(file);
    if (isClient(file)) return void found.add(file);
    for (const { spec, target, typeOnly, dynamic } of importsOf(file)) {
      if (typeOnly || dynamic || !(spec.startsWith("@/") || spec.startsWith("."))) continue;
      const next = moduleFile(target);
      if (next) walk(next);
    }
  };
  pages.forEach(walk);
  return [...found];
}

/** The jobs list and a job's Overview, with the signed-in layouts around them. */
const JOB_PAGES = ["app/(app)/layout.tsx", "app/(app)/jobs/page.tsx", "app/(app)/jobs/[id]/layout.tsx", "app/(app)/jobs/[id]/page.tsx"];

const ENTRIES = [
  ...["components/shell", "components/bench", "components/providers"].flatMap((dir) =>
    fs
      .readdirSync(path.join(ROOT, dir))
      .filter((f) => /\.tsx?$/.test(f) && isClient(`${dir}/${f}`))
      .map((f) => `${dir}/${f}`),
  ),
  ...clientComponentsOf(JOB_PAGES),
].filter((f, i, all) => all.indexOf(f) === i);

test("the shell's, the Bench's and the job pages' client components are found", () => {
  expect(ENTRIES).toContain("components/shell/sign-out-button.tsx");
  expect(ENTRIES).toContain("components/bench/calculator-view.tsx");
  expect(ENTRIES).toContain("components/jobs/jobs-page-client.tsx");
  expect(ENTRIES).toContain("components/jobs/status-workflow.tsx");
  expect(ENTRIES).toContain("components/jobs/job-details.tsx");
});

test.each(clientComponentsOf(JOB_PAGES))("%s, on the jobs list or a job's Overview, reaches no form library through a static import", (entry) => {
  // The Bench's calculator form needs react-hook-form at once; these pages' forms start closed.
  const forms = [...reach(entry)].filter(([m]) => m === "pkg:react-hook-form" || m.startsWith("pkg:@hookform/")).map(([, trail]) => trail.join(" > "));
  expect(forms).toEqual([]);
});

test.each(ENTRIES)("%s reaches no heavy package through a static import", (entry) => {
  const heavy = [...reach(entry)].filter(([m]) => HEAVY.some((p) => m === `pkg:${p}` || m.startsWith(`pkg:${p}/`))).map(([, trail]) => trail.join(" > "));
  expect(heavy).toEqual([]);
});

test("the walk does find a heavy package where one is imported (the check can fail)", () => {
  const reached = [...reach("lib/jobs/ready-checks.ts").keys()];
  expect(reached).toContain("pkg:zod");
});
