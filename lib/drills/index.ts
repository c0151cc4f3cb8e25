import { makeDrill } from "./generate";
import { judgeAnswer } from "./judge";
import { DRILL_KINDS, drillKindsFor, getDrillKind } from "./kinds";
import { newSeed, similarSeed } from "./rng";
import type { Drill, DrillKind, Judgement } from "./types";

/**
 * The Drills core: practice problems made from the Bench's calculators, judged by them.
 * Pure and browser-safe (no database, no I/O). The server makes a drill from a kind and a seed,
 * sends `drill.problem` (never the solution), keeps the kind and seed (or the solution), and judges
 * the one answer with `judgeDrill`.
 */

export { computeMastery, levelFor, type Attempt, type Mastery, type MasteryLevelId } from "./mastery";
export { readAnswer, askedHelp, formatAnswer } from "./answer";
export { DRILL_KINDS, drillKindsFor, getDrillKind, newSeed, similarSeed };
export type * from "./types";

export class UnknownDrillKindError extends Error {}

function kindOf(id: string): DrillKind {
  const kind = getDrillKind(id);
  if (!kind) throw new UnknownDrillKindError(`Unknown drill kind "${id}"`);
  return kind;
}

/** GET /api/drills: every kind, one or more per calculator. */
export function describeDrillKinds() {
  return DRILL_KINDS.map(({ id, slug, title, direction, asked }) => ({ id, slug, title, direction, asked }));
}

/** A drill of this kind; the same kind and seed always give the same drill. */
export function generateDrill(kindId: string, seed: number = newSeed()): Drill {
  return makeDrill(kindOf(kindId), seed);
}

/** A drill of a calculator: one of its kinds, chosen by the seed. */
export function generateDrillFor(slug: string, seed: number = newSeed()): Drill {
  const kinds = drillKindsFor(slug);
  if (kinds.length === 0) throw new UnknownDrillKindError(`No drill kind for calculator "${slug}"`);
  return makeDrill(kinds[(seed >>> 0) % kinds.length], seed);
}

/** Judge one answer ("1.5k", "250 mW", 0.25, "high") against the drill's solution. */
export function judgeDrill(drill: Drill, answer: unknown): Judgement {
  return judgeAnswer(kindOf(drill.problem.kind), drill, answer);
}

/** "Try a similar one": a fresh drill of the same kind. */
export function similarDrill(drill: Drill): Drill {
  return generateDrill(drill.problem.kind, similarSeed(drill.problem.seed));
}
