import { z } from "zod";
import { TRIODE_NAMES, findTriode } from "./tables/triodes";
import type { TriodeParams } from "./triode-model";
import type { InputMeta } from "./types";
import { optionalQuantity, quantity } from "./units";

/** The triode stage's inputs: a tube from the table or Koren's five parameters, the stage's parts; its outputs' shape. */

export const MODEL_KEYS = ["mu", "ex", "kg1", "kp", "kvb"] as const;
export type ModelKey = (typeof MODEL_KEYS)[number];
/** Plain-text names of Koren's parameters for messages (no K_G1 in running text); the form typesets the symbols. */
export const MODEL_NAMES: Record<ModelKey, string> = {
  mu: "Amplification factor µ",
  ex: "Exponent x",
  kg1: "Grid constant",
  kp: "Plate constant",
  kvb: "Knee constant",
};

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const found = typeof raw === "string" ? findTriode(raw) : undefined;
    if (!found) {
      ctx.addIssue({ code: "custom", message: `Tube type is not in the built-in table; choose one of ${TRIODE_NAMES.join(", ")}` });
      return z.NEVER;
    }
    return found.name;
  })
  .optional();

const bypassField = z
  .unknown()
  .transform((raw, ctx): boolean => {
    if (raw === undefined || raw === null || raw === "") return true;
    if (raw === true || raw === "true" || raw === "on") return true;
    if (raw === false || raw === "false" || raw === "off") return false;
    ctx.addIssue({ code: "custom", message: "Cathode bypassed must be true or false" });
    return z.NEVER;
  })
  .optional();

// Ranges are wide enough for any receiving triode and keep every figure finite.
const param = (label: string, min: number, max: number) => optionalQuantity("ratio", { positive: true, min, max, label }).optional();

export const triodeStageSchema = z
  .object({
    tube: tubeField,
    mu: param(MODEL_NAMES.mu, 0.5, 1000),
    ex: param(MODEL_NAMES.ex, 1, 3),
    kg1: param(MODEL_NAMES.kg1, 1, 1e6),
    kp: param(MODEL_NAMES.kp, 1, 1e5),
    kvb: param(MODEL_NAMES.kvb, 1, 1e7),
    supplyVoltage: quantity("voltage", { positive: true, max: 10_000, label: "Supply voltage" }),
    plateResistor: quantity("resistance", { positive: true, min: 1, max: 1e9, label: "Plate resistor" }),
    cathodeResistor: quantity("resistance", { nonNegative: true, max: 1e8, label: "Cathode resistor" }),
    cathodeBypassed: bypassField,
    loadResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e12, label: "Load resistance" }).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.tube !== undefined) return;
    const missing = MODEL_KEYS.filter((k) => v[k] === undefined);
    if (missing.length === MODEL_KEYS.length) {
      ctx.addIssue({
        code: "custom",
        path: ["tube"],
        message: "Choose a tube type, or enter all five parameters of Koren's triode model (µ, x and the grid, plate and knee constants)",
      });
      return;
    }
    for (const k of missing) {
      ctx.addIssue({ code: "custom", path: [k], message: `${MODEL_NAMES[k]} is required when no tube type is chosen` });
    }
  });

export type TriodeStageInput = z.output<typeof triodeStageSchema>;

/** Null only when the operating point cannot be found (no bracket or no convergence). */
type N = number | null;
export interface TriodeStageOutputs {
  [key: string]: N;
  /** Plate to cathode (what the tube sees), V. */
  plateVoltage: N;
  plateCurrent: N;
  cathodeVoltage: N;
  plateDissipation: N;
  amplificationFactor: N;
  plateResistance: N;
  transconductance: N;
  gain: N;
  /** Plate to chassis (what a meter from chassis reads): plate-to-cathode plus the cathode voltage, V. */
  plateToChassisVoltage: N;
}

export const KOREN_CITE = "Koren's improved triode model (Glass Audio, 1996; revised 2003)";

/**
 * The five parameters of Koren's improved triode model, named and written as his article sets them;
 * SPICE listings spell them MU, EX, KG1, KP, KVB, and the API keeps mu, ex, kg1, kp, kvb.
 */
export const MODEL_INPUTS: readonly InputMeta[] = [
  {
    name: "mu",
    label: "Amplification factor",
    symbol: "\\mu",
    unit: "",
    required: false,
    control: "quantity",
    quantity: "ratio",
    help: `As ${KOREN_CITE} uses it. With a tube chosen, any parameter you enter replaces the table's.`,
  },
  {
    name: "ex",
    label: "Exponent",
    symbol: "x",
    unit: "",
    required: false,
    control: "quantity",
    quantity: "ratio",
    help: "The power the plate current follows (EX in SPICE listings): between 1 and 3, usually 1.2–1.4.",
  },
  {
    name: "kg1",
    label: "Grid constant",
    symbol: "K_{G1}",
    unit: "",
    required: false,
    control: "quantity",
    quantity: "ratio",
    help: "Divides the current: a larger value, less current (KG1 in SPICE listings).",
  },
  {
    name: "kp",
    label: "Plate constant",
    symbol: "K_P",
    unit: "",
    required: false,
    control: "quantity",
    quantity: "ratio",
    help: "Sets how the curves bend near cut-off (KP in SPICE listings).",
  },
  {
    name: "kvb",
    label: "Knee constant",
    symbol: "K_{VB}",
    unit: "",
    required: false,
    control: "quantity",
    quantity: "ratio",
    help: "Sets the knee at low plate voltage, in V² (KVB in SPICE listings).",
  },
];

/** Koren's parameters: the table's for the chosen tube, any the user entered in their place. */
export function modelFor(input: TriodeStageInput): { params: TriodeParams; name: string; rating?: number; overridden: ModelKey[] } {
  const entry = input.tube ? findTriode(input.tube) : undefined;
  const overridden = MODEL_KEYS.filter((k) => input[k] !== undefined);
  const base = entry?.params;
  const pick = (k: ModelKey) => input[k] ?? base?.[k] ?? Number.NaN; // NaN unreachable: the schema demands all five without a tube
  const params: TriodeParams = { mu: pick("mu"), ex: pick("ex"), kg1: pick("kg1"), kp: pick("kp"), kvb: pick("kvb") };
  return { params, name: entry?.name ?? "your model", rating: entry?.maxPlateDissipation, overridden: entry ? overridden : [] };
}
