import { z } from "zod";
import { RECEIVING_TUBES, findTube, type ReceivingTube } from "./tables/tubes";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The plate-dissipation calculator's inputs: the operating point to chassis, the tube or its maximum, an optional screen, the stage class. */

export const TUBES = new Map<string, ReceivingTube>(RECEIVING_TUBES.map((t) => [t.type, t]));
export const TUBE_TYPES = RECEIVING_TUBES.map((t) => t.type);
export const STAGE_CLASSES = ["A", "AB"] as const;
type StageClass = (typeof STAGE_CLASSES)[number];

const isBlank = (v: unknown) => v === undefined || v === null || (typeof v === "string" && v.trim() === "");

const tubeField = z
  .unknown()
  .transform((raw, ctx): string | undefined => {
    if (isBlank(raw)) return undefined;
    // The form sends the table's own type numbers: look those up directly before reading a typed name.
    const found = typeof raw === "string" ? (TUBES.get(raw) ?? findTube(raw)) : undefined;
    if (!found) {
      ctx.addIssue({ code: "custom", message: "Tube type is not in the built-in table; leave it blank and enter the maximum dissipation from its data sheet" });
      return z.NEVER;
    }
    if (found.category !== "receiving") {
      ctx.addIssue({ code: "custom", message: `Tube type ${found.type} is a picture tube, rated by anode voltage, not plate dissipation` });
      return z.NEVER;
    }
    return found.type;
  })
  .optional();

const stageClassField = z
  .unknown()
  .transform((raw, ctx): StageClass | undefined => {
    if (isBlank(raw)) return undefined;
    if (raw === "A" || raw === "AB") return raw;
    const typed =
      typeof raw === "string"
        ? raw
            .trim()
            .toUpperCase()
            .replace(/^CLASS\s*/, "")
        : "";
    if (typed === "A" || typed === "AB") return typed;
    ctx.addIssue({ code: "custom", message: 'Stage class must be "A" or "AB"' });
    return z.NEVER;
  })
  .optional();

export const plateDissipationSchema = z
  .object({
    plateVoltage: quantity("voltage", { positive: true, max: 1e5, label: "Plate voltage" }),
    cathodeVoltage: quantityWithDefault("voltage", 0, { nonNegative: true, max: 1e4, label: "Cathode voltage" }),
    plateCurrent: quantity("current", { positive: true, min: 1e-9, max: 10, label: "Plate current" }),
    tube: tubeField,
    maxDissipation: optionalQuantity("power", { positive: true, min: 1e-3, max: 1e5, label: "Maximum dissipation" }),
    screenVoltage: optionalQuantity("voltage", { positive: true, max: 1e4, label: "Screen voltage" }),
    screenCurrent: optionalQuantity("current", { nonNegative: true, max: 10, label: "Screen current" }),
    maxScreenDissipation: optionalQuantity("power", { positive: true, min: 1e-3, max: 1e5, label: "Maximum screen dissipation" }),
    stageClass: stageClassField,
  })
  .superRefine((v, ctx) => {
    if (v.cathodeVoltage >= v.plateVoltage) {
      ctx.addIssue({ code: "custom", path: ["cathodeVoltage"], message: "Cathode voltage must be below the plate voltage (both measured to chassis)" });
    }
    if (v.tube === undefined && v.maxDissipation === undefined) {
      ctx.addIssue({ code: "custom", path: ["tube"], message: "Tube type is required, or enter the maximum plate dissipation from its data sheet" });
    }
    if (v.screenVoltage !== undefined && v.screenCurrent === undefined) {
      ctx.addIssue({ code: "custom", path: ["screenCurrent"], message: "Screen current is required with a screen voltage" });
    } else if (v.screenCurrent !== undefined && v.screenVoltage === undefined) {
      ctx.addIssue({ code: "custom", path: ["screenVoltage"], message: "Screen voltage is required with a screen current" });
    } else if (v.screenVoltage !== undefined && v.screenVoltage <= v.cathodeVoltage) {
      ctx.addIssue({ code: "custom", path: ["screenVoltage"], message: "Screen voltage must be above the cathode voltage (both measured to chassis)" });
    }
  });

export type PlateDissipationInput = z.output<typeof plateDissipationSchema>;
