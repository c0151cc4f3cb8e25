import type { InputMeta } from "@/lib/calc/types";

/**
 * Saved calculations keep their inputs as SI numbers. Reopened in the Bench they become text in the
 * form, where a bare number in a capacitance field is refused (it is never read as farads), so each
 * capacitance number gets its unit written after it: 0.000047 → "0.000047 F", the same value exactly.
 * List items (filter stages) carry their capacitance under the key "capacitance".
 */
export function reopenInputs(inputs: readonly InputMeta[], saved: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = { ...saved };
  for (const meta of inputs) {
    const v = saved[meta.name];
    if (meta.quantity === "capacitance") out[meta.name] = farads(v);
    else if (Array.isArray(v))
      out[meta.name] = v.map((item) => (item && typeof item === "object" && !Array.isArray(item) ? withFarads(item as Record<string, unknown>) : item));
  }
  return out;
}

const farads = (v: unknown) => (typeof v === "number" && Number.isFinite(v) ? `${v} F` : v);

function withFarads(item: Record<string, unknown>): Record<string, unknown> {
  return "capacitance" in item ? { ...item, capacitance: farads(item.capacitance) } : item;
}
