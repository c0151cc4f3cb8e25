import { z } from "zod";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The cathode-bias calculator's inputs: the operating point, an optional bypass capacitor, and the tube's figures for its estimate. */

const OPTIONAL = { positive: true } as const;

export const cathodeBiasSchema = z
  .object({
    biasVoltage: quantity("voltage", { min: -1e4, max: 1e4, label: "Bias voltage" }).transform((v, ctx) => {
      if (v === 0) {
        ctx.addIssue({ code: "custom", message: "Bias voltage must not be zero" });
        return z.NEVER;
      }
      return Math.abs(v); // a data sheet's "−12.5 V grid" is taken as its magnitude
    }),
    plateCurrent: quantity("current", { positive: true, min: 1e-9, max: 10, label: "Plate current" }),
    screenCurrent: quantityWithDefault("current", 0, { nonNegative: true, max: 10, label: "Screen current" }).prefault(""),
    bypassCapacitance: optionalQuantity("capacitance", { ...OPTIONAL, min: 1e-12, max: 1, label: "Bypass capacitance" }).optional(),
    amplificationFactor: optionalQuantity("ratio", { ...OPTIONAL, max: 1e4, label: "Amplification factor" }).optional(),
    plateResistance: optionalQuantity("resistance", { ...OPTIONAL, min: 1, max: 1e9, label: "Plate resistance" }).optional(),
    plateLoad: optionalQuantity("resistance", { nonNegative: true, max: 1e9, label: "Plate load" }).optional(),
    transconductance: optionalQuantity("conductance", { ...OPTIONAL, min: 1e-7, max: 10, label: "Transconductance" }).optional(),
  })
  .superRefine((v, ctx) => {
    const triode = ["amplificationFactor", "plateResistance", "plateLoad"] as const;
    const given = triode.filter((n) => v[n] !== undefined);
    if (given.length > 0 && given.length < 3) {
      for (const n of triode.filter((m) => v[m] === undefined)) {
        ctx.addIssue({
          code: "custom",
          path: [n],
          message: "For the triode estimate give amplification factor, plate resistance and plate load together",
        });
      }
    }
    if (given.length > 0 && v.transconductance !== undefined) {
      ctx.addIssue({
        code: "custom",
        path: ["transconductance"],
        message: "Give either the triode figures (µ, rp, plate load) or the transconductance, not both",
      });
    }
  });

export type CathodeBiasInput = z.output<typeof cathodeBiasSchema>;
