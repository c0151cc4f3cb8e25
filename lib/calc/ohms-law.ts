import { z } from "zod";
import { texQuantity, tex } from "./format";
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

export type OhmsValues = {
  voltage: number;
  current: number;
  resistance: number;
  power: number;
};

/** Which two values were given; explain typesets the formulas of that pair. */
type Pair = "vi" | "vr" | "vp" | "ir" | "ip" | "rp";

type Solved = { ok: true; values: OhmsValues; pair: Pair } | { ok: false; field: Name; message: string };

const tq = (v: number, u: string) => texQuantity(v, u, 4);

type Formula = { name: Name; tex: string; sub: (x: OhmsValues) => string };

/** The two formulas each pair solves with, and their working; typeset only when the working is shown. */
const FORMULAS: Record<Pair, readonly Formula[]> = {
  vi: [
    { name: "resistance", tex: "R = V/I", sub: (x) => `R = \\frac{${tq(x.voltage, "V")}}{${tq(x.current, "A")}} = ${tq(x.resistance, "Ω")}` },
    { name: "power", tex: "P = V I", sub: (x) => `P = ${tq(x.voltage, "V")} \\times ${tq(x.current, "A")} = ${tq(x.power, "W")}` },
  ],
  vr: [
    { name: "current", tex: "I = V/R", sub: (x) => `I = \\frac{${tq(x.voltage, "V")}}{${tq(x.resistance, "Ω")}} = ${tq(x.current, "A")}` },
    { name: "power", tex: "P = V^2/R", sub: (x) => `P = \\frac{(${tq(x.voltage, "V")})^2}{${tq(x.resistance, "Ω")}} = ${tq(x.power, "W")}` },
  ],
  vp: [
    { name: "resistance", tex: "R = V^2/P", sub: (x) => `R = \\frac{(${tq(x.voltage, "V")})^2}{${tq(x.power, "W")}} = ${tq(x.resistance, "Ω")}` },
    { name: "current", tex: "I = P/V", sub: (x) => `I = \\frac{${tq(x.power, "W")}}{${tq(x.voltage, "V")}} = ${tq(x.current, "A")}` },
  ],
  ir: [
    { name: "voltage", tex: "V = I R", sub: (x) => `V = ${tq(x.current, "A")} \\times ${tq(x.resistance, "Ω")} = ${tq(x.voltage, "V")}` },
    { name: "power", tex: "P = I^2 R", sub: (x) => `P = (${tq(x.current, "A")})^2 \\times ${tq(x.resistance, "Ω")} = ${tq(x.power, "W")}` },
  ],
  ip: [
    { name: "resistance", tex: "R = P/I^2", sub: (x) => `R = \\frac{${tq(x.power, "W")}}{(${tq(x.current, "A")})^2} = ${tq(x.resistance, "Ω")}` },
    { name: "voltage", tex: "V = P/I", sub: (x) => `V = \\frac{${tq(x.power, "W")}}{${tq(x.current, "A")}} = ${tq(x.voltage, "V")}` },
  ],
  rp: [
    { name: "voltage", tex: "V = \\sqrt{P R}", sub: (x) => `V = \\sqrt{${tq(x.power, "W")} \\times ${tq(x.resistance, "Ω")}} = ${tq(x.voltage, "V")}` },
    { name: "current", tex: "I = \\sqrt{P/R}", sub: (x) => `I = \\sqrt{\\frac{${tq(x.power, "W")}}{${tq(x.resistance, "Ω")}}} = ${tq(x.current, "A")}` },
  ],
};

/** The first given field, where a refusal of the pair as a whole is reported. */
function firstGiven(k: Partial<OhmsValues>): Name {
  return k.voltage !== undefined ? "voltage" : k.current !== undefined ? "current" : k.resistance !== undefined ? "resistance" : "power";
}

/** Refuse overflow and a zero resistance; otherwise the solved values. A plain function, not a closure per call. */
function finish(k: Partial<OhmsValues>, pair: Pair, voltage: number, current: number, resistance: number, power: number): Solved {
  if (!(Number.isFinite(voltage) && Number.isFinite(current) && Number.isFinite(resistance) && Number.isFinite(power))) {
    return { ok: false, field: firstGiven(k), message: "These two values are too far apart to combine; the result would overflow" };
  }
  if (!(resistance > 0)) {
    return { ok: false, field: firstGiven(k), message: "These values would give a resistance of zero (a short)" };
  }
  // -0 (from "-0 V") would read oddly in a result; 0 + -0 is +0.
  return { ok: true, values: { voltage: voltage + 0, current: current + 0, resistance: resistance + 0, power: power + 0 }, pair };
}

/** Solve from exactly two known values. Pure; the schema calls it to refuse impossible pairs. */
export function solveOhms(k: Partial<OhmsValues>): Solved {
  const { voltage: v, current: i, resistance: r, power: p } = k;
  if (v !== undefined && i !== undefined) {
    if (v === 0 && i === 0) return { ok: false, field: "current", message: "With no voltage and no current the resistance cannot be found" };
    if (i === 0) return { ok: false, field: "current", message: "Zero current with a voltage across means an open circuit: the resistance would be infinite" };
    if (v === 0) return { ok: false, field: "voltage", message: "Zero voltage with current flowing means a short: the resistance would be zero" };
    if (Math.sign(v) !== Math.sign(i)) return { ok: false, field: "current", message: "Voltage and current must have the same sign for a resistor" };
    return finish(k, "vi", v, i, v / i, v * i);
  }
  if (v !== undefined && r !== undefined) return finish(k, "vr", v, v / r, r, (v * v) / r);
  if (v !== undefined && p !== undefined) {
    if (v === 0 && p === 0) return { ok: false, field: "power", message: "With no voltage and no power the resistance cannot be found" };
    if (v === 0) return { ok: false, field: "voltage", message: "A resistor cannot take power with zero voltage across it" };
    if (p === 0) return { ok: false, field: "power", message: "Zero power with a voltage across means no current: the resistance would be infinite" };
    return finish(k, "vp", v, p / v, (v * v) / p, p);
  }
  if (i !== undefined && r !== undefined) return finish(k, "ir", i * r, i, r, i * i * r);
  if (i !== undefined && p !== undefined) {
    if (i === 0 && p === 0) return { ok: false, field: "power", message: "With no current and no power the resistance cannot be found" };
    if (i === 0) return { ok: false, field: "current", message: "A resistor cannot take power with no current through it" };
    if (p === 0) return { ok: false, field: "power", message: "Zero power with current flowing means a short: the resistance would be zero" };
    return finish(k, "ip", p / i, i, p / (i * i), p);
  }
  if (r !== undefined && p !== undefined) return finish(k, "rp", Math.sqrt(p * r), Math.sqrt(p / r), r, p);
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

const DIRECTION_UNKNOWN = "From resistance and power alone the direction is unknown; voltage and current are given as positive.";

export type OhmsLawInput = z.output<typeof ohmsLawSchema>;

export const calculator = defineCalculator({
  slug: "ohms-law",
  title: "Ohm's law and power",
  purpose: "Any two of voltage, current, resistance and power give the other two.",
  bench: {
    group: "parts",
    example: { voltage: "250 V", resistance: "100k" },
    headlines: ["current", "power"],
    alwaysDanger: false,
    chart: null,
  },
  inputs: [
    {
      name: "voltage",
      label: "Voltage across",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Enter exactly two of the four fields.",
    },
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
    { label: "Ohm's law", latex: tex`V = I\,R` },
    { label: "Power", latex: tex`P = V\,I = I^2 R = \frac{V^2}{R}` },
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
    const warnings: Warning[] = highVoltageWarning(solved.values.voltage);
    if (solved.pair === "rp") warnings.push({ level: "info", message: DIRECTION_UNKNOWN });
    return { outputs: solved.values, warnings };
  },
  explain(input: OhmsLawInput) {
    const solved = solveOhms(input);
    if (!solved.ok) return [];
    const steps: Step[] = [];
    for (const f of FORMULAS[solved.pair]) {
      const name = `${LABEL[f.name][0].toUpperCase()}${LABEL[f.name].slice(1)}`;
      steps.push({ label: `${name}: formula`, latex: f.tex });
      steps.push({ label: `${name}: with your values`, latex: f.sub(solved.values) });
    }
    return steps;
  },
});
