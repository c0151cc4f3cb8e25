import { describe, expect, test } from "vitest";
import { latexToText, pdfText } from "@/lib/jobs/latex-text";
import { capacitorCautions, capacitorChecks, ratingVolts, readingsAt } from "@/lib/jobs/part-cautions";
import { parsePartsCsv, partsToCsv } from "@/lib/jobs/parts-csv";
import { judgeReading } from "@/lib/jobs/reading-verdict";

describe("capacitor rating cautions", () => {
  test("reads voltage ratings as the bench writes them, through the unit parser, and nothing else", () => {
    // Working-voltage markings as the trade writes them (common practice): V, VDC, WV, WVDC, kV, a decimal comma.
    expect(ratingVolts("400 V")).toBe(400);
    expect(ratingVolts("630VDC")).toBe(630);
    expect(ratingVolts("250 V DC")).toBe(250);
    expect(ratingVolts("1.5 kV")).toBe(1500);
    expect(ratingVolts("3 kv")).toBe(3000);
    expect(ratingVolts("1,5 kV")).toBe(1500);
    expect(ratingVolts("1,000 V")).toBe(1000);
    expect(ratingVolts("450 WV")).toBe(450);
    expect(ratingVolts("500 WVDC")).toBe(500);
    expect(ratingVolts("400 V / 525 V surge")).toBe(400);
    expect(ratingVolts("350V 85°C")).toBe(350);
    expect(ratingVolts("250")).toBe(250);
    expect(ratingVolts("0.5 W")).toBeNull();
    expect(ratingVolts("47 µF")).toBeNull();
    expect(ratingVolts("")).toBeNull();
  });

  const part = (id: number, kind: "paper" | "electrolytic" | "resistor", originalRating: string | null, replacementRating: string | null) => ({
    id,
    designator: `X${id}`,
    kind,
    originalRating,
    replacementRating,
  });
  const volts = (designator: string, measured: number | null, partDesignators: string | null = null) => ({
    kind: "voltage",
    designator,
    partDesignators,
    measured,
  });

  test("flags a replacement below the original whatever was measured, for capacitors only", () => {
    const cautions = capacitorCautions(
      [part(1, "electrolytic", "450 V", "350 V"), part(2, "paper", "200 V", "250 V"), part(4, "resistor", "500 V", "100 V")],
      [],
    );
    expect(cautions.map((c) => c.partId)).toEqual([1]);
    expect(cautions[0].message).toMatch(/^X1: the replacement is rated 350 V, below the original 450 V/);
  });

  test("a reading elsewhere on the set flags nothing: the 6.6 kV anode against seven capacitors", () => {
    const seven = [1, 2, 3, 4, 5, 6, 7].map((i) => part(i, i % 2 ? "paper" : "electrolytic", "400 V", "630 V"));
    const { cautions, notes } = capacitorChecks(seven, [volts("CRT anode", 6600), volts("B+", 250)]);
    expect(cautions).toEqual([]);
    expect([...notes.values()]).toEqual(Array(7).fill("no reading at this capacitor"));
  });

  test("a capacitor is compared only with readings linked to it, by magnitude, case and spaces ignored", () => {
    const parts = [
      part(1, "paper", "400 V", "350 V"),
      part(2, "electrolytic", "450 WV", null),
      part(3, "paper", null, "160 V"),
      part(4, "paper", null, "630 V"),
    ];
    const readings = [volts("CRT anode", 6600), volts(" x1 ", 380), volts("TP3", 300, "X2, X4"), volts("Cathode", -180, "x3"), volts("X4", null)];
    const { cautions, notes } = capacitorChecks(parts, readings);
    expect(cautions.map((c) => c.partId)).toEqual([1, 3]);
    expect(cautions[0].message).toMatch(/^X1: .*measured 380 V at X1 is above its 350 V rating/);
    expect(cautions[1].message).toMatch(/measured 180 V at Cathode \(across X3\) is above its 160 V rating/);
    // Below the rating: stated as a comparison, never as "safe".
    expect(notes.get(2)).toBe("300 V measured at TP3 (across X2), not above the original part's 450 V rating");
    expect(notes.get(4)).toMatch(/^300 V measured at TP3 \(across X4\), not above its 630 V rating$/);
    expect([...notes.values()].join(" ")).not.toMatch(/safe/i);
    expect(readingsAt("X4", readings).map((r) => r.designator)).toEqual(["TP3"]);
  });

  test("a reading equal to the rating is not above it; one a volt over is", () => {
    expect(capacitorCautions([part(1, "paper", null, "350 V")], [volts("X1", 350)])).toEqual([]);
    expect(capacitorCautions([part(1, "paper", null, "350 V")], [volts("X1", 351)])).toHaveLength(1);
  });
});

describe("parts CSV", () => {
  test("round-trips, and neutralises cells a spreadsheet would run as formulas", () => {
    const parts = [
      {
        designator: "C1",
        kind: "paper",
        originalValue: "=HYPERLINK(1)",
        originalRating: "400 V",
        replacementValue: "0.047 µF",
        replacementRating: "630 V",
        state: "fitted",
      },
    ] as const;
    const csv = partsToCsv([...parts]);
    expect(csv).toContain("'=HYPERLINK(1)");
    const back = parsePartsCsv(csv);
    expect(back.ok && back.rows[0]).toEqual(parts[0]);
  });

  test("refuses unknown columns and a missing header", () => {
    expect(parsePartsCsv("designator,kind,price\nC1,paper,3")).toMatchObject({ ok: false, fields: { header: expect.stringMatching(/price/) } });
    expect(parsePartsCsv("ref,type\nC1,paper")).toMatchObject({ ok: false });
  });
});

describe("readings", () => {
  test("resistor verdicts come from resistor-drift; voltages compare magnitudes", () => {
    expect(judgeReading({ kind: "resistor", nominal: 100_000, measured: 121_000, tolerance: 0.2 }).verdict).toBe("high");
    expect(judgeReading({ kind: "resistor", nominal: 100_000, measured: 120_000, tolerance: 0.2 }).verdict).toBe("within");
    expect(judgeReading({ kind: "resistor", nominal: 100_000, measured: null, tolerance: 0.2 })).toEqual({ deviation: null, verdict: "open" });
    expect(judgeReading({ kind: "voltage", nominal: -2, measured: -2.6, tolerance: 0.2 }).verdict).toBe("high");
    expect(judgeReading({ kind: "voltage", nominal: 250, measured: 230, tolerance: 0.1 }).deviation).toBeCloseTo(-0.08, 12);
  });
});

describe("formulas as text for the bench sheet", () => {
  test("fractions, subscripts, functions and symbols read plainly", () => {
    expect(latexToText(String.raw`R_k = \frac{V_k}{I_k}`)).toBe("R_k = V_k / I_k");
    expect(latexToText(String.raw`t = \tau\,\ln\frac{V_0}{V_t}`)).toBe("t = τ ln(V_0 / V_t)");
    expect(latexToText(String.raw`P = I^2 R`)).toBe("P = I² R");
    // The bench sheet's fonts carry Ω, µ and the Greek letters: they print as themselves, never spelt out.
    expect(pdfText(latexToText(String.raw`X_C = \frac{1}{2\pi f C}`))).toBe("X_C = 1 / (2π f C)");
    expect(pdfText("470 kΩ")).toBe("470 kΩ");
    expect(pdfText("470 k\u2126, 47 μF")).toBe("470 kΩ, 47 µF");
    expect(pdfText(latexToText(String.raw`t = 5\tau`))).toBe("t = 5τ");
    expect(pdfText(latexToText(String.raw`V \le \sqrt{2} V_\text{rms}`))).toBe("V <= sqrt 2 V_rms");
  });
});
