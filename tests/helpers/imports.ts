import fs from "node:fs";
import path from "node:path";

/** The repository's root, for tests that read its source files. */
export const ROOT = path.resolve(import.meta.dirname, "../..");

export interface Import {
  spec: string;
  /** Repository path for our own modules (no extension), the package name otherwise. */
  target: string;
  typeOnly: boolean;
  /** `import("…")`: loaded when first used, not with the module. */
  dynamic: boolean;
}

/** Static, re-export, side-effect and dynamic imports of a repository file, over several lines where they run so. */
export function importsOf(file: string): Import[] {
  const text = fs.readFileSync(path.join(ROOT, file), "utf8");
  const found: Import[] = [];
  const patterns = [
    /^\s*(import|export)\s+(type\s+)?[^'";]*?\s+from\s+["']([^"']+)["']/gm,
    /^\s*import\s+()()["']([^"']+)["']/gm,
    /\bimport\(\s*()()["']([^"']+)["']\s*\)/g,
  ];
  patterns.forEach((re, i) => {
    for (const m of text.matchAll(re)) {
      const spec = m[3];
      let target = spec;
      if (spec.startsWith("@/")) target = path.normalize(spec.slice(2));
      else if (spec.startsWith(".")) target = path.normalize(path.join(path.dirname(file), spec));
      found.push({ spec, target, typeOnly: !!m[2], dynamic: i === 2 });
    }
  });
  return found;
}

/** The file an import of one of our own modules names ("lib/calc/run" → "lib/calc/run.ts"), or null. */
export function moduleFile(target: string): string | null {
  for (const ext of ["", ".ts", ".tsx", "/index.ts", "/index.tsx"]) {
    const f = path.join(ROOT, target + ext);
    if (fs.existsSync(f) && fs.statSync(f).isFile()) return target + ext;
  }
  return null;
}
