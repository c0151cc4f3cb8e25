import { z } from "zod";
import { texQuantity } from "./format";
import { highVoltageWarning } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity } from "./units";

/**
 * Ohm's law and the power law for a resistor: from any two of V, I, R, P, the other two.
 * V = IR, P = VI = I²R = V²/R. Voltage and current may be negative (a direction), but
 * together, since a resistor only absorbs power; resistance must be above zero and power
 * cannot be negative. Combinations that would give an infinite or zero resistance
 * (an open or a short) are refused by the schema.
 */

type Name = "voltage" | "current" | "resistance" | "power";
const NAMES: readonly Name[] = ["voltage", "current", "resistance", "power"];
const LABEL: Record<Name, string> = { voltage: "voltage", current: "current", resistance: "resistance", power: "power" };

export interface OhmsValues {
  voltage: number;
  current: number;
  resistance: number;
  power: number;
}

/** `sub` is typeset only when the working is shown: the schema solves too, just to refuse impossible pairs. */
type Solved = { ok: true; values: OhmsValues; formulas: { name: Name; tex: string; sub: () => string }[] } | { ok: false; field: Name; message: string };

const tq = (v: number, u: string) => texQuantity(v, u, 4);

/** Solve from exactly two known values. Pure; the schema calls it to refuse impossible pairs. */
export function solveOhms(k: Partial<OhmsValues>): Solved {
  const { voltage: v, current: i, resistance: r, power: p } = k;
  const done = (values: OhmsValues, formulas: { name: Name; tex: string; sub: () => string }[]): Solved => {
    const { voltage, current, resistance, power } = values;
    if (!(Number.isFinite(voltage) && Number.isFinite(current) && Number.isFinite(resistance) && Number.isFinite(power))) {
      return { ok: false, field: NAMES.find((m) => k[m] !== undefined) as Name, message: "These two values are too far apart to combine; the result would overflow" };
    }
    if (!(resistance > 0)) {
      return { ok: false, field: NAMES.find((m) => k[m] !== undefined) as Name, message: "These values would give a resistance of zero (a short)" };
    }
    // -0 (from "-0 V") would read oddly in a result; 0 + -0 is +0.
    return { ok: true, values: { voltage: voltage + 0, current: current + 0, resistance: resistance + 0, power: power + 0 }, formulas };
  };
  if (v !== undefined && i !== undefined) {
    if (v === 0 && i === 0) return { ok: false, field: "current", message: "With no voltage and no current the resistance cannot be found" };
    if (i === 0) return { ok: false, field: "current", message: "Zero current with a voltage across means an open circuit: the resistance would be infinite" };
    if (v === 0) return { ok: false, field: "voltage", message: "Zero voltage with current flowing means a short: the resistance would be zero" };
    if (Math.sign(v) !== Math.sign(i)) return { ok: false, field: "current", message: "Voltage and current must have the same sign for a resistor" };
    const res = v / i;
    const pw = v * i;
    return done({ voltage: v, current: i, resistance: res, power: pw }, [
      { name: "resistance", tex: "R = V/I", sub: () => `R = \\frac{${tq(v, "V")}}{${tq(i, "A")}} = ${tq(res, "Ω")}` },
      { name: "power", tex: "P = V I", sub: () => `P = ${tq(v, "V")} \\times ${tq(i, "A")} = ${tq(pw, "W")}` },
    ]);
  }
  if (v !== undefined && r !== undefined) {
    const cur = v / r;
    const pw = (v * v) / r;
    return done({ voltage: v, current: cur, resistance: r, power: pw }, [
      { name: "current", tex: "I = V/R", sub: () => `I = \\frac{${tq(v, "V")}}{${tq(r, "Ω")}} = ${tq(cur, "A")}` },
      { name: "power", tex: "P = V^2/R", sub: () => `P = \\frac{(${tq(v, "V")})^2}{${tq(r, "Ω")}} = ${tq(pw, "W")}` },
    ]);
  }
  if (v !== undefined && p !== undefined) {
    if (v === 0 && p === 0) return { ok: false, field: "power", message: "With no voltage and no power the resistance cannot be found" };
    if (v === 0) return { ok: false, field: "voltage", message: "A resistor cannot take power with zero voltage across it" };
    if (p === 0) return { ok: false, field: "power", message: "Zero power with a voltage across means no current: the resistance would be infinite" };
    const res = (v * v) / p;
    const cur = p / v;
    return done({ voltage: v, current: cur, resistance: res, power: p }, [
      { name: "resistance", tex: "R = V^2/P", sub: () => `R = \\frac{(${tq(v, "V")})^2}{${tq(p, "W")}} = ${tq(res, "Ω")}` },
      { name: "current", tex: "I = P/V", sub: () => `I = \\frac{${tq(p, "W")}}{${tq(v, "V")}} = ${tq(cur, "A")}` },
    ]);
  }
  if (i !== undefined && r !== undefined) {
    const volt = i * r;
    const pw = i * i * r;
    return done({ voltage: volt, current: i, resistance: r, power: pw }, [
      { name: "voltage", tex: "V = I R", sub: () => `V = ${tq(i, "A")} \\times ${tq(r, "Ω")} = ${tq(volt, "V")}` },
      { name: "power", tex: "P = I^2 R", sub: () => `P = (${tq(i, "A")})^2 \\times ${tq(r, "Ω")} = ${tq(pw, "W")}` },
    ]);
  }
  if (i !== undefined && p !== undefined) {
    if (i === 0 && p === 0) return { ok: false, field: "power", message: "With no current and no power the resistance cannot be found" };
    if (i === 0) return { ok: false, field: "current", message: "A resistor cannot take power with no current through it" };
    if (p === 0) return { ok: false, field: "power", message: "Zero power with current flowing means a short: the resistance would be zero" };
    const res = p / (i * i);
    const volt = p / i;
    return done({ voltage: volt, current: i, resistance: res, power: p }, [
      { name: "resistance", tex: "R = P/I^2", sub: () => `R = \\frac{${tq(p, "W")}}{(${tq(i, "A")})^2} = ${tq(res, "Ω")}` },
      { name: "voltage", tex: "V = P/I", sub: () => `V = \\frac{${tq(p, "W")}}{${tq(i, "A")}} = ${tq(volt, "V")}` },
    ]);
  }
  if (r !== undefined && p !== undefined) {
    const volt = Math.sqrt(p * r);
    const cur = Math.sqrt(p / r);
    return done({ voltage: volt, current: cur, resistance: r, power: p }, [
      { name: "voltage", tex: "V = \\sqrt{P R}", sub: () => `V = \\sqrt{${tq(p, "W")} \\times ${tq(r, "Ω")}} = ${tq(volt, "V")}` },
      { name: "current", tex: "I = \\sqrt{P/R}", sub: () => `I = \\sqrt{\\frac{${tq(p, "W")}}{${tq(r, "Ω")}}} = ${tq(cur, "A")}` },
    ]);
  }
  return { ok: false, field: "voltage", message: "Enter exactly two of voltage, current, resistance and power" };
}

export const ohmsLawSchema = z
  .object({
    voltage: optionalQuantity("voltage", { min: -1e9, max: 1e9, label: "Voltage" }).optional(),
    current: optionalQuantity("current", { min: -1e6, max: 1e6, label: "Current" }).optional(),
    resistance: optionalQuantity("resistance", { positive: true, max: 1e18, label: "Resistance" }).optional(),
    power: optionalQuantity("power", { nonNegative: true, max: 1e12, label: "Power" }).optional(),
  })
  .superRefine((k, ctx) => {
    const given = NAMES.filter((n) => k[n] !== undefined);
    if (given.length !== 2) {
      const msg =
        given.length < 2
          ? `Enter exactly two of voltage, current, resistance and power (${given.length === 0 ? "none given" : `only ${LABEL[given[0]]} given`})`
          : `Enter exactly two of voltage, current, resistance and power; ${given.length} were given, so clear ${given.length - 2 === 1 ? "one" : "two"}`;
      for (const n of given.length < 2 ? NAMES.filter((m) => k[m] === undefined) : given) ctx.addIssue({ code: "custom", path: [n], message: msg });
      return;
    }
    const solved = solveOhms(k);
    if (!solved.ok) ctx.addIssue({ code: "custom", path: [solved.field], message: solved.message });
  });

export type OhmsLawInput = z.output<typeof ohmsLawSchema>;

export const calculator = defineCalculator({
  slug: "ohms-law",
  title: "Ohm's law and power",
  purpose: "Any two of voltage, current, resistance and power give the other two.",
  group: "parts",
  inputs: [
    { name: "voltage", label: "Voltage across", unit: "V", required: false, control: "quantity", quantity: "voltage", help: "Enter exactly two of the four fields." },
    { name: "current", label: "Current through", unit: "A", required: false, control: "quantity", quantity: "current" },
    { name: "resistance", label: "Resistance", unit: "Ω", required: false, control: "quantity", quantity: "resistance" },
    { name: "power", label: "Power", unit: "W", required: false, control: "quantity", quantity: "power" },
  ],
  outputs: [
    { name: "voltage", label: "Voltage", unit: "V" },
    { name: "current", label: "Current", unit: "A" },
    { name: "resistance", label: "Resistance", unit: "Ω" },
    { name: "power", label: "Power", unit: "W" },
  ],
  schema: ohmsLawSchema,
  formulas: [
    { label: "Ohm's law", latex: String.raw`V = I\,R` },
    { label: "Power", latex: String.raw`P = V\,I = I^2 R = \frac{V^2}{R}` },
  ],
  references: [
    { title: "The ARRL Handbook for Radio Communications", detail: "Electrical fundamentals chapter: Ohm's law and power in resistive circuits" },
    { title: "Radiotron Designer's Handbook, 4th ed.", detail: "Chapter on fundamentals: Ohm's law for direct current (chapter cited from memory)" },
  ],
  whyItMatters:
    "Most bench arithmetic comes back to these two laws. The voltage you measure across a cathode or dropping " +
    "resistor tells you the current through it without breaking the circuit, and the power tells you whether the " +
    "part is running hot enough to char. Choose a resistor rated for at least twice the power it dissipates.",
  compute(input: OhmsLawInput) {
    const solved = solveOhms(input);
    if (!solved.ok) throw new Error(solved.message); // the schema has already refused this
    const warnings: Warning[] = [...highVoltageWarning(solved.values.voltage)];
    if (input.resistance !== undefined && input.power !== undefined) {
      warnings.push({ level: "info", message: "From resistance and power alone the direction is unknown; voltage and current are given as positive." });
    }
    return { outputs: { ...solved.values }, warnings };
  },
  explain(input: OhmsLawInput) {
    const solved = solveOhms(input);
    if (!solved.ok) return [];
    const steps: Step[] = [];
    for (const f of solved.formulas) {
      const name = `${LABEL[f.name][0].toUpperCase()}${LABEL[f.name].slice(1)}`;
      steps.push({ label: `${name}: formula`, latex: f.tex });
      steps.push({ label: `${name}: with your values`, latex: f.sub() });
    }
    return steps;
  },
});
