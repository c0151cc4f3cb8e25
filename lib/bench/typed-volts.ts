import type { InputMeta } from "@/lib/calc/types";
import { readQuantityText, type ParseResult, type QuantityKind } from "@/lib/calc/quantity-text";
import { HAZARD_VOLTS } from "@/lib/calc/safety";

/**
 * The danger caution follows what the person typed, not only a valid result (PRODUCT.md, "Safety
 * rules"): each voltage field is read on its own, so a 350 V supply shows the banner even while
 * another field is empty or wrong. Voltage fields are those whose InputMeta.quantity is "voltage",
 * and inside a list or object input (heaters, a pilot lamp) every key named "voltage" or ending in
 * "Voltage".
 */

export type Parse = (raw: unknown, kind: QuantityKind) => ParseResult;

/** Without mathjs (the Bench form's first paint); units only mathjs knows ("350 volts") read as nothing until the full parser arrives. */
export const quickParse: Parse = (raw, kind) => {
  const r = readQuantityText(raw, kind);
  return r.ok === "unit" ? { ok: false, message: "" } : r;
};

export interface TypedVoltage {
  /** Field label, with the item number inside a list ("Heater 2 voltage"). */
  label: string;
  volts: number;
}

const VOLTAGE_KEY = /^voltage$|Voltage$/;

/** The typed voltage of largest magnitude, or null when no voltage field reads as a number. */
export function highestTypedVoltage(inputs: readonly InputMeta[], raw: Record<string, unknown>, parse: Parse = quickParse): TypedVoltage | null {
  let best: TypedVoltage | null = null;
  const consider = (label: string, value: unknown) => {
    if (typeof value !== "string" && typeof value !== "number") return;
    const r = parse(value, "voltage");
    if (r.ok && Number.isFinite(r.value) && (best === null || Math.abs(r.value) > Math.abs(best.volts))) best = { label, volts: r.value };
  };
  const walk = (label: string, value: unknown) => {
    if (Array.isArray(value)) value.forEach((item, i) => walk(`${label.replace(/s$/, "")} ${i + 1}`, item));
    else if (value && typeof value === "object") {
      for (const [k, v] of Object.entries(value)) if (VOLTAGE_KEY.test(k)) consider(`${label} ${k}`, v);
    }
  };
  for (const meta of inputs) {
    const value = raw[meta.name];
    if (meta.quantity === "voltage") consider(meta.label, value);
    else if (value !== null && typeof value === "object") walk(meta.label, value);
  }
  return best;
}

/** True when a typed voltage is above the 50 V of lib/calc/safety.ts. */
export function typedHazard(v: TypedVoltage | null): v is TypedVoltage {
  return v !== null && Math.abs(v.volts) > HAZARD_VOLTS;
}
