import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { HEATERS } from "@/lib/calc/tables/heaters";
import { TUBES, findTube } from "@/lib/calc/tables/tubes";
import { heaterOf, looksLikeSeriesString, tubeDifferences } from "@/lib/jobs/tube-differences";

const row = (diffs: ReturnType<typeof tubeDifferences>, what: string) => diffs.find((d) => d.what === what);

describe("tube differences: heaters", () => {
  // RCA receiving tube manual RC-30, 6SN7GT and 12SN7GT data (from memory): the same twin triode on a
  // 6.3 V 0.6 A heater and on a 12.6 V 0.3 A heater.
  test("6SN7GT → 12SN7GT in a series string: the heater current differs (0.6 A vs 0.3 A), which is danger", () => {
    const d = tubeDifferences("6SN7GT", "12SN7GT", { seriesString: true });
    expect(d.slice(0, 2).map((x) => x.what)).toEqual(["Heater voltage", "Heater current"]);
    expect(row(d, "Heater voltage")).toMatchObject({ original: "6.3 V", substitute: "12.6 V", level: "caution" });
    expect(row(d, "Heater current")).toMatchObject({ original: "0.6 A", substitute: "0.3 A", level: "danger" });
    expect(row(d, "Heater current")!.note).toMatch(/heater-string calculator/);
  });

  test("the same pair on a parallel 6.3 V winding: the 12.6 V heater runs cold (caution), draws less (info), never danger", () => {
    const d = tubeDifferences("6SN7GT", "12SN7GT", { seriesString: false });
    expect(row(d, "Heater voltage")).toMatchObject({ level: "caution" });
    expect(row(d, "Heater voltage")!.note).toMatch(/below its rating/);
    expect(row(d, "Heater current")).toMatchObject({ level: "info" });
    expect(d.some((x) => x.level === "danger")).toBe(false);
    // Same sections: no plate rating differs (RC-30, from memory: both 2.5 W per section in our table).
    expect(row(d, "Max plate dissipation (each section)")).toBeUndefined();
  });

  test("a hungrier heater on a parallel winding is a caution with the extra current named", () => {
    // RCA data (from memory): 6V6GT 0.45 A, 6L6 0.9 A heaters.
    const d = tubeDifferences("6V6GT", "6L6GC", { seriesString: false });
    expect(row(d, "Heater current")).toMatchObject({ original: "0.45 A", substitute: "0.9 A", level: "caution" });
    expect(row(d, "Heater current")!.note).toContain("0.45 A more");
    expect(row(d, "Max plate dissipation")).toMatchObject({ original: "12 W", substitute: "30 W", level: "info" });
  });

  test("50C5 → 50L6GT: the same 50 V 0.15 A heater (info) but another base (caution)", () => {
    // RCA data (from memory): both 50 V, 0.15 A; 7-pin miniature against octal.
    const d = tubeDifferences("50C5", "50L6GT", { seriesString: true });
    expect(row(d, "Heater voltage")!.level).toBe("info");
    expect(row(d, "Heater current")!.level).toBe("info");
    expect(row(d, "Base")).toMatchObject({ original: "7-pin miniature", substitute: "octal", level: "caution" });
  });

  test("a substitute rated lower is a caution naming its rating", () => {
    // RCA data (from memory): 6SN7GTB 5 W per section, 6SN7GT 2.5 W.
    const d = tubeDifferences("6SN7GTB", "6SN7GT", { seriesString: false });
    expect(row(d, "Max plate dissipation (each section)")).toMatchObject({ original: "5 W", substitute: "2.5 W", level: "caution" });
  });

  test("a type outside both tables gives one heater row asking for the data sheet", () => {
    const d = tubeDifferences("6SN7GT", "XYZ99", { seriesString: true });
    expect(d).toEqual([expect.objectContaining({ what: "Heater", original: "6.3 V, 0.6 A", substitute: "not in the built-in table", level: "caution" })]);
  });

  test("property: with both heaters known, a different current is danger exactly in a series string", () => {
    const known = [...new Set([...TUBES.map((t) => t.type), ...HEATERS.map((h) => h.names[0])])].filter((n) => heaterOf(n));
    fc.assert(
      fc.property(fc.constantFrom(...known), fc.constantFrom(...known), fc.boolean(), (a, b, series) => {
        const d = tubeDifferences(a, b, { seriesString: series });
        const current = row(d, "Heater current")!;
        const differs = heaterOf(a)!.current !== heaterOf(b)!.current;
        expect(current.level === "danger").toBe(differs && series);
        expect(d.filter((x) => x.level === "danger").length).toBe(differs && series ? 1 : 0);
      }),
    );
  });
});

describe("tube differences: picture tubes", () => {
  test("17BP4A → 17HP4: same heater, anode range and angle (info); focus differs (caution)", () => {
    // RCA picture tube data (from memory): both 70°, 12–16 kV; 17BP4A magnetic focus, 17HP4 electrostatic.
    const d = tubeDifferences("17BP4A", "17HP4", { seriesString: false });
    expect(row(d, "Anode voltage range")).toMatchObject({ original: "12–16 kV", substitute: "12–16 kV", level: "info" });
    expect(row(d, "Deflection angle")).toMatchObject({ original: "70°", substitute: "70°", level: "info" });
    expect(row(d, "Focus")).toMatchObject({ original: "magnetic", substitute: "electrostatic", level: "caution" });
  });

  test("10BP4 → 12LP4: another deflection angle and anode range are cautions", () => {
    // RCA picture tube data (from memory): 10BP4 50°, 8–12 kV; 12LP4 54°, 9–12 kV.
    const d = tubeDifferences("10BP4", "12LP4", { seriesString: false });
    expect(row(d, "Deflection angle")).toMatchObject({ original: "50°", substitute: "54°", level: "caution" });
    expect(row(d, "Anode voltage range")!.level).toBe("caution");
  });

  test("a receiving tube offered for a picture tube is flagged as another kind", () => {
    const d = tubeDifferences("17BP4A", "6SN7GT", { seriesString: false });
    expect(row(d, "Kind")).toMatchObject({ original: "picture tube", substitute: "twin triode", level: "caution" });
  });
});

describe("series string from a line-up", () => {
  test("an AC/DC five (12BE6 12BA6 12AV6 50C5 35W4) is a series string; its 6.3 V cousin is not", () => {
    // Heater data of the RCA manual (from memory): 12.6, 35 and 50 V types at 0.15 A are series-string types.
    expect(looksLikeSeriesString(["12BE6", "12BA6", "12AV6", "50C5", "35W4"])).toBe(true);
    expect(looksLikeSeriesString(["6BE6", "6BA6", "6AV6", "6AQ5", "6X4"])).toBe(false);
  });

  test("centre-tapped 12.6 V twin triodes do not make a string; a 600 mA television damper does", () => {
    expect(looksLikeSeriesString(["12AX7", "12AU7", "EL84", "5U4GB"])).toBe(false);
    expect(looksLikeSeriesString(["6SN7GTB", "12AX4GTB", "6CB6A"])).toBe(true);
    expect(looksLikeSeriesString([])).toBe(false);
    expect(findTube("12SN7")!.type).toBe("12SN7GT");
  });
});
