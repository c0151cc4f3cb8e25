import { z } from "zod";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The reforming calculator's inputs: the capacitor, an optional series resistor, and the data sheet's leakage figures. */

export const reformingSchema = z
  .object({
    capacitance: quantity("capacitance", { positive: true, min: 1e-9, max: 10, label: "Capacitance" }),
    ratedVoltage: quantity("voltage", { positive: true, min: 1, max: 1000, label: "Rated voltage" }),
    seriesResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e9, label: "Series resistance" }),
    leakageFactor: quantityWithDefault("ratio", 0.01, { nonNegative: true, max: 1, label: "Leakage factor" }),
    leakageOffset: quantityWithDefault("current", 0, { nonNegative: true, max: 1, label: "Leakage offset" }),
    leakageFloor: quantityWithDefault("current", 3e-6, { nonNegative: true, max: 1, label: "Leakage floor" }),
  })
  .superRefine((v, ctx) => {
    if (!(v.leakageFactor * v.capacitance * v.ratedVoltage + v.leakageOffset > 0) && !(v.leakageFloor > 0)) {
      ctx.addIssue({
        code: "custom",
        path: ["leakageFloor"],
        message: "Leakage floor must be above zero when the leakage factor and offset give no limit",
      });
    }
  });

export type ReformingInput = z.output<typeof reformingSchema>;
