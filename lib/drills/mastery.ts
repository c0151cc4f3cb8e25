/**
 * Mastery of one drill kind by one member, from their attempts alone (pure: the database hands the
 * attempts in, the page shows the result).
 *
 * The rule (ours):
 * - Correct answers earn credit per calendar day: on a day with c correct answers the credit is
 *   1 − 2^(−c), so the first of the day earns ½, the second ¼ more, and no day earns more than 1.
 *   Skill that holds on another day is better evidence than a run of the same problem in one sitting,
 *   so five correct answers on five days count 2.5 and five on one day count under 1.
 * - Each miss costs MISS_COST (½, the worth of a first correct answer on a fresh day), whenever it was.
 * - score = Σ day credits − MISS_COST × misses; mastery = 1 − e^(−score/SCALE) for a positive score,
 *   else 0. With SCALE 4, perfect days give about 0.22 after one, 0.53 after three, 0.83 after seven and
 *   0.92 after ten; it approaches 1 and never reaches it.
 * Consequences the tests hold: a new correct answer never lowers mastery, a new miss never raises
 * it, and it stays within 0 to 1. The order of attempts does not matter, only their days.
 */

export interface Attempt {
  /** When it was answered: a Date, epoch milliseconds or an ISO string. */
  at: Date | number | string;
  correct: boolean;
}

export type MasteryLevelId = "not-tried" | "starting" | "finding-the-way" | "steady" | "dependable" | "sure-handed";

export interface Mastery {
  attempts: number;
  correct: number;
  misses: number;
  /** Distinct days with at least one correct answer. */
  daysWithCorrect: number;
  /** 0 to 1. */
  mastery: number;
  levelId: MasteryLevelId;
  /** The level in our own words, for the page. */
  level: string;
}

export const MISS_COST = 0.5;
export const SCALE = 4;
const DAY_MS = 86_400_000;

/** Lower bound of each level, highest first. */
const LEVELS: readonly { from: number; id: MasteryLevelId; name: string }[] = [
  { from: 0.9, id: "sure-handed", name: "Sure-handed" },
  { from: 0.7, id: "dependable", name: "Dependable" },
  { from: 0.45, id: "steady", name: "Getting steady" },
  { from: 0.2, id: "finding-the-way", name: "Finding the way" },
  { from: 0, id: "starting", name: "Starting out" },
];

/** The calendar day of a moment, counted in the workshop's offset from UTC (minutes east). */
function dayOf(at: Attempt["at"], utcOffsetMinutes: number): string {
  const t = at instanceof Date ? at.getTime() : typeof at === "number" ? at : Date.parse(at);
  return Number.isFinite(t) ? String(Math.floor((t + utcOffsetMinutes * 60_000) / DAY_MS)) : "unknown";
}

export function levelFor(mastery: number, attempts: number): { levelId: MasteryLevelId; level: string } {
  if (attempts === 0) return { levelId: "not-tried", level: "Not tried yet" };
  const l = LEVELS.find((x) => mastery >= x.from) ?? LEVELS[LEVELS.length - 1];
  return { levelId: l.id, level: l.name };
}

export function computeMastery(attempts: readonly Attempt[], options: { utcOffsetMinutes?: number } = {}): Mastery {
  const offset = options.utcOffsetMinutes ?? 0;
  const perDay = new Map<string, number>();
  let correct = 0;
  for (const a of attempts) {
    if (!a.correct) continue;
    correct++;
    const d = dayOf(a.at, offset);
    perDay.set(d, (perDay.get(d) ?? 0) + 1);
  }
  const misses = attempts.length - correct;
  let score = -MISS_COST * misses;
  for (const c of perDay.values()) score += 1 - 2 ** -c;
  const mastery = score > 0 ? 1 - Math.exp(-score / SCALE) : 0;
  return { attempts: attempts.length, correct, misses, daysWithCorrect: perDay.size, mastery, ...levelFor(mastery, attempts.length) };
}
