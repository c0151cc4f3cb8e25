import { z } from "zod";
import { P0, T0 } from "./arc-clearance-physics";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The arc-clearance calculator's inputs: the peak voltage, an optional gap, the air, the electrode shape, the altitude. */

/** Smallest gap we compute at all. */
const MIN_GAP_M = 10e-6;

const P_MIN = 10e3;
const P_MAX = 1e6;
const T_MIN = 150;
const T_MAX = 1000;
const ALTITUDE_MIN = -500;
/** Table A.2 goes on to 20 000 m, but no workshop or set is above 10 km, and the shared length limits stop there. */
const ALTITUDE_MAX = 10_000;

export const ELECTRODES = ["non-uniform", "uniform"] as const;
export type Electrode = (typeof ELECTRODES)[number];
/** Words a person may use for the shape, read as the two cases of IEC 60664-1. */
const ELECTRODE_WORDS: Record<string, Electrode> = {
  uniform: "uniform",
  homogeneous: "uniform",
  flat: "uniform",
  rounded: "uniform",
  plate: "uniform",
  sphere: "uniform",
  "non-uniform": "non-uniform",
  nonuniform: "non-uniform",
  "non uniform": "non-uniform",
  inhomogeneous: "non-uniform",
  point: "non-uniform",
  edge: "non-uniform",
  lead: "non-uniform",
  wire: "non-uniform",
};

const electrodeInput = z.preprocess(
  (v) =>
    v === undefined || v === null || (typeof v === "string" && v.trim() === "")
      ? undefined
      : typeof v === "string"
        ? (ELECTRODE_WORDS[v.trim().toLowerCase()] ?? v)
        : v,
  z.enum(ELECTRODES, { error: 'Electrode must be "non-uniform" (points, edges, leads) or "uniform" (flat or rounded)' }).default("non-uniform"),
);

export const arcClearanceSchema = z
  .object({
    peakVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Peak voltage" }),
    gap: optionalQuantity("length", { positive: true, max: 10, label: "Gap" }).optional(),
    pressure: quantityWithDefault("pressure", P0, { positive: true, label: "Pressure" }).default(P0),
    temperature: quantityWithDefault("temperature", T0, { positive: true, label: "Temperature" }).default(T0),
    safetyFactor: quantityWithDefault("ratio", 2, { min: 1, max: 100, label: "Safety factor" }).default(2),
    electrode: electrodeInput,
    altitude: quantityWithDefault("length", 0, { min: ALTITUDE_MIN, max: ALTITUDE_MAX, label: "Altitude" }).default(0),
  })
  .superRefine((v, ctx) => {
    if (v.gap !== undefined && v.gap < MIN_GAP_M) {
      ctx.addIssue({
        code: "custom",
        path: ["gap"],
        message: "Gap must be at least 10 µm: below a few tens of µm in air the uniform-field (Paschen) formula does not apply",
      });
    }
    if (v.pressure < P_MIN || v.pressure > P_MAX) {
      ctx.addIssue({ code: "custom", path: ["pressure"], message: "Pressure must be between 10 kPa and 1 MPa (sea level is 101.325 kPa)" });
    }
    if (v.temperature < T_MIN || v.temperature > T_MAX) {
      ctx.addIssue({ code: "custom", path: ["temperature"], message: "Temperature must be between 150 K and 1000 K (20 °C is 293.15 K)" });
    }
  });

export type ArcClearanceInput = z.output<typeof arcClearanceSchema>;
