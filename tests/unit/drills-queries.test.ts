import { beforeAll, describe, expect, test } from "vitest";
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from "@/lib/errors";
import { DRILL_KINDS, formatAnswer, generateDrill } from "@/lib/drills";
import { WRONG_UNIT } from "../helpers/drills";
import type { Member } from "@/lib/auth/can";
import { demoDatabase } from "../helpers/temp-db";

/**
 * The drills query layer against a freshly migrated temporary database seeded with the demo scenario.
 * This is where every drill kind is answered 100 times (tests/server/drills.test.ts does 100 per kind for a
 * handful of kinds over HTTP: 61 kinds × 100 × two requests would make the server run far too long).
 */

// First, before anything opens the database: a fresh migrated file for the process's one client (getDb).
const demo = await demoDatabase("drills");
const { getDb } = demo;
const q = await import("@/db/queries/drills");
const { calculations, drills } = await import("@/db/schema");
const { eq } = await import("drizzle-orm");

type M = Member;
let owner: M, tech: M, apprentice: M, other: M;

beforeAll(async () => {
  ({ owner, tech, apprentice, other } = await demo.seed());
});

/** The stored row of a drill, read straight from the table: the test's way to the expected answer. */
const stored = (id: number) => getDb().select().from(drills).where(eq(drills.id, id)).get()!;

describe("drills queries", () => {
  test("every kind, 100 drills each: the stored drill is the core's drill for its seed, and the expected answer as written is judged right", () => {
    let answered = 0;
    for (const kind of DRILL_KINDS) {
      for (let i = 0; i < 100; i++) {
        const made = q.createDrill(apprentice, { kind: kind.id });
        expect(JSON.stringify(made)).not.toContain('"seed"');
        const row = stored(made.id);
        const again = generateDrill(kind.id, row.seed);
        expect(row.problem).toEqual(JSON.parse(JSON.stringify(again.problem)));
        // Alternate the answer's form: the text as the working writes it, and the bare SI number.
        const { expected } = again.solution;
        const answer =
          i % 2 === 0 || typeof expected === "string" ? formatAnswer(expected, kind.asked.unit, 6) : kind.asked.unit === "%" ? expected * 100 : expected;
        const result = q.answerDrill(apprentice, made.id, answer);
        expect(result.correct, `${kind.id} seed ${row.seed}: ${String(answer)}`).toBe(true);
        expect(result.verdict).toBe("correct");
        answered++;
      }
    }
    expect(answered).toBe(DRILL_KINDS.length * 100);
    const progress = q.drillProgress(apprentice);
    expect(progress.totals.attempts).toBe(answered);
    expect(progress.kinds).toHaveLength(DRILL_KINDS.length);
    for (const k of progress.kinds) expect([k.attempts, k.correct, k.misses]).toEqual([100, 100, 0]);
  }, 300_000);

  test("a wrong number and a wrong unit are judged wrong and told apart; a second answer is a conflict", () => {
    const numeric = DRILL_KINDS.filter((k) => k.asked.unit !== "text" && k.asked.unit !== "" && k.asked.unit !== "%");
    for (const kind of numeric) {
      const a = q.createDrill(tech, { kind: kind.id });
      const { expected } = stored(a.id).solution as { expected: number };
      const wrong = q.answerDrill(tech, a.id, formatAnswer(expected * 3, kind.asked.unit, 4));
      expect([wrong.correct, wrong.verdict], kind.id).toEqual([false, "wrong-number"]);
      expect(() => q.answerDrill(tech, a.id, formatAnswer(expected, kind.asked.unit, 6))).toThrow(ConflictError);

      const b = q.createDrill(tech, { kind: kind.id });
      const right = (stored(b.id).solution as { expected: number }).expected;
      const unit = WRONG_UNIT[kind.asked.unit as keyof typeof WRONG_UNIT];
      const wrongUnit = q.answerDrill(tech, b.id, `${right} ${unit}`);
      expect([wrongUnit.correct, wrongUnit.verdict], `${kind.id}: ${right} ${unit}`).toEqual([false, "wrong-unit"]);
    }
  });

  test("bad answers are refused without using the drill up; another member's or workshop's drill is refused", () => {
    const d = q.createDrill(apprentice, { kind: "ohms-law/current" });
    expect(() => q.answerDrill(apprentice, d.id, "banana")).toThrow(ValidationError);
    expect(stored(d.id).answeredAt).toBeNull();
    expect(() => q.answerDrill(other, d.id, "1")).toThrow(NotFoundError);
    expect(() => q.answerDrill(tech, d.id, "1")).toThrow(ForbiddenError);
    expect(() => q.getDrill(other, d.id)).toThrow(NotFoundError);
    // A mentor sees the problem, never the solution before the answer.
    const seen = q.getDrill(tech, d.id);
    expect(seen.result).toBeNull();
    expect(JSON.stringify(seen)).not.toContain("expected");
    expect(() => q.createDrill(apprentice, { kind: "no-such/kind" })).toThrow(ValidationError);
    expect(() => q.createDrill(apprentice, { slug: "no-such-calculator" })).toThrow(ValidationError);
  });

  test("progress: apprentices see their own only; mentors any apprentice of their workshop; another workshop's member is not found", () => {
    expect(q.drillProgress(owner, apprentice.userId).member.name).toBe(apprentice.name);
    expect(() => q.drillProgress(apprentice, tech.userId)).toThrow(ForbiddenError);
    expect(() => q.drillProgress(owner, other.userId)).toThrow(NotFoundError);
    expect(() => q.drillProgress(other, apprentice.userId)).toThrow(NotFoundError);
    expect(q.apprenticesProgress(tech).map((a) => a.name)).toEqual([apprentice.name]);
    expect(() => q.apprenticesProgress(apprentice)).toThrow(ForbiddenError);
    const timeline = q.drillProgress(apprentice).timeline;
    expect(timeline.length).toBeGreaterThan(0);
    expect(timeline.at(-1)!.totalCorrect).toBe(DRILL_KINDS.length * 100);
  });

  test("assignments: set by owners and technicians for an apprentice of their workshop, with a due date; listed for the apprentice", () => {
    const due = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
    const set = q.createAssignment(tech, { apprentice: apprentice.userId, kinds: ["cathode-bias", "ohms-law/current"], count: 5, due });
    expect([set.count, set.drills.length, set.state, set.dueDate]).toEqual([5, 5, "open", due]);
    expect(set.drills.filter((d) => d.kind === "ohms-law/current")).toHaveLength(2);
    expect(q.listAssignments(apprentice).map((a) => a.id)).toContain(set.id);
    expect(q.listAssignments(other)).toEqual([]);
    expect(() => q.createAssignment(apprentice, { apprentice: apprentice.userId, kinds: ["ohms-law"], due })).toThrow(ForbiddenError);
    expect(() => q.createAssignment(owner, { apprentice: tech.userId, kinds: ["ohms-law"], due })).toThrow(NotFoundError);
    expect(() => q.createAssignment(other, { apprentice: apprentice.userId, kinds: ["ohms-law"], due })).toThrow(NotFoundError);
    expect(() => q.createAssignment(owner, { apprentice: apprentice.userId, kinds: ["nothing-like-it"], due })).toThrow(ValidationError);
  });

  test("from the bench: a saved calculation becomes a drill of its calculator, and the prompt says it is a similar one", () => {
    const calc = getDb()
      .select({ id: calculations.id, slug: calculations.slug })
      .from(calculations)
      .where(eq(calculations.workshopId, owner.workshopId))
      .get()!;
    const due = new Date().toISOString().slice(0, 10);
    const set = q.createAssignment(owner, { apprentice: apprentice.userId, calculationId: calc.id, due });
    const row = stored(set.drills[0].id);
    expect([row.slug, row.sourceCalculationId, row.userId]).toEqual([calc.slug, calc.id, apprentice.userId]);
    expect(q.getDrill(apprentice, row.id).prompt).toMatch(/^Like the .+ saved on .+ with figures of its own/);
    expect(() => q.createDrill(other, { calculationId: calc.id })).toThrow(NotFoundError);
  });
});
