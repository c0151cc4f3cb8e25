import * as notesModule from "./arc-clearance-notes";
import * as physics from "./arc-clearance-physics";
import { P0, T0 } from "./arc-clearance-physics";
import { arcClearanceSchema, ELECTRODES, type ArcClearanceInput } from "./arc-clearance-schema";
import { explainArcClearance } from "./arc-clearance-steps";
import { tex } from "./format";
import { ALWAYS_DANGER as ALWAYS_DANGER_NOTE } from "./safety";
import { standardFigures as standardFiguresOf } from "./tables/iec60664-clearance";
import { defineCalculator, type Warning } from "./types";

export { breakdownVolts, gapForVolts, relativeAirDensity, standardAtmospherePressure } from "./arc-clearance-physics";
export { arcClearanceSchema, ELECTRODES, type ArcClearanceInput, type Electrode } from "./arc-clearance-schema";

/**
 * Two figures, and the recommendation is the larger:
 * 1. Uniform-field breakdown of air, corrected for relative air density:
 *      δ = (p/101325)·(293.15/T),   V_b [kV] = 24.22·δd + 6.08·√(δd),  d in cm
 *    (Kuffel, Zaengl & Kuffel, High Voltage Engineering Fundamentals, 2nd ed., ch. 5, breakdown of
 *    uniform-field gaps in air; constants recalled from memory). The inverse is a quadratic in √(δd).
 *    The fit is for δ·d from about 0.01 cm (near the Paschen minimum) to about 10 cm (from memory):
 *    not sub-millimetre gaps in thin air, not gaps of metres.
 * 2. IEC 60664-1:2020 Table F.8 at the peak voltage, times Table A.2's altitude factor
 *    (tables/iec60664-clearance.ts). PRODUCT.md: a clearance figure is never below the table's
 *    non-uniform (case A) figure, so case A floors the recommendation whatever electrode is chosen.
 */

// Module-level copies of what compute reads: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call, and a handful of them cost more than the arithmetic.
const notes = { ...notesModule };
const ALWAYS_DANGER = ALWAYS_DANGER_NOTE;
const standardFigures = standardFiguresOf;
const { relativeAirDensity, gapForVolts, breakdownVolts, standardAtmospherePressure } = physics;

/** Below this δ·d (cm) the gap is down among the Paschen minimum, where the fit no longer applies. */
const FIT_MIN_REDUCED_GAP_CM = 0.01;
/** Above this δ·d (cm) the fit is past the gaps it was made for (from memory, Kuffel et al. ch. 5). */
const FIT_MAX_REDUCED_GAP_CM = 10;
/** Minimum sparking voltage of air (Paschen minimum), Kuffel, Zaengl & Kuffel table of gases — from memory. */
const PASCHEN_MIN_V = 327;

export const calculator = defineCalculator({
  slug: "arc-clearance",
  title: "Arc clearance in air",
  purpose: "The air gap a peak voltage needs: the uniform-field breakdown gap and IEC 60664-1's clearance, whichever is larger.",
  bench: {
    group: "first-power",
    example: { peakVoltage: "15 kV", gap: "5 mm" },
    headlines: ["recommendedClearance", "standardClearance"],
    alwaysDanger: true,
    chart: "breakdown",
    advanced: { title: "Air, altitude and safety factor", fields: ["pressure", "temperature", "altitude", "safetyFactor"] },
    // Only an arc at the typed voltage is shown in the hazard colour.
    tones: [{ output: "willArc", when: true, tone: "hazard" }],
  },
  inputs: [
    {
      name: "peakVoltage",
      label: "Peak voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The highest instantaneous voltage across the gap; for sine-wave AC that is 1.414 × the rms value.",
    },
    { name: "gap", label: "Gap", unit: "m", required: false, control: "quantity", quantity: "length", help: 'Optional: the air gap to check, e.g. "3 mm".' },
    {
      name: "pressure",
      label: "Air pressure",
      unit: "Pa",
      required: false,
      default: P0,
      control: "quantity",
      quantity: "pressure",
      help: "101.325 kPa at sea level; lower at altitude, where air breaks down more easily.",
    },
    {
      name: "temperature",
      label: "Air temperature",
      unit: "K",
      required: false,
      default: T0,
      control: "quantity",
      quantity: "temperature",
      help: 'In kelvin, or in degrees Celsius such as "20 °C".',
    },
    {
      name: "safetyFactor",
      label: "Safety factor",
      unit: "",
      required: false,
      default: 2,
      control: "quantity",
      quantity: "ratio",
      help: "Multiplies the uniform-field minimum gap; at least 1. The standard's clearance applies whatever it is.",
    },
    {
      name: "electrode",
      label: "Electrode shape",
      unit: "",
      required: false,
      default: "non-uniform",
      control: "select",
      options: ELECTRODES,
      help: "Non-uniform: a wire end, lead, solder joint, point or edge — nearly every gap in a set. Uniform: only large flat or well-rounded electrodes facing each other.",
    },
    {
      name: "altitude",
      label: "Altitude",
      unit: "m",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "length",
      help: "Height of the workshop or the set's home above sea level; above 2000 m the standard's clearance grows (IEC 60664-1 Table A.2). Enter the local air pressure too.",
    },
  ],
  outputs: [
    { name: "relativeAirDensity", label: "Relative air density δ", unit: "" },
    { name: "breakdownVoltage", label: "Uniform-field breakdown voltage of the gap", unit: "V" },
    { name: "willArc", label: "At or above the uniform-field breakdown voltage", unit: "" },
    { name: "minimumGap", label: "Minimum gap (uniform field)", unit: "m" },
    { name: "recommendedClearance", label: "Recommended clearance", unit: "m" },
    { name: "standardClearance", label: "IEC 60664-1 clearance (altitude-corrected)", unit: "m" },
    { name: "standardTable", label: "Standard's figure taken from", unit: "" },
  ],
  schema: arcClearanceSchema,
  formulas: [
    { label: "Relative air density", latex: tex`\delta = \frac{p}{101.325\,\mathrm{kPa}} \cdot \frac{293.15\,\mathrm{K}}{T}` },
    { label: "Uniform-field breakdown (d in cm; for δd from about 0.01 to 10 cm)", latex: tex`V_b = 24.22\,\delta d + 6.08\sqrt{\delta d}\;\mathrm{kV}` },
    {
      label: "Minimum gap",
      latex: tex`\sqrt{\delta d} = \frac{-6.08 + \sqrt{6.08^2 + 4 \cdot 24.22\,V}}{2 \cdot 24.22}, \quad d = \frac{(\sqrt{\delta d})^2}{\delta}`,
    },
    { label: "Standard's clearance", latex: tex`d_{std} = d_{\text{Table F.8}}(V) \times k_{alt}` },
    { label: "Recommended clearance", latex: tex`d_{rec} = \max\left(k\,d_{min},\; d_{std},\; d_{\text{case A}}\,k_{alt}\right)` },
  ],
  references: [
    {
      title: "Kuffel, Zaengl & Kuffel, High Voltage Engineering Fundamentals, 2nd ed.",
      detail:
        "Ch. 5, electrical breakdown in gases: Paschen's law, breakdown of uniform-field gaps in air, V_b = 24.22·δd + 6.08·√(δd) kV with d in cm, relative air density δ (constants, chapter and the fit's range recalled from memory)",
    },
    {
      title: "IEC 60664-1:2020, Insulation coordination for equipment within low-voltage supply systems — Part 1",
      detail:
        "Table F.8, clearances to withstand steady-state voltages, temporary overvoltages or recurring peak voltages (case A inhomogeneous, case B homogeneous field; Table F.7 in the 2007 edition); Table A.2, altitude correction factors; Table F.2, minimum clearance for pollution degree 2. Creepage (Table F.5) is not covered",
    },
  ],
  whyItMatters:
    "A television's picture-tube supply runs at many kilovolts, and even a radio's B+ can jump a surprisingly " +
    "small gap when the air is thin or the surface is dirty. Clean air between flat electrodes gives the best case; a real " +
    "lead, a solder spike or a corona ring concentrates the field and breaks down far sooner. So the recommendation never " +
    "goes below the clearance the safety standard tables for that voltage with a non-uniform field, corrected for altitude.",
  compute(input: ArcClearanceInput) {
    const { peakVoltage: v, gap, pressure: p, temperature: t, safetyFactor: k, electrode, altitude } = input;
    const delta = relativeAirDensity(p, t);
    const minimumGap = gapForVolts(v, delta);
    const s = standardFigures(v, electrode, altitude);
    const byFactor = minimumGap * k;
    const recommendedClearance = byFactor > s.floor ? byFactor : s.floor;
    const breakdownVoltage = gap === undefined ? null : breakdownVolts(gap, delta);
    const willArc = breakdownVoltage === null ? null : v >= breakdownVoltage;

    const warnings: Warning[] = [ALWAYS_DANGER, notes.LIMITS, notes.TABLE_ASSUMPTIONS];
    if (s.caseARow < 0) warnings.push(notes.OUT_OF_TABLE);
    if (s.field === "B") warnings.push(notes.UNIFORM_CHOSEN);
    if (willArc) warnings.push(notes.ARCS);
    if (gap !== undefined) {
      if (gap < s.floor) warnings.push(notes.GAP_BELOW_STANDARD);
      else if (gap < recommendedClearance) warnings.push(notes.GAP_BELOW_FACTOR);
      else warnings.push(notes.GAP_AT_LEAST_RECOMMENDED);
    }
    const smallest = delta * (gap === undefined || minimumGap < gap ? minimumGap : gap) * 100;
    const largest = delta * (gap === undefined || minimumGap > gap ? minimumGap : gap) * 100;
    if (smallest < FIT_MIN_REDUCED_GAP_CM) warnings.push(notes.NEAR_PASCHEN_MINIMUM);
    if (largest > FIT_MAX_REDUCED_GAP_CM) warnings.push(notes.BEYOND_FIT);
    if (v < PASCHEN_MIN_V) warnings.push(notes.belowPaschenMinimum(PASCHEN_MIN_V));
    if (altitude > 0 && p > 1.05 * standardAtmospherePressure(altitude))
      warnings.push(notes.pressureAboveAltitude(p, altitude, standardAtmospherePressure(altitude)));

    return {
      outputs: {
        relativeAirDensity: delta,
        breakdownVoltage,
        willArc,
        minimumGap,
        recommendedClearance,
        standardClearance: s.standardClearance,
        standardTable: s.name,
      },
      warnings,
    };
  },
  explain: explainArcClearance,
});
