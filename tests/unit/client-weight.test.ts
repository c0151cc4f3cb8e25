import fs from "node:fs";
import path from "node:path";
import { expect, test } from "vitest";
import { ROOT, importsOf, moduleFile } from "../helpers/imports";

/**
 * What every page's first load may not carry. The shell (on every signed-in page) and the Bench's
 * client components load zod only when a calculator is first used (lib/bench/load-calculator.ts), so a
 * Bench page stays within its first-load budget (README, "Pages on a phone and a desk"). A static import that reaches
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

const ENTRIES = ["components/shell", "components/bench", "components/providers"].flatMap((dir) =>
  fs
    .readdirSync(path.join(ROOT, dir))
    .filter((f) => /\.tsx?$/.test(f) && fs.readFileSync(path.join(ROOT, dir, f), "utf8").startsWith('"use client"'))
    .map((f) => `${dir}/${f}`),
);

test("the shell's and the Bench's client components are found", () => {
  expect(ENTRIES).toContain("components/shell/sign-out-button.tsx");
  expect(ENTRIES).toContain("components/bench/calculator-view.tsx");
});

test.each(ENTRIES)("%s reaches no heavy package through a static import", (entry) => {
  const heavy = [...reach(entry)].filter(([m]) => HEAVY.some((p) => m === `pkg:${p}` || m.startsWith(`pkg:${p}/`))).map(([, trail]) => trail.join(" > "));
  expect(heavy).toEqual([]);
});

test("the walk does find a heavy package where one is imported (the check can fail)", () => {
  const reached = [...reach("lib/jobs/ready-checks.ts").keys()];
  expect(reached).toContain("pkg:zod");
});
