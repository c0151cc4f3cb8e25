import type { BenchDescriptor, InputMeta } from "@/lib/calc/types";

/**
 * The form holds what a person typed (text for quantities, arrays for lists); the calculator's schema
 * gets a cleaned copy with blanks dropped and only the active way of entering a list.
 */

export type FormValues = Record<string, unknown>;

/** What the form needs of a calculator: its inputs, and its descriptor's ways of entering a list (heaters or tube types, bands or a resistance). */
export interface FormShape {
  inputs: readonly InputMeta[];
  bench: Pick<BenchDescriptor, "modes">;
}

export function hiddenFields(modes: BenchDescriptor["modes"], mode: string | undefined): Set<string> {
  if (!modes) return new Set();
  return new Set(modes.filter((x) => x.id !== mode).flatMap((x) => x.fields));
}

/** The mode the initial inputs imply (the first one with a value, else the first). */
export function initialMode(modes: BenchDescriptor["modes"], values: FormValues): string | undefined {
  if (!modes) return undefined;
  const given = modes.find((x) => x.fields.some((f) => !isBlank(values[f]) && !(Array.isArray(values[f]) && (values[f] as unknown[]).length === 0)));
  return (given ?? modes[0]).id;
}

function isBlank(v: unknown): boolean {
  return v === undefined || v === null || (typeof v === "string" && v.trim() === "");
}

const text = (v: unknown) => (v === undefined || v === null ? "" : typeof v === "object" ? JSON.stringify(v) : String(v));

/** Initial form values: the given inputs (from the URL or the example) over the metadata's defaults. */
export function initialValues(inputs: readonly InputMeta[], given: FormValues): FormValues {
  const out: FormValues = {};
  for (const meta of inputs) {
    const v = given[meta.name] ?? meta.default;
    if (meta.control === "boolean") out[meta.name] = v === undefined ? true : v === true || v === "true" || v === "on";
    else if (meta.name === "pilotLamp") out[meta.name] = lampValue(v);
    else if (meta.control === "list") out[meta.name] = listValue(meta.name, v);
    else out[meta.name] = text(v);
  }
  return out;
}

function listValue(name: string, v: unknown): unknown[] {
  const arr = Array.isArray(v) ? v : typeof v === "string" && v.trim() ? v.split(/[\s,;]+/) : [];
  if (name === "stages") {
    return arr.map((s) => {
      const o = (s ?? {}) as Record<string, unknown>;
      const lc = o.kind === "lc";
      // An LC stage's resistance is its choke's winding, kept in its own form field so switching kind never carries a resistor's value over.
      return {
        kind: lc ? "lc" : "rc",
        resistance: lc ? "" : text(o.resistance),
        chokeResistance: lc ? text(o.resistance) : "",
        inductance: text(o.inductance),
        capacitance: text(o.capacitance),
        current: text(o.current),
      };
    });
  }
  if (name === "heaters") {
    return arr.map((h) => {
      const o = (h ?? {}) as Record<string, unknown>;
      return { voltage: text(o.voltage), current: text(o.current) };
    });
  }
  return arr.map((x) => text(x));
}

/** What the schema (and the URL, and a saved job) gets from the form. */
export function toRaw(form: FormShape, values: FormValues, mode?: string): FormValues {
  const hidden = hiddenFields(form.bench.modes, mode);
  const out: FormValues = {};
  for (const meta of form.inputs) {
    if (hidden.has(meta.name)) continue;
    const v = values[meta.name];
    if (meta.control === "boolean") {
      out[meta.name] = Boolean(v);
    } else if (meta.name === "pilotLamp") {
      const lamp = cleanLamp(v);
      if (lamp) out[meta.name] = lamp;
    } else if (meta.control === "list") {
      const list = cleanList(meta.name, Array.isArray(v) ? v : []);
      if (list.length) out[meta.name] = list;
    } else if (!isBlank(v)) {
      out[meta.name] = String(v).trim();
    }
  }
  return out;
}

function cleanList(name: string, arr: unknown[]): unknown[] {
  if (name === "stages") {
    return arr.map((s) => {
      const o = s as Record<string, string>;
      const current = o.current?.trim() ?? "";
      const choke = o.chokeResistance?.trim() ?? "";
      // Blank current or choke resistance is left out: the calculator then uses its stated default.
      const stage: Record<string, string> =
        o.kind === "lc"
          ? { kind: "lc", inductance: o.inductance?.trim() ?? "", capacitance: o.capacitance?.trim() ?? "", ...(choke ? { resistance: choke } : {}) }
          : { kind: "rc", resistance: o.resistance?.trim() ?? "", capacitance: o.capacitance?.trim() ?? "" };
      if (current) stage.current = current;
      return stage;
    });
  }
  if (name === "heaters")
    return arr.map((h) => ({
      voltage: String((h as Record<string, string>).voltage ?? "").trim(),
      current: String((h as Record<string, string>).current ?? "").trim(),
    }));
  return arr.map((x) => String(x ?? "").trim()).filter(Boolean);
}

/** The heater string's pilot lamp: one object of three quantity texts, sent only when something is typed. */
function lampValue(v: unknown): Record<string, string> {
  const o = (v && typeof v === "object" ? v : {}) as Record<string, unknown>;
  return { voltage: text(o.voltage), current: text(o.current), rectifierCurrent: text(o.rectifierCurrent) };
}

function cleanLamp(v: unknown): Record<string, string> | null {
  const o = lampValue(v);
  const voltage = o.voltage.trim();
  const current = o.current.trim();
  const rectifierCurrent = o.rectifierCurrent.trim();
  if (!voltage && !current && !rectifierCurrent) return null;
  return rectifierCurrent ? { voltage, current, rectifierCurrent } : { voltage, current };
}
