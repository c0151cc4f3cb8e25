import { describe, expect, test } from "vitest";
import type { FaultCandidateStatus } from "@/lib/vocabulary";
import { faultState, nextCandidate } from "@/lib/jobs/fault-state";

/** A hunt for "no vertical deflection", candidates in the order they are tested (common practice). */
function hunt() {
  const candidates = ["Vertical oscillator", "Vertical output tube", "Vertical output transformer", "Yoke"].map((description, i) => ({
    position: i + 1,
    description,
    status: "open" as FaultCandidateStatus,
  }));
  return { resolution: null as string | null, candidates };
}

describe("fault state as candidates change", () => {
  test("open → found → fixed, and back to open when the cause is reopened", () => {
    const f = hunt();
    expect(faultState(f)).toBe("open");
    f.candidates[0].status = "ruled-out";
    expect(faultState(f)).toBe("open");
    expect(nextCandidate(f.candidates)!.description).toBe("Vertical output tube");
    f.candidates[1].status = "cause";
    expect(faultState(f)).toBe("found");
    f.resolution = "Fitted a new vertical output tube; height and linearity set.";
    expect(faultState(f)).toBe("fixed");
    f.candidates[1].status = "open";
    expect(faultState(f)).toBe("open");
    f.candidates[1].status = "ruled-out";
    f.candidates[2].status = "cause";
    expect(faultState(f)).toBe("fixed");
  });

  test("a blank resolution is no repair; no candidates at all is open", () => {
    expect(faultState({ resolution: "   ", candidates: [{ status: "cause" }] })).toBe("found");
    expect(faultState({ resolution: "Done", candidates: [] })).toBe("open");
    expect(nextCandidate([])).toBeUndefined();
  });
});
