import { z } from "zod";
import { optionalQuantity, quantity, quantityWithDefault } from "./units";

/** The bleeder calculator's inputs: the capacitor, its working voltage, the limit and time to meet, both tolerances (and their older names). */

// The working voltage must clear the limit by this ratio, so ln(Vw/Vres) stays well away from zero.
const MIN_RATIO = 1.001;
const VRES = { positive: true, min: 1e-3, max: 1e6, label: "Residual-voltage limit" } as const;
const RTOL = { nonNegative: true, max: 0.5, label: "Resistor tolerance" } as const;

export const bleederSchema = z
  .object({
    capacitance: quantity("capacitance", { positive: true, min: 1e-12, max: 10, label: "Capacitance" }),
    workingVoltage: quantity("voltage", { positive: true, max: 1e6, label: "Working voltage" }),
    // safeVoltage is the contract's first name for the limit; residualVoltage is accepted too.
    safeVoltage: optionalQuantity("voltage", VRES),
    residualVoltage: optionalQuantity("voltage", VRES),
    maxTime: quantityWithDefault("time", 5, { positive: true, min: 1e-3, max: 1e4, label: "Maximum discharge time" }).default(5),
    // Upper tolerance only: a capacitor below nominal discharges sooner. Electrolytics run −10 %/+50 % or wider.
    capacitorTolerance: quantityWithDefault("ratio", 0.5, { nonNegative: true, max: 1, label: "Capacitor tolerance" }).default(0.5),
    resistorTolerance: optionalQuantity("ratio", RTOL),
    // The single tolerance of the first contract, now read as the resistor's.
    tolerance: optionalQuantity("ratio", RTOL),
  })
  .superRefine((v, ctx) => {
    if (v.safeVoltage !== undefined && v.residualVoltage !== undefined && v.safeVoltage !== v.residualVoltage) {
      ctx.addIssue({
        code: "custom",
        path: ["residualVoltage"],
        message: "Residual-voltage limit given twice (safeVoltage and residualVoltage) with different values; give one",
      });
    }
    if (v.tolerance !== undefined && v.resistorTolerance !== undefined && v.tolerance !== v.resistorTolerance) {
      ctx.addIssue({
        code: "custom",
        path: ["tolerance"],
        message: "Tolerance is the older name of the resistor tolerance; give one of tolerance and resistorTolerance",
      });
    }
    const limit = v.safeVoltage ?? v.residualVoltage ?? 60;
    if (!(v.workingVoltage >= limit * MIN_RATIO)) {
      ctx.addIssue({
        code: "custom",
        path: ["workingVoltage"],
        message: "Working voltage must be above the residual-voltage limit; at or below it this rule asks for no bleeder",
      });
    }
  })
  .transform((v) => {
    const limit = v.safeVoltage ?? v.residualVoltage ?? 60;
    const rt = v.resistorTolerance ?? v.tolerance ?? 0.05;
    // Both names of each alias are echoed, so a client that sent either reads its own back.
    return {
      capacitance: v.capacitance,
      workingVoltage: v.workingVoltage,
      safeVoltage: limit,
      residualVoltage: limit,
      maxTime: v.maxTime,
      capacitorTolerance: v.capacitorTolerance,
      resistorTolerance: rt,
      tolerance: rt,
    };
  });

export type BleederInput = z.output<typeof bleederSchema>;
