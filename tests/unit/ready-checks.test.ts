import { describe, expect, test } from "vitest";
import { readyChecks, ReadyChecksError } from "@/lib/jobs/ready-checks";
import { ConflictError } from "@/lib/errors";

const done = {
  parts: [{ designator: "C1", state: "fitted" as const }],
  faults: [{ symptom: "No vertical deflection", state: "fixed" as const }],
  powerUps: [{ outcome: "stopped" as const }, { outcome: "passed" as const }],
};

describe("checks before ready", () => {
  test("a finished record has nothing to say", () => {
    expect(readyChecks(done)).toEqual([]);
  });

  test("unfitted parts, unfixed faults (open or found) and no passed power-up are each named", () => {
    const issues = readyChecks({
      parts: [...done.parts, { designator: "C7", state: "ordered" }, { designator: "R4", state: "to-order" }],
      faults: [...done.faults, { symptom: "Hum bars", state: "found" }, { symptom: "Weak sound", state: "open" }],
      powerUps: [{ outcome: "stopped" }, { outcome: null }],
    });
    expect(issues.map((i) => i.id)).toEqual(["parts-not-fitted", "open-faults", "no-passed-power-up"]);
    expect(issues[0].message).toBe("2 parts on the list are not fitted yet: C7, R4.");
    expect(issues[1].message).toContain("“Hum bars”, “Weak sound”");
    expect(issues[2].message).toBe("No power-up session has been marked passed.");
  });

  test("a long list is cut short with a count; no sessions at all says so", () => {
    const parts = Array.from({ length: 10 }, (_, i) => ({ designator: `C${i + 1}`, state: "to-order" as const }));
    const [p, s] = readyChecks({ parts, faults: [], powerUps: [] });
    expect(p.message).toBe("10 parts on the list are not fitted yet: C1, C2, C3, C4, C5, C6 and 4 more.");
    expect(s.message).toBe("No power-up session has been recorded.");
  });

  test("the refusal is a conflict carrying the list", () => {
    const err = new ReadyChecksError(readyChecks({ parts: [], faults: [], powerUps: [] }));
    expect(err).toBeInstanceOf(ConflictError);
    expect(err.details.checks.map((c) => c.id)).toEqual(["no-passed-power-up"]);
    expect(err.message).toContain("No power-up session has been recorded.");
  });
});
