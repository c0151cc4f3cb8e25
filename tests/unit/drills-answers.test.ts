import { describe, expect, it } from "vitest";
import { DRILL_KINDS, formatAnswer, judgeDrill } from "@/lib/drills";
import { drillsOf, WRONG_UNIT } from "../helpers/drills";

/**
 * Every drill kind, 100 generated problems each: the expected answer, given back as an SI number and
 * as engineering text, is judged right; a wrong unit and a wrong number are judged wrong and told apart.
 */

describe.each(DRILL_KINDS.map((k) => [k.id, k] as const))("%s", (_id, kind) => {
  const drills = drillsOf(kind, 100);

  it("judges the expected answer right, as SI and as text", () => {
    for (const d of drills) {
      const { expected, expectedText } = d.solution;
      const asText = judgeDrill(d, expectedText);
      expect(asText.verdict, `${d.problem.prompt} — "${expectedText}"`).toBe("correct");
      expect(asText.correct).toBe(true);
      if (typeof expected === "number") {
        // A bare JSON number is in the asked unit: per cent for a "%" ask, SI otherwise.
        const asNumber = kind.asked.unit === "%" ? expected * 100 : expected;
        expect(judgeDrill(d, asNumber).verdict, `${d.problem.prompt} — ${asNumber}`).toBe("correct");
        // Six figures of engineering text too, so an exact answer is not saved by rounding.
        expect(judgeDrill(d, formatAnswer(expected, kind.asked.unit, 6)).correct).toBe(true);
      } else {
        expect(judgeDrill(d, `  ${expected.toUpperCase()} `).correct).toBe(true);
      }
    }
  });

  it("tells a wrong unit from a wrong number", () => {
    for (const d of drills) {
      const { expected } = d.solution;
      if (typeof expected === "string" || kind.asked.unit === "text") {
        const wrong = judgeDrill(d, "purple sideways");
        expect(wrong.verdict).toBe("wrong-number");
        expect(wrong.correct).toBe(false);
        continue;
      }
      // The right number with another quantity's unit on it: a wrong unit, and the message says the number is right.
      const shown = kind.asked.unit === "%" ? expected * 100 : expected;
      const unit = WRONG_UNIT[kind.asked.unit as keyof typeof WRONG_UNIT];
      const wrongUnit = judgeDrill(d, `${shown} ${unit}`);
      expect(wrongUnit.verdict, `${shown} ${unit}`).toBe("wrong-unit");
      expect(wrongUnit.correct).toBe(false);
      expect(wrongUnit.message).toMatch(/number would be right/);
      // Well off in the right unit (a third more, or ten tolerances over): a wrong number, not a wrong unit.
      const off = kind.tolerance.type === "absolute" ? expected + 10 * kind.tolerance.amount : expected === 0 ? 1 : expected * 1.37;
      const wrongNumber = judgeDrill(d, formatAnswer(off, kind.asked.unit, 4));
      expect(wrongNumber.verdict).toBe("wrong-number");
      expect(wrongNumber.correct).toBe(false);
      expect(wrongNumber.expectedText).toBe(d.solution.expectedText);
    }
  });

  it("answers with the working, and says when the answer is unreadable", () => {
    const d = drills[0];
    const j = judgeDrill(d, "");
    expect(j.verdict).toBe("unreadable");
    expect(j.steps.length).toBeGreaterThan(0);
    expect(j.steps).toEqual(d.solution.steps);
  });
});
