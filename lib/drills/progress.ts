import { getDrillKind } from "./kinds";
import { computeMastery, type Mastery } from "./mastery";

/**
 * A member's progress from their answered drills (pure: the database hands the answers in). Per kind:
 * attempts, correct answers and mastery by the rule of mastery.ts; over time: one point per day with
 * answers, for the plot on /drills.
 */

export interface AnsweredDrill {
  kind: string;
  correct: boolean;
  at: Date;
}

export interface KindProgress extends Mastery {
  kind: string;
  slug: string;
  title: string;
  lastAnsweredAt: string;
}

export interface ProgressPoint {
  /** The calendar day (UTC), "2025-03-14". */
  date: string;
  answered: number;
  correct: number;
  /** Correct answers so far, that day included. */
  totalCorrect: number;
  /** Mean mastery over the kinds tried so far, 0 to 1, as it stood at the end of that day. */
  mastery: number;
}

const dayOf = (d: Date) => d.toISOString().slice(0, 10);

function byKind(answers: readonly AnsweredDrill[]): Map<string, AnsweredDrill[]> {
  const map = new Map<string, AnsweredDrill[]>();
  for (const a of answers) map.set(a.kind, [...(map.get(a.kind) ?? []), a]);
  return map;
}

/** Tried kinds, least mastered first: where practice is most worth it. */
export function progressByKind(answers: readonly AnsweredDrill[]): KindProgress[] {
  const out: KindProgress[] = [];
  for (const [kind, list] of byKind(answers)) {
    const meta = getDrillKind(kind);
    const last = list.reduce((t, a) => Math.max(t, a.at.getTime()), 0);
    out.push({
      kind,
      slug: meta?.slug ?? kind.split("/")[0],
      // A kind since retired keeps its id as its name, so old answers still count.
      title: meta?.title ?? kind,
      lastAnsweredAt: new Date(last).toISOString(),
      ...computeMastery(list.map((a) => ({ at: a.at, correct: a.correct }))),
    });
  }
  return out.sort((a, b) => a.mastery - b.mastery || a.title.localeCompare(b.title));
}

export function meanMastery(kinds: readonly Pick<Mastery, "mastery">[]): number {
  return kinds.length ? kinds.reduce((s, k) => s + k.mastery, 0) / kinds.length : 0;
}

/** One point per day with answers, oldest first. */
export function progressTimeline(answers: readonly AnsweredDrill[]): ProgressPoint[] {
  const sorted = [...answers].sort((a, b) => a.at.getTime() - b.at.getTime());
  const days = [...new Set(sorted.map((a) => dayOf(a.at)))];
  let totalCorrect = 0;
  return days.map((date) => {
    const today = sorted.filter((a) => dayOf(a.at) === date);
    const upTo = sorted.filter((a) => dayOf(a.at) <= date);
    const correct = today.filter((a) => a.correct).length;
    totalCorrect += correct;
    const mastery = meanMastery([...byKind(upTo).values()].map((list) => computeMastery(list)));
    return { date, answered: today.length, correct, totalCorrect, mastery };
  });
}
