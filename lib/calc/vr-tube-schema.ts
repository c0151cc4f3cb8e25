import { z } from "zod";
import { formatQuantity } from "./format";
import { findVrTube, VR_TUBES, VR_TYPES, type VrTube } from "./tables/vr-tubes";
import { quantity, optionalQuantity, quantityWithDefault } from "./units";
import { tubeNotes, type TubeFigures } from "./vr-tube-warnings";

/** The VR-tube calculator's inputs: the supply, a table tube or its figures, the load's range, a fitted resistor. */

const TUBES = new Map<string, VrTube>(VR_TUBES.map((t) => [t.type, t]));
/** Each table tube's figures with its fixed wording, made once (compute runs on every keystroke). */
const FIGURES = new Map<string, TubeFigures>(
  VR_TUBES.map((t) => [
    t.type,
    {
      name: t.type,
      vvr: t.regulatedVoltage,
      iMin: t.minCurrent,
      iMax: t.maxCurrent,
      vStrike: t.strikingVoltage,
      notes: tubeNotes(t.type, t.minCurrent, t.maxCurrent, t.strikingVoltage),
    },
  ]),
);

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const row = typeof raw === "string" ? findVrTube(raw) : undefined;
    if (!row) {
      ctx.addIssue({ code: "custom", message: `Tube must be one of ${VR_TYPES.join(", ")}, or leave it empty and give its regulated voltage and currents` });
      return z.NEVER;
    }
    return row.type;
  })
  .optional();

const CUSTOM = ["regulatedVoltage", "minCurrent", "maxCurrent"] as const;
const LABEL: Record<(typeof CUSTOM)[number] | "strikingVoltage", string> = {
  regulatedVoltage: "Regulated voltage",
  minCurrent: "Minimum tube current",
  maxCurrent: "Maximum tube current",
  strikingVoltage: "Striking voltage",
};

export const vrTubeSchema = z
  .object({
    supplyVoltage: quantity("voltage", { positive: true, min: 1, max: 2000, label: "Supply voltage" }),
    tube: tubeField,
    regulatedVoltage: optionalQuantity("voltage", { positive: true, min: 1, max: 1000, label: "Regulated voltage" }),
    minCurrent: optionalQuantity("current", { positive: true, min: 1e-6, max: 1, label: "Minimum tube current" }),
    maxCurrent: optionalQuantity("current", { positive: true, min: 1e-6, max: 1, label: "Maximum tube current" }),
    strikingVoltage: optionalQuantity("voltage", { positive: true, min: 1, max: 2000, label: "Striking voltage" }),
    loadCurrentMin: quantityWithDefault("current", 0, { nonNegative: true, max: 10, label: "Least load current" }),
    loadCurrentMax: quantity("current", { nonNegative: true, max: 10, label: "Greatest load current" }),
    fittedResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e9, label: "Fitted resistor" }),
  })
  .superRefine((v, ctx) => {
    if (v.tube !== undefined) {
      for (const name of [...CUSTOM, "strikingVoltage"] as const) {
        if (v[name] !== undefined)
          ctx.addIssue({ code: "custom", path: [name], message: `${LABEL[name]}: give either a tube from the list or its figures, not both` });
      }
    } else {
      for (const name of CUSTOM) {
        if (v[name] === undefined) ctx.addIssue({ code: "custom", path: [name], message: `${LABEL[name]} is required when no tube is chosen` });
      }
      if (v.minCurrent !== undefined && v.maxCurrent !== undefined && v.maxCurrent <= v.minCurrent) {
        ctx.addIssue({ code: "custom", path: ["maxCurrent"], message: "Maximum tube current must be above the minimum tube current" });
      }
      if (v.strikingVoltage !== undefined && v.regulatedVoltage !== undefined && v.strikingVoltage < v.regulatedVoltage) {
        ctx.addIssue({ code: "custom", path: ["strikingVoltage"], message: "Striking voltage cannot be below the regulated voltage" });
      }
    }
    if (v.loadCurrentMin > v.loadCurrentMax) {
      ctx.addIssue({ code: "custom", path: ["loadCurrentMin"], message: "Least load current cannot be above the greatest load current" });
    }
    const vvr = v.tube !== undefined ? TUBES.get(v.tube)!.regulatedVoltage : v.regulatedVoltage;
    if (vvr !== undefined && v.supplyVoltage <= vvr) {
      ctx.addIssue({ code: "custom", path: ["supplyVoltage"], message: `Supply voltage must be above the tube's regulated ${formatQuantity(vvr, "V")}` });
    }
  });

export type VrTubeInput = z.output<typeof vrTubeSchema>;

/** The tube's figures: from the table, or as typed (the schema has made sure they are all there). */
export function tubeFigures(input: VrTubeInput): TubeFigures {
  if (input.tube !== undefined) return FIGURES.get(input.tube)!;
  return { name: "tube", vvr: input.regulatedVoltage!, iMin: input.minCurrent!, iMax: input.maxCurrent!, vStrike: input.strikingVoltage, notes: null };
}
