import { tex, texQuantity } from "./format";
import type { ArcClearanceInput } from "./arc-clearance-schema";
import {
  altitudeFactor,
  standardFigures,
  tableClearance,
  TABLE_MAX_VOLTS,
  TABLE_TOP_METRES,
  type FieldCase,
  type TableClearance,
} from "./tables/iec60664-clearance";
import type { Step } from "./types";

/**
 * The arc-clearance working, in the order an apprentice follows it: the uniform-field breakdown,
 * the standard's figure with its altitude factor, and which of the two sets the recommendation.
 */

export interface ArcClearanceOutputs {
  [name: string]: number | boolean | string | null;
  relativeAirDensity: number;
  breakdownVoltage: number | null;
  willArc: boolean | null;
  minimumGap: number;
  recommendedClearance: number;
  standardClearance: number | null;
  standardTable: string;
}

export function explainArcClearance(input: ArcClearanceInput, o: ArcClearanceOutputs): Step[] {
  const { peakVoltage: v, gap, pressure: p, temperature: t, safetyFactor: k, electrode, altitude } = input;
  const { relativeAirDensity: delta, breakdownVoltage, willArc, minimumGap, recommendedClearance } = o;
  const s = standardFigures(v, electrode, altitude);
  const chosen = tableClearance(v, s.field);
  const caseA = tableClearance(v, "A");
  const mm = (m: number) => texQuantity(m, "m");
  const sqrtDd = Math.sqrt(delta * minimumGap * 100);
  const steps: Step[] = [
    {
      label: "Relative air density",
      latex: tex`\delta = \frac{${texQuantity(p / 1000, "kPa", 6)}}{101.325\,\mathrm{kPa}} \cdot \frac{293.15\,\mathrm{K}}{${texQuantity(t, "K", 5)}} = ${delta.toPrecision(4)}`,
    },
  ];
  if (gap !== undefined && breakdownVoltage !== null) {
    const dcm = gap * 100;
    steps.push(
      {
        label: "Uniform-field breakdown voltage of the gap (clean, flat electrodes)",
        latex: tex`V_b = 24.22 \times ${delta.toPrecision(4)} \times ${dcm.toPrecision(4)} + 6.08\sqrt{${delta.toPrecision(4)} \times ${dcm.toPrecision(4)}} = ${texQuantity(breakdownVoltage, "V")}`,
      },
      {
        label: willArc
          ? "The peak voltage is at or above the uniform-field breakdown voltage for this gap"
          : "The peak voltage is below the uniform-field breakdown voltage for this gap (points and edges break down lower)",
        latex: tex`${texQuantity(v, "V")} ${willArc ? "\\ge" : "<"} ${texQuantity(breakdownVoltage, "V")}`,
      },
    );
  }
  const byFactor = k * minimumGap;
  steps.push(
    {
      label: "Minimum gap for the peak voltage, uniform field",
      latex: tex`\sqrt{\delta d} = \frac{-6.08 + \sqrt{6.08^2 + 4 \times 24.22 \times ${(v / 1000).toPrecision(4)}}}{2 \times 24.22} = ${sqrtDd.toPrecision(4)}, \quad d = \frac{${sqrtDd.toPrecision(4)}^2}{${delta.toPrecision(4)}}\,\mathrm{cm} = ${mm(minimumGap)}`,
    },
    { label: "Safety factor times the uniform-field gap", latex: tex`k\,d_{min} = ${k} \times ${mm(minimumGap)} = ${mm(byFactor)}` },
    tableStep(v, chosen, s.field),
  );
  const f = s.factor;
  const altitudeLabel = `Altitude factor, IEC 60664-1 Table A.2: the clearance table is for up to 2000 m, and ${Math.round(altitude)} m falls in the row up to ${altitudeFactor(altitude).rowMetres} m`;
  if (s.standardClearance !== null && chosen.metres !== null) {
    steps.push({ label: altitudeLabel, latex: tex`d_{std} = ${mm(chosen.metres)} \times ${f} = ${mm(s.standardClearance)}` });
  } else {
    steps.push({ label: altitudeLabel, latex: tex`k_{alt} = ${f}` });
  }
  if (s.field === "B" || s.standardClearance === null) {
    const a = caseA.metres ?? TABLE_TOP_METRES.A;
    steps.push({
      label:
        caseA.metres === null
          ? "Lower bound: Table F.8's top figure for a non-uniform field (100 mm at 50 kV); a higher voltage needs more, the table does not say how much"
          : "Floor: the non-uniform (case A) figure, since a lead or solder joint makes any real gap non-uniform",
      latex: tex`d_{A}\,k_{alt} = ${mm(a)} \times ${f} = ${mm(a * f)}`,
    });
  }
  const std = s.floor;
  const stdWhat =
    caseA.metres === null ? "the table's top figure (a lower bound)" : s.field === "B" ? "the standard's non-uniform (case A) figure" : "the standard's figure";
  steps.push({
    label:
      byFactor > std
        ? "Recommended clearance: the safety factor times the uniform-field gap is the larger, so it sets the recommendation"
        : `Recommended clearance: ${stdWhat} is the larger, so it sets the recommendation`,
    latex: tex`d_{rec} = \max\left(${mm(byFactor)},\; ${mm(std)}\right) = ${mm(recommendedClearance)}`,
  });
  return steps;
}

/** The Table F.8 step: the row read, the pollution floor when it governs, or the table's end. */
function tableStep(v: number, t: TableClearance, field: FieldCase): Step {
  const kase = field === "A" ? "case A, non-uniform field" : "case B, uniform field";
  if (t.metres === null || t.raw === null) {
    return {
      label: `IEC 60664-1 Table F.8 (${kase}) stops at ${TABLE_MAX_VOLTS[field] / 1000} kV: no figure, and none is made up`,
      latex: tex`${texQuantity(v, "V")} > ${texQuantity(TABLE_MAX_VOLTS[field], "V")}`,
    };
  }
  const row = `IEC 60664-1 Table F.8 (${kase}), the row up to ${t.rowVolts / 1000} kV`;
  if (t.pollutionFloor) {
    return {
      label: `${row}, raised to 0.2 mm, the pollution degree 2 minimum of Table F.2`,
      latex: tex`d_{\text{F.8}} = \max\left(${texQuantity(t.raw, "m")},\; 0.2\,\mathrm{mm}\right) = ${texQuantity(t.metres, "m")}`,
    };
  }
  return { label: row, latex: tex`d_{\text{F.8}} = ${texQuantity(t.metres, "m")}` };
}
