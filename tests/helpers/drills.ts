import { generateDrill, type AskedUnit, type Drill, type DrillKind } from "@/lib/drills";

/** Shared pieces of the tests/unit/drills-*.test.ts files. */

/** `n` drills of a kind from seeds `first`, `first + 1`, …: repeatable, and each file can take its own range. */
export function drillsOf(kind: DrillKind, n: number, first = 1): Drill[] {
  return Array.from({ length: n }, (_, i) => generateDrill(kind.id, first + i));
}

/** A unit of another quantity for each asked unit: the answer "0.25 V" when W is asked. */
export const WRONG_UNIT: Record<Exclude<AskedUnit, "text">, string> = {
  V: "W",
  A: "V",
  Ω: "Hz",
  W: "V",
  F: "H",
  H: "F",
  Hz: "s",
  s: "Hz",
  m: "V",
  S: "Ω",
  "%": "V",
  "": "V",
};
