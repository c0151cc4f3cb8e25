import { formatQuantity, tex } from "./format";
import { explainReforming } from "./reforming-explain";
import { reformingSchema, type ReformingInput } from "./reforming-schema";
import { highVoltageWarning } from "./safety";
import { defineCalculator, type OutputValue, type Warning } from "./types";

export { reformingSchema, type ReformingInput } from "./reforming-schema";

/**
 * Reforming an aluminium electrolytic capacitor that has stood unused: raise its voltage in steps
 * through a series resistor, holding each step until the leakage falls.
 * Leakage limit in the form aluminium electrolytic data sheets print: I ≤ k·C·V (µA, C in µF, V in V)
 * [+ offset], or the floor, whichever is greater; general-purpose parts give k = 0.01 and a 3 µA floor,
 * measured after 2 minutes at rated voltage, 20 °C. In SI the same number works: k·C[F]·V[V] is amperes.
 * Schedule (common practice): ten steps of 10 % of rated voltage, each held at least 10 minutes and
 * five time constants of the series resistor, the last (rated voltage) at least an hour; each step's
 * leakage target is the same form taken at that step's voltage (common practice, stricter than the
 * rated-voltage figure at low steps).
 */

/** Steps of a tenth of rated voltage, and the holds in minutes (common practice). */
const STEP_COUNT = 10;
const HOLD_MINUTES = 10;
const FINAL_HOLD_MINUTES = 60;
/** A resistor dropping more than this fraction of rated voltage at the limit current hides part of each step. */
const DROP_FRACTION = 0.05;

/** The data-sheet form at a voltage v: max(k·C·v + offset, floor), in amperes. */
function limitAt(input: ReformingInput, v: number): number {
  const i = input.leakageFactor * input.capacitance * v + input.leakageOffset;
  return i > input.leakageFloor ? i : input.leakageFloor;
}

const REPLACE: Warning = {
  level: "caution",
  message:
    "A capacitor that heats, bulges, vents or hisses, or whose leakage keeps rising instead of falling, is replaced, not reformed: " +
    "switch off at once and discharge it through a resistor.",
};
const WHAT_LIMIT_MEANS: Warning = {
  level: "info",
  message:
    "The leakage limit is the data-sheet figure for a new part at 20 °C, read about 2 minutes after reaching rated voltage. Leakage below it " +
    "compares well with a new part; it says nothing of lost capacitance or high ESR, so measure those too.",
};
const RESISTOR_RATING: Warning = {
  level: "info",
  message:
    "Resistor power is what the series resistor dissipates if the capacitor shorts at rated voltage; rate it for that, or it becomes the fault. " +
    "The leakage is the voltage across the resistor divided by its resistance.",
};
const NO_RESISTOR: Warning = {
  level: "info",
  message:
    "With no series resistor nothing limits the current into a leaky capacitor. A resistor limits it and lets you read the leakage as the voltage across it (common practice).",
};

export const calculator = defineCalculator({
  slug: "reforming",
  title: "Reforming an electrolytic",
  purpose: "The leakage a capacitor should come down to, and a step-by-step voltage schedule to reform it.",
  bench: {
    group: "first-power",
    example: { capacitance: "40 uF", ratedVoltage: "450 V", seriesResistance: "10k" },
    headlines: ["leakageLimit", "resistorPower"],
    alwaysDanger: false,
    chart: "reforming-schedule",
    // General-purpose parts take the defaults; another series' data sheet prints its own k, offset and floor.
    advanced: { title: "Data-sheet leakage figures: k, offset and floor", fields: ["leakageFactor", "leakageOffset", "leakageFloor"] },
  },
  inputs: [
    { name: "capacitance", label: "Capacitance", unit: "F", required: true, control: "quantity", quantity: "capacitance" },
    {
      name: "ratedVoltage",
      label: "Rated voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The working voltage printed on the capacitor.",
    },
    {
      name: "seriesResistance",
      label: "Series resistor",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "Optional: the current-limiting resistor between the supply and the capacitor.",
    },
    {
      name: "leakageFactor",
      label: "Leakage factor k",
      unit: "",
      required: false,
      default: 0.01,
      control: "quantity",
      quantity: "ratio",
      help: "From the data sheet's I ≤ k·C·V (µA, µF, V); 0.01 for general-purpose parts.",
    },
    {
      name: "leakageOffset",
      label: "Leakage offset",
      unit: "A",
      required: false,
      default: 0,
      control: "quantity",
      quantity: "current",
      help: "Added to k·C·V when the data sheet writes it so (e.g. + 4 µA).",
    },
    {
      name: "leakageFloor",
      label: "Leakage floor",
      unit: "A",
      required: false,
      default: 3e-6,
      control: "quantity",
      quantity: "current",
      help: 'The "or … whichever is greater" figure; 3 µA for general-purpose parts.',
    },
  ],
  outputs: [
    { name: "leakageLimit", label: "Leakage limit at rated voltage", unit: "A" },
    { name: "initialCurrent", label: "Current if rated voltage meets the discharged capacitor", unit: "A" },
    { name: "resistorPower", label: "Resistor dissipation with a shorted capacitor", unit: "W" },
    { name: "timeConstant", label: "Charging time constant RC", unit: "s" },
    { name: "steps", label: "Voltage schedule: voltage, minutes, leakage to wait for", unit: "" },
  ],
  schema: reformingSchema,
  formulas: [
    {
      label: "Leakage limit (data-sheet form)",
      latex: tex`I_{max} = \max\left(k\,C\,V + I_0,\; I_{floor}\right) \quad (C\text{ in }\mu\mathrm{F},\ V\text{ in V},\ I\text{ in }\mu\mathrm{A})`,
    },
    { label: "Current into the discharged capacitor", latex: tex`I_{0} = \frac{V}{R}, \quad P_R = \frac{V^2}{R}` },
    { label: "Charging time constant", latex: tex`\tau = R\,C` },
    { label: "Schedule", latex: tex`V_n = n \times 0.1\,V_{rated}, \; n = 1 \ldots 10; \quad t_n \ge \max(10\,\mathrm{min},\ 5\tau)` },
  ],
  references: [
    {
      title: "Aluminium electrolytic capacitor data sheets, general-purpose radial series",
      detail:
        "Leakage current I ≤ 0.01·C·V (µA) or 3 µA, whichever is greater, after 2 minutes at rated voltage, 20 °C; other series print other k, offsets and floors",
    },
    {
      title: "IEC 60384-4, Fixed capacitors: aluminium electrolytic capacitors",
      detail: "Sectional specification: leakage current measured at rated voltage after a stated time (clause not checked)",
    },
    {
      title: "Restorers' bench practice",
      detail:
        "Reforming through a series resistor, raising the voltage in steps of about a tenth of rating and holding each until the leakage falls (common practice)",
    },
  ],
  whyItMatters:
    "An electrolytic that has stood for years loses part of its oxide layer. Put straight onto full B+, it passes a large " +
    "current, heats and can vent. Raising the voltage slowly through a resistor lets the oxide grow back; the leakage limit " +
    "tells you when it has come back as far as a new part — and a part that never gets there, or warms up, goes in the bin.",
  compute(input: ReformingInput) {
    const { capacitance: c, ratedVoltage: v, seriesResistance: r } = input;
    const leakageLimit = limitAt(input, v);
    const tau = r === undefined ? null : r * c;
    const minHold = tau === null ? 0 : Math.ceil((5 * tau) / 60);
    const steps: { voltage: number; minutes: number; leakageLimit: number }[] = [];
    for (let n = 1; n <= STEP_COUNT; n++) {
      const voltage = n === STEP_COUNT ? v : (v * n) / STEP_COUNT; // n/10 of rated, divided last so 450 V gives 135, not 135.00000000000003
      const hold = n === STEP_COUNT ? FINAL_HOLD_MINUTES : HOLD_MINUTES;
      steps.push({ voltage, minutes: minHold > hold ? minHold : hold, leakageLimit: limitAt(input, voltage) });
    }

    const warnings: Warning[] = highVoltageWarning(v);
    warnings.push(REPLACE, WHAT_LIMIT_MEANS);
    if (r === undefined) warnings.push(NO_RESISTOR);
    else {
      warnings.push(RESISTOR_RATING);
      const drop = leakageLimit * r;
      if (drop > DROP_FRACTION * v) {
        warnings.push({
          level: "caution",
          message:
            `At the leakage limit this resistor drops ${formatQuantity(drop, "V")}, more than ${DROP_FRACTION * 100}% of the rated voltage, so the capacitor sees less than each step's voltage. ` +
            "Raise the supply by the drop, or use a smaller resistor for the last steps.",
        });
      }
    }
    return {
      outputs: {
        leakageLimit,
        initialCurrent: r === undefined ? null : v / r,
        resistorPower: r === undefined ? null : (v * v) / r,
        timeConstant: tau,
        steps: steps as { [key: string]: OutputValue }[],
      },
      warnings,
    };
  },
  explain: (input: ReformingInput, o) => explainReforming(input, o),
});
