import { tex } from "./format";
import * as parts from "./heater-string-compute";
import { explainHeaterString } from "./heater-string-explain";
import { COLD_SURGE, LIVE_CHASSIS, MATCH } from "./heater-string-notes";
import { heaterStringSchema, type HeaterStringInput, type HeaterStringOutputs } from "./heater-string-schema";
import { highVoltageWarning } from "./safety";
import { HEATER_SOURCE, TAP_SOURCE, TUBE_NAMES } from "./tables/heaters";
import { nearestPreferred } from "./tables/preferred-values";
import { suggestedRating } from "./tables/wattage";
import { defineCalculator, type Warning } from "./types";
import { tidy } from "./units";

export { heaterStringSchema, type HeaterStringInput, type HeaterStringOutputs, type Shunt } from "./heater-string-schema";

// Module-level copy of the steps compute calls: under the CommonJS interop the benchmark runs in, every
// read of an imported binding is a getter call (as in arc-clearance.ts).
const { pilotLampFigures, shortfallWarning, shuntsFor, stringTotals } = parts;

/**
 * Series heater string on the mains. In series one current flows through every heater, so the string runs
 * at the highest rated heater current; each heater rated for less gets a shunt resistor across it that
 * carries the difference, R = Vh/(I − Ih), and the dropper takes up the rest of the line, R = (V_line − ΣV)/I
 * (Ohm's and Kirchhoff's laws; RCA receiving tube manual, application notes on series heater operation).
 */

export const calculator = defineCalculator({
  slug: "heater-string",
  title: "Series heater string",
  purpose: "Whether a string of heaters in series suits the mains, the dropping resistor it needs, and a shunt for each odd heater.",
  bench: {
    group: "supplies",
    example: { lineVoltage: "120 V", tubes: ["12BE6", "12BA6", "12AV6", "35C5", "35W4"] },
    headlines: ["droppingResistance", "suggestedRating"],
    alwaysDanger: false,
    chart: null,
    modes: [
      { id: "tubes", label: "By tube type", fields: ["tubes"] },
      { id: "heaters", label: "By heater rating", fields: ["heaters"] },
    ],
    advanced: { title: "Pilot lamp on the rectifier's heater tap", fields: ["pilotLamp"] },
    // Unequal heater currents need shunts: a caution, not a danger.
    tones: [{ output: "currentsMatch", when: false, tone: "caution" }],
  },
  inputs: [
    {
      name: "lineVoltage",
      label: "Line voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The mains voltage (rms) across the whole string.",
    },
    {
      name: "heaters",
      label: "Heaters",
      unit: "",
      required: false,
      control: "list",
      help: "Each heater's rated voltage and current, e.g. { voltage: 12.6, current: 0.15 }. Or name the tubes instead.",
    },
    {
      name: "tubes",
      label: "Tubes",
      unit: "",
      required: false,
      control: "list",
      options: TUBE_NAMES,
      help: "Type numbers from the built-in table, e.g. 12BE6, 12BA6, 12AV6, 50C5, 35W4.",
    },
    {
      name: "pilotLamp",
      label: "Pilot lamp on the rectifier's heater tap",
      unit: "",
      required: false,
      control: "list",
      help: "A lamp across the tapped section of a 35W4 or 35Z5GT heater: { voltage, current } of the lamp, and optionally rectifierCurrent, the DC the rectifier's plate draws through the tap.",
    },
  ],
  outputs: [
    { name: "stringVoltage", label: "Voltage the string needs", unit: "V" },
    { name: "stringCurrent", label: "String current (the highest heater current)", unit: "A" },
    { name: "currentsMatch", label: "Heater currents match", unit: "" },
    { name: "droppingResistance", label: "Dropping resistor", unit: "Ω" },
    { name: "dissipation", label: "Dropping resistor dissipation", unit: "W" },
    { name: "suggestedRating", label: "Suggested power rating", unit: "W" },
    { name: "nearestPreferred", label: "Nearest E12 dropping resistor", unit: "Ω" },
    { name: "shunts", label: "Shunt resistors", unit: "" },
    { name: "pilotLampVoltage", label: "Pilot lamp voltage", unit: "V" },
    { name: "pilotLampCurrent", label: "Pilot lamp current", unit: "A" },
    { name: "tapSectionCurrent", label: "Current in the tapped heater section", unit: "A" },
    { name: "stringCurrentWithLamp", label: "String current with the lamp fitted", unit: "A" },
  ],
  schema: heaterStringSchema,
  formulas: [
    { label: "String voltage", latex: tex`V_{string} = \sum_k V_k` },
    { label: "String current", latex: tex`I = \max_k I_k` },
    { label: "Shunt across a heater rated I_h", latex: tex`R_{sh} = \frac{V_h}{I - I_h}, \quad P_{sh} = V_h\,(I - I_h)` },
    { label: "Dropping resistor", latex: tex`R = \frac{V_{line} - V_{string}}{I}` },
    { label: "Dissipation", latex: tex`P = (V_{line} - V_{string})\,I = I^2 R` },
    { label: "Pilot lamp across a heater section", latex: tex`V_{lamp} = (I_h + I_{dc})\,\frac{R_{sec} R_{lamp}}{R_{sec} + R_{lamp}}` },
  ],
  references: [
    {
      title: "RCA Receiving Tube Manual (RC-series)",
      detail: "Heater ratings on each type's data page; application notes on series heater strings and shunting a lower-current heater (from memory)",
    },
    {
      title: "Radiotron Designer's Handbook, 4th ed.",
      detail: "Chapter on heaters and filaments: series operation in AC/DC receivers (from memory; chapter not checked)",
    },
    { title: "Built-in heater table", detail: HEATER_SOURCE },
    { title: "Pilot-lamp tap and warm-up figures", detail: TAP_SOURCE },
    {
      title: '"Longer Life for Dial Lamps", period magazine note on the 35Z5GT',
      detail: "Lamp across the 7.5 V heater section with the plate fed through it: about 110 mA in the lamp, 90 mA in the section (read in a web reprint)",
    },
    {
      title: 'Nuts and Volts, Q&A "Not Just For Looks"',
      detail: "35W4 pilot-lamp tap: the plate current flows through lamp and section, and an open lamp overloads the section (read)",
    },
    { title: "IEC 60063, Preferred number series for resistors and capacitors", detail: "E12 series" },
  ],
  whyItMatters:
    "In an AC/DC radio or a series-string television every heater is in one loop across the mains. Their " +
    "voltages add up, the same current flows through them all, and whatever the string does not use must be " +
    "dropped by a resistor or a ballast. A heater rated for less than the others needs a shunt resistor to carry " +
    "the difference; leave it out, or get the dropper wrong, and some heaters are over-run while others run cold — " +
    "and one open heater darkens the whole set.",
  compute(input: HeaterStringInput) {
    const vLine = input.lineVoltage;
    const t = stringTotals(input);
    const { iMin, iMax } = t;
    const stringVoltage = tidy(t.sum);
    const currentsMatch = iMax <= iMin * (1 + MATCH);
    // One current in series: the highest rating, so no heater is starved; the others are shunted up to it.
    const stringCurrent = iMax;
    const excess = vLine - stringVoltage;
    const needed = excess > 0;
    const droppingResistance = needed ? excess / stringCurrent : 0;
    const dissipation = needed ? excess * stringCurrent : 0;
    const rating = needed ? suggestedRating(dissipation) : { rating: 0, warning: null };
    const pref = droppingResistance > 0 ? nearestPreferred(droppingResistance, "E12") : 0;

    const warnings: Warning[] = highVoltageWarning(vLine, t.vMax, input.pilotLamp?.voltage);
    if (vLine > 50) warnings.push({ level: "caution", message: LIVE_CHASSIS });
    const shunts = shuntsFor(t, warnings);
    if (excess < 0) warnings.push(shortfallWarning(stringVoltage, vLine));
    if (rating.warning) warnings.push(rating.warning);
    const lamp = input.pilotLamp
      ? pilotLampFigures(input.pilotLamp, t.tubes, { vLine, voltage: stringVoltage, current: stringCurrent, dropper: droppingResistance }, warnings)
      : null;
    warnings.push({ level: "info", message: COLD_SURGE });

    const outputs: HeaterStringOutputs = {
      stringVoltage,
      stringCurrent,
      currentsMatch,
      droppingResistance,
      dissipation,
      suggestedRating: rating.rating,
      nearestPreferred: pref,
      shunts,
      pilotLampVoltage: lamp ? lamp.v : null,
      pilotLampCurrent: lamp ? lamp.i : null,
      tapSectionCurrent: lamp ? lamp.sec : null,
      stringCurrentWithLamp: lamp ? lamp.string : null,
    };
    return { outputs, warnings };
  },
  explain: (input: HeaterStringInput, o: HeaterStringOutputs) => explainHeaterString(input, o),
});
