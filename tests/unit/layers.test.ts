import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { ROOT, importsOf } from "../helpers/imports";

/**
 * The floors of DEVELOPERS.md ("Layers"), read from the import lines themselves:
 * app → components → server → db → lib, each importing only its own floor or those below.
 */

const FLOORS = ["lib", "db", "server", "components", "app"] as const;
type Floor = (typeof FLOORS)[number];
/** Entry points Next.js loads beside app/ sit on its floor. */
const ENTRY_FILES: Record<string, Floor> = { "proxy.ts": "app", "instrumentation.ts": "app" };

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true })) {
    const rel = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(rel));
    else if (/\.(ts|tsx|mts)$/.test(entry.name) && !/\.test\.ts$/.test(entry.name)) out.push(rel);
  }
  return out;
}

const FILES = [...FLOORS.flatMap((f) => sourceFiles(f)), ...Object.keys(ENTRY_FILES)];

function floorOf(file: string): Floor | null {
  if (ENTRY_FILES[file]) return ENTRY_FILES[file];
  const top = file.split(path.sep)[0] as Floor;
  return FLOORS.includes(top) ? top : null;
}

const ALL = FILES.map((file) => ({ file, floor: floorOf(file)!, imports: importsOf(file) }));

describe("import direction", () => {
  test("the scan sees every floor and their imports", () => {
    for (const floor of FLOORS) expect(ALL.filter((f) => f.floor === floor).length, floor).toBeGreaterThan(3);
    // A parser that found nothing would pass every rule below.
    expect(ALL.find((f) => f.file === path.join("server", "http", "route.ts"))!.imports.map((i) => i.target)).toContain(path.join("server", "auth", "member"));
  });

  test("no import runs back up: each floor imports only itself and the floors below", () => {
    const upward: string[] = [];
    for (const { file, floor, imports } of ALL) {
      for (const { spec, target } of imports) {
        const to = spec.startsWith("@/") || spec.startsWith(".") ? floorOf(target) : null;
        if (to && FLOORS.indexOf(to) > FLOORS.indexOf(floor)) upward.push(`${file} (${floor}) imports ${spec} (${to})`);
      }
    }
    expect(upward).toEqual([]);
  });

  test("every SQL statement is in db/: nothing else reaches for the driver, the query builder or the tables", () => {
    const outside = ALL.filter(({ floor }) => floor !== "db").flatMap(({ file, imports }) =>
      imports
        .filter(({ target }) => /^(drizzle-orm|better-sqlite3)(\/|$)/.test(target) || target === path.join("db", "schema"))
        .map(({ spec }) => `${file} imports ${spec}`),
    );
    expect(outside).toEqual([]);
  });

  test('every file of the server floor starts with import "server-only"', () => {
    const unmarked = ALL.filter(({ floor }) => floor === "server").filter(
      ({ file }) => !/^import "server-only";/.test(fs.readFileSync(path.join(ROOT, file), "utf8")),
    );
    expect(unmarked.map((f) => f.file)).toEqual([]);
  });

  test("client components take only types from the server floor and db/", () => {
    const leaks = ALL.filter(({ file }) => /^\s*["']use client["']/.test(fs.readFileSync(path.join(ROOT, file), "utf8"))).flatMap(({ file, imports }) =>
      imports.filter(({ target, typeOnly }) => !typeOnly && /^(server|db)(\/|$)/.test(target)).map(({ spec }) => `${file} imports ${spec}`),
    );
    expect(leaks).toEqual([]);
  });
});
