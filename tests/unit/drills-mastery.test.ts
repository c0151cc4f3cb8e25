import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeMastery, type Attempt } from "@/lib/drills";

/** The mastery rule of lib/drills/mastery.ts: its properties, and the spread over days it rewards. */

const DAY = 86_400_000;
const T0 = Date.UTC(2024, 2, 4, 9, 0, 0);
const on = (day: number, correct: boolean, hour = 0): Attempt => ({ at: T0 + day * DAY + hour * 3_600_000, correct });

const attempt = fc.record({
  at: fc.integer({ min: T0, max: T0 + 60 * DAY }),
  correct: fc.boolean(),
});
const attempts = fc.array(attempt, { maxLength: 60 });

describe("mastery", () => {
  it("is 0 with no attempts, and says so", () => {
    expect(computeMastery([])).toMatchObject({ attempts: 0, correct: 0, mastery: 0, levelId: "not-tried" });
  });

  it("counts attempts, correct answers and the days with a correct answer", () => {
    const m = computeMastery([on(0, true), on(0, false), on(1, true), on(1, true, 3)]);
    expect(m).toMatchObject({ attempts: 4, correct: 3, misses: 1, daysWithCorrect: 2 });
  });

  it("stays between 0 and 1", () => {
    fc.assert(
      fc.property(attempts, (list) => {
        const m = computeMastery(list).mastery;
        return m >= 0 && m < 1;
      }),
    );
  });

  it("never falls with a new correct answer, whenever it was given", () => {
    fc.assert(
      fc.property(attempts, fc.integer({ min: T0, max: T0 + 60 * DAY }), (list, at) => {
        return computeMastery([...list, { at, correct: true }]).mastery >= computeMastery(list).mastery;
      }),
    );
  });

  it("never rises with a miss", () => {
    fc.assert(
      fc.property(attempts, fc.integer({ min: T0, max: T0 + 60 * DAY }), (list, at) => {
        return computeMastery([...list, { at, correct: false }]).mastery <= computeMastery(list).mastery;
      }),
    );
  });

  it("rises strictly with a correct answer once it is above zero, and falls strictly with a miss", () => {
    const base = [on(0, true), on(1, true)];
    const m = computeMastery(base).mastery;
    expect(m).toBeGreaterThan(0);
    expect(computeMastery([...base, on(2, true)]).mastery).toBeGreaterThan(m);
    expect(computeMastery([...base, on(2, false)]).mastery).toBeLessThan(m);
  });

  it("counts correct answers spread over days more than the same number on one day", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 15 }), (n) => {
        const sameDay = Array.from({ length: n }, (_, i) => on(0, true, i % 12));
        const spread = Array.from({ length: n }, (_, i) => on(i, true));
        return computeMastery(spread).mastery > computeMastery(sameDay).mastery;
      }),
    );
  });

  it("does not depend on the order of attempts", () => {
    fc.assert(fc.property(attempts, (list) => Math.abs(computeMastery([...list].reverse()).mastery - computeMastery(list).mastery) < 1e-12));
  });

  it("climbs through the levels with a week of good days, and not in one sitting", () => {
    const oneSitting = computeMastery(Array.from({ length: 30 }, (_, i) => on(0, true, i % 10)));
    expect(oneSitting.mastery).toBeLessThan(0.45);
    const week = computeMastery(Array.from({ length: 14 }, (_, i) => on(Math.floor(i / 2), true, i % 2)));
    expect(week.mastery).toBeGreaterThan(0.7);
    expect(week.levelId).toBe("dependable");
    const twelveDays = computeMastery(Array.from({ length: 36 }, (_, i) => on(Math.floor(i / 3), true, i % 3)));
    expect(twelveDays.levelId).toBe("sure-handed");
    // A run of misses brings it back down.
    const slipping = computeMastery([
      ...Array.from({ length: 14 }, (_, i) => on(Math.floor(i / 2), true, i % 2)),
      ...Array.from({ length: 6 }, (_, i) => on(8, false, i)),
    ]);
    expect(slipping.mastery).toBeLessThan(week.mastery);
    expect(slipping.levelId).not.toBe("dependable");
  });

  it("counts days in the workshop's own time zone", () => {
    // 23:30 and 00:30 UTC are one evening in UTC−5 and two days in UTC.
    const late = Date.UTC(2024, 2, 4, 23, 30);
    const list = [
      { at: late, correct: true },
      { at: late + 3_600_000, correct: true },
    ];
    expect(computeMastery(list).daysWithCorrect).toBe(2);
    expect(computeMastery(list, { utcOffsetMinutes: -300 }).daysWithCorrect).toBe(1);
    expect(computeMastery(list.map((a) => ({ ...a, at: new Date(a.at).toISOString() }))).daysWithCorrect).toBe(2);
  });
});
