import { describe, expect, test } from "vitest";
import { latexToText, pdfText } from "@/lib/jobs/latex-text";
import { capacitorCautions, highestMeasuredVoltage, ratingVolts } from "@/lib/jobs/part-cautions";
import { parsePartsCsv, partsToCsv } from "@/lib/jobs/parts-csv";
import { judgeReading } from "@/lib/jobs/reading-verdict";

describe("capacitor rating cautions", () => {
  test("reads voltage ratings as the bench writes them, and nothing else", () => {
    expect(ratingVolts("400 V")).toBe(400);
    expect(ratingVolts("630VDC")).toBe(630);
    expect(ratingVolts("1.5 kV")).toBe(1500);
    expect(ratingVolts("450 WV")).toBe(450);
    expect(ratingVolts("250")).toBe(250);
    expect(ratingVolts("0.5 W")).toBeNull();
    expect(ratingVolts("")).toBeNull();
  });

  const part = (id: number, kind: "paper" | "electrolytic" | "resistor", originalRating: string | null, replacementRating: string | null) => ({ id, designator: `X${id}`, kind, originalRating, replacementRating });
  test("flags a replacement below the original or below the measured supply, for capacitors only", () => {
    const cautions = capacitorCautions(
      [part(1, "electrolytic", "450 V", "350 V"), part(2, "paper", "200 V", "250 V"), part(3, "paper", null, "630 V"), part(4, "resistor", "500 V", "100 V"), part(5, "paper", "400 V", null)],
      300,
    );
    expect(cautions.map((c) => c.partId)).toEqual([1, 2]);
    expect(cautions[0].message).toMatch(/below the original 450 V/);
    expect(cautions[1].message).toMatch(/below the 300 V measured/);
    expect(capacitorCautions([part(2, "paper", "200 V", "250 V")], null)).toEqual([]);
  });

  test("the measured supply is the largest voltage reading, by magnitude", () => {
    expect(highestMeasuredVoltage([{ kind: "voltage", measured: 120 }, { kind: "voltage", measured: -180 }, { kind: "resistor", measured: 470_000 }, { kind: "voltage", measured: null }])).toBe(180);
    expect(highestMeasuredVoltage([])).toBeNull();
  });
});

describe("parts CSV", () => {
  test("round-trips, and neutralises cells a spreadsheet would run as formulas", () => {
    const parts = [{ designator: "C1", kind: "paper", originalValue: "=HYPERLINK(1)", originalRating: "400 V", replacementValue: "0.047 µF", replacementRating: "630 V", state: "fitted" }] as const;
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
    expect(pdfText(latexToText(String.raw`X_C = \frac{1}{2\pi f C}`))).toBe("X_C = 1 / (2 pi f C)");
    expect(pdfText("470 kΩ")).toBe("470 kohm");
  });
});
