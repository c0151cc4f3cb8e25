import { describe, expect, it } from "vitest";
import { safeNextPath } from "@/lib/safe-next";

// OWASP ASVS 5.0 V3 (redirects only to allowed destinations); the URL Standard's parsing of "\" and
// tab/newline in special-scheme URLs is why a prefix check is not enough.
describe("safeNextPath", () => {
  it("keeps same-origin paths with their query and fragment", () => {
    expect(safeNextPath("/jobs/12/parts?x=1#p")).toBe("/jobs/12/parts?x=1#p");
    expect(safeNextPath("/bench/cathode-bias")).toBe("/bench/cathode-bias");
  });

  it.each([
    "/\\evil.example/bench",
    "/%5Cevil.example/bench".replace("%5C", "\\"),
    "/\\\\evil.example",
    "/\t/evil.example/bench",
    "/\n/evil.example",
    "//evil.example",
    "https://evil.example/",
    "javascript:alert(1)",
    "jobs",
    "",
  ])("refuses %j", (next) => {
    expect(safeNextPath(next)).toBe("/jobs");
  });

  it("refuses what a decoded query string would carry", () => {
    for (const raw of ["/%5Cevil.example/bench", "/%09/evil.example", "/%5C%5Cevil.example"]) {
      expect(safeNextPath(decodeURIComponent(raw))).toBe("/jobs");
    }
  });

  it("refuses arrays and missing values", () => {
    expect(safeNextPath(["/jobs/1", "/jobs/2"], "/bench")).toBe("/bench");
    expect(safeNextPath(undefined, "/bench")).toBe("/bench");
  });
});
