import { z } from "zod";
import { texQuantity, tex } from "./format";
import { HAZARD_VOLTS, highVoltageWarning } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, quantityWithDefault, quantity } from "./units";
import { COLD_FRACTION, lampCircuitCurrent } from "./series-lamp-circuit";

/**
 * Series lamp (the "dim-bulb tester"): an incandescent lamp in series with a set on first power-up.
 * Hot resistance R = V²/P (Ohm's law with P = V·I). A tungsten filament's cold resistance is about a
 * tenth of its hot one (common practice; tungsten's resistivity rises roughly tenfold from room
 * temperature to ~2800 K). Between those ends the lamp's current rises about as the square root of
 * its voltage (lamp makers' characteristic equations give P ∝ V^1.54–1.58, I ∝ V^0.54–0.58, from
 * memory); we take exactly ½, so R_lamp(I) = max(R_cold, R_hot·I/I_rated), which has a closed form.
 */

export { COLD_FRACTION };

export const seriesLampSchema = z.object({
  lineVoltage: quantityWithDefault("voltage", 120, { positive: true, min: 1, max: 500, label: "Line voltage" }),
  lampPower: quantity("power", { positive: true, min: 0.1, max: 2000, label: "Lamp power" }),
  setPower: optionalQuantity("power", { positive: true, min: 0.01, max: 10_000, label: "Set power" }),
});

export type SeriesLampInput = z.output<typeof seriesLampSchema>;

const NOT_VOLTAGE =
  "A series lamp limits current, not voltage. The set stays connected to the mains: its chassis and circuits are " +
  "still at lethal voltage, and when the set draws little the lamp drops almost nothing. It is no isolation transformer.";

const COLD_SURGE: Warning = {
  level: "info",
  message:
    "Cold, the lamp lets through about ten times its running current for the first fraction of a second (the surge step shows it). " +
    "A lamp that stays bright means the set draws too much: switch off and look for the fault (common practice).",
};

export const calculator = defineCalculator({
  slug: "series-lamp",
  title: "Series lamp",
  purpose: "What an incandescent lamp in series with a set lets through on first power-up, and what the set sees.",
  bench: {
    group: "first-power",
    example: { lineVoltage: "120 V", lampPower: "60 W", setPower: "35 W" },
    headlines: ["maxCurrent", "setVoltage"],
    alwaysDanger: false,
    chart: "lamp-current",
  },
  inputs: [
    {
      name: "lineVoltage",
      label: "Line voltage",
      unit: "V",
      required: false,
      default: 120,
      control: "quantity",
      quantity: "voltage",
      help: "The mains voltage (rms); the lamp is taken as rated for it.",
    },
    {
      name: "lampPower",
      label: "Lamp wattage",
      unit: "W",
      required: true,
      control: "quantity",
      quantity: "power",
      help: "The wattage printed on the lamp, at the line voltage.",
    },
    {
      name: "setPower",
      label: "Set's rated power",
      unit: "W",
      required: false,
      control: "quantity",
      quantity: "power",
      help: "Optional: the set's consumption from its label or service data, for an estimate of what it sees.",
    },
  ],
  outputs: [
    { name: "lampHotResistance", label: "Lamp resistance, hot", unit: "Ω" },
    { name: "lampColdResistance", label: "Lamp resistance, cold (about a tenth)", unit: "Ω" },
    { name: "maxCurrent", label: "Most current with a dead short in the set", unit: "A" },
    { name: "setCurrent", label: "Set current (estimate)", unit: "A" },
    { name: "setVoltage", label: "Voltage the set sees (estimate)", unit: "V" },
  ],
  schema: seriesLampSchema,
  formulas: [
    { label: "Lamp resistance, hot", latex: tex`R_{hot} = \frac{V^2}{P_{lamp}}` },
    { label: "Lamp resistance, cold (tungsten)", latex: tex`R_{cold} \approx \frac{R_{hot}}{10}` },
    { label: "Most current (lamp alone across the line)", latex: tex`I_{max} = \frac{V}{R_{hot}} = \frac{P_{lamp}}{V}` },
    { label: "Set as a fixed resistance", latex: tex`R_{set} = \frac{V^2}{P_{set}}` },
    {
      label: "Lamp between cold and hot",
      latex: tex`R_{lamp}(I) = \max\!\left(R_{cold},\; R_{hot}\,\frac{I}{I_{max}}\right), \quad I\,(R_{lamp}(I) + R_{set}) = V`,
    },
  ],
  references: [
    { title: "The ARRL Handbook for Radio Communications", detail: "Electrical fundamentals chapter: Ohm's law and power, P = V²/R" },
    {
      title: "Tungsten filament lamps: resistance and characteristic equations",
      detail:
        "Cold resistance about a tenth of hot (common practice); current ∝ V^0.54–0.58 from the lamp makers' characteristic equations (from memory), taken here as √V",
    },
    { title: "Restorers' bench practice", detail: "The series lamp (dim-bulb tester) for first power-up of an old set (common practice)" },
  ],
  whyItMatters:
    "A lamp in series with the mains lead is the cheapest current limiter on the bench. A healthy set warms the " +
    "lamp briefly and lets it dim; a shorted capacitor or rectifier keeps it bright, and the lamp — not the " +
    "transformer — takes the fault. Pick a lamp near the set's own wattage: too small and the set starves, too " +
    "large and a fault gets nearly full current before the lamp glows.",
  compute(input: SeriesLampInput) {
    const { lineVoltage: v, lampPower: p, setPower: ps } = input;
    const rHot = (v * v) / p;
    const maxCurrent = p / v;
    let setCurrent: number | null = null;
    let setVoltage: number | null = null;
    const warnings: Warning[] = highVoltageWarning(v);
    if (v > HAZARD_VOLTS) warnings.push({ level: "caution", message: NOT_VOLTAGE });
    if (ps !== undefined) {
      const rSet = (v * v) / ps;
      setCurrent = lampCircuitCurrent(v, rHot, maxCurrent, rSet);
      setVoltage = setCurrent * rSet;
      warnings.push({
        level: "info",
        message:
          "The set is taken as a fixed resistance drawing its rated power at full line voltage, and the lamp as tungsten " +
          "between its cold and hot resistance: an estimate. Cold heaters, a rectifier and a reservoir capacitor make the real set draw unevenly; measure it.",
      });
      if (setVoltage < 0.7 * v) {
        warnings.push({
          level: "info",
          message:
            `With this lamp the set sees only about ${Math.round((100 * setVoltage) / v)}% of the line, so it may not start properly. ` +
            "A lamp near or a little above the set's wattage is the usual choice (common practice).",
        });
      }
      if (p > 4 * ps) {
        warnings.push({
          level: "info",
          message:
            "The lamp is far larger than the set: a fault would draw close to the lamp's full current before it glowed, so it limits little. A smaller lamp limits more.",
        });
      }
    }
    warnings.push(COLD_SURGE);
    return {
      outputs: { lampHotResistance: rHot, lampColdResistance: rHot * COLD_FRACTION, maxCurrent, setCurrent, setVoltage },
      warnings,
    };
  },
  explain(input: SeriesLampInput, o) {
    const { lineVoltage: v, lampPower: p, setPower: ps } = input;
    const { lampHotResistance: rHot, lampColdResistance: rCold, maxCurrent, setCurrent, setVoltage } = o;
    const steps: Step[] = [
      {
        label: "Lamp resistance, hot",
        latex: tex`R_{hot} = \frac{V^2}{P_{lamp}} = \frac{(${texQuantity(v, "V")})^2}{${texQuantity(p, "W")}} = ${texQuantity(rHot, "Ω")}`,
      },
      {
        label: "Lamp resistance, cold (tungsten, about a tenth)",
        latex: tex`R_{cold} \approx \frac{${texQuantity(rHot, "Ω")}}{10} = ${texQuantity(rCold, "Ω")}`,
      },
      {
        label: "Most current: a dead short in the set, lamp hot",
        latex: tex`I_{max} = \frac{P_{lamp}}{V} = \frac{${texQuantity(p, "W")}}{${texQuantity(v, "V")}} = ${texQuantity(maxCurrent, "A")}`,
      },
      {
        label: "Surge while the lamp is cold",
        latex: tex`\frac{V}{R_{cold}} = \frac{${texQuantity(v, "V")}}{${texQuantity(rCold, "Ω")}} = ${texQuantity(v / rCold, "A")}`,
      },
    ];
    if (ps !== undefined && setCurrent !== null && setVoltage !== null) {
      const rSet = (v * v) / ps;
      const rLamp = (v - setVoltage) / setCurrent;
      steps.push(
        {
          label: "Set as a fixed resistance",
          latex: tex`R_{set} = \frac{V^2}{P_{set}} = \frac{(${texQuantity(v, "V")})^2}{${texQuantity(ps, "W")}} = ${texQuantity(rSet, "Ω")}`,
        },
        {
          label: "Current through lamp and set (estimate)",
          latex: tex`I = \frac{V}{R_{lamp} + R_{set}} = \frac{${texQuantity(v, "V")}}{${texQuantity(rLamp, "Ω")} + ${texQuantity(rSet, "Ω")}} = ${texQuantity(setCurrent, "A")}`,
        },
        {
          label: "Voltage the set sees (estimate)",
          latex: tex`V_{set} = I\,R_{set} = ${texQuantity(setCurrent, "A")} \times ${texQuantity(rSet, "Ω")} = ${texQuantity(setVoltage, "V")}`,
        },
      );
    }
    return steps;
  },
});
