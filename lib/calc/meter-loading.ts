import { z } from "zod";
import { formatQuantity, texQuantity, tex } from "./format";
import { highVoltageWarning } from "./safety";
import { defineCalculator, type Step, type Warning } from "./types";
import { optionalQuantity, parseQuantity, quantity } from "./units";

/**
 * What a voltmeter reads across a point with source resistance Rs: the meter's resistance Rm
 * (ohms-per-volt sensitivity × range, or a VTVM's input resistance) and Rs form a voltage divider,
 * V_ind = V·Rm/(Rm + Rs), so the reading is low by Rs/(Rm + Rs)
 * (ARRL Handbook, test equipment chapter: voltmeter sensitivity and loading; Terman, Radio Engineers'
 * Handbook, section on measurements). The point is taken as a Thévenin source: its open-circuit
 * voltage and the resistance seen into it.
 */

/** "20k", "20 kΩ/V", "20000 ohms per volt": a sensitivity is read like a resistance once its "per volt" is dropped. */
const PER_VOLT = /\s*(?:[ΩΩ]|ohms?)?\s*(?:\/|per)\s*(?:V|volts?)$/i;
const ohmsPerVoltField = z
  .unknown()
  .transform((raw, ctx): number | undefined => {
    if (raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "")) return undefined;
    const parsed = parseQuantity(typeof raw === "string" ? raw.trim().replace(PER_VOLT, "") : raw, "resistance");
    if (!parsed.ok || !(parsed.value >= 1 && parsed.value <= 1e7)) {
      ctx.addIssue({ code: "custom", message: "Ohms per volt must be a sensitivity between 1 and 10 M (as on the dial: 1000, 20k, 20 kΩ/V)" });
      return z.NEVER;
    }
    return parsed.value;
  })
  .optional();

export const meterLoadingSchema = z
  .object({
    trueVoltage: quantity("voltage", { min: -1e5, max: 1e5, label: "True voltage" }),
    sourceResistance: quantity("resistance", { nonNegative: true, max: 1e12, label: "Source resistance" }),
    ohmsPerVolt: ohmsPerVoltField,
    range: optionalQuantity("voltage", { positive: true, min: 1e-3, max: 1e5, label: "Range" }),
    inputResistance: optionalQuantity("resistance", { positive: true, min: 1, max: 1e15, label: "Input resistance" }),
  })
  .superRefine((v, ctx) => {
    if (v.trueVoltage === 0)
      ctx.addIssue({ code: "custom", path: ["trueVoltage"], message: "True voltage must not be zero: a meter reads 0 V across 0 V whatever its resistance" });
    const bySensitivity = v.ohmsPerVolt !== undefined || v.range !== undefined;
    if (v.inputResistance !== undefined) {
      if (bySensitivity) {
        ctx.addIssue({
          code: "custom",
          path: ["inputResistance"],
          message: "Input resistance: give either the input resistance or ohms per volt with a range, not both",
        });
      }
      return;
    }
    if (!bySensitivity) {
      ctx.addIssue({ code: "custom", path: ["ohmsPerVolt"], message: "Ohms per volt is required with a range, or give the meter's input resistance instead" });
    } else if (v.ohmsPerVolt === undefined) {
      ctx.addIssue({ code: "custom", path: ["ohmsPerVolt"], message: "Ohms per volt is required with a range (the sensitivity printed on the meter's dial)" });
    } else if (v.range === undefined) {
      ctx.addIssue({ code: "custom", path: ["range"], message: "Range is required with ohms per volt: the full-scale voltage of the range in use" });
    }
  });

export type MeterLoadingInput = z.output<typeof meterLoadingSchema>;

const SERVICE_DATA: Warning = {
  level: "info",
  message:
    "Service data usually say which meter their voltages were taken with (a 1000 Ω/V or 20 000 Ω/V meter, or a VTVM): " +
    "those figures already include that meter's loading. Compare like with like before calling a reading low (common practice).",
};
const DC_ONLY: Warning = {
  level: "info",
  message: "The ohms-per-volt figure is the meter's DC sensitivity; most meters load a circuit more heavily on their AC ranges (see the dial).",
};

export const calculator = defineCalculator({
  slug: "meter-loading",
  title: "Meter loading",
  purpose: "What a voltmeter will read across a high-resistance point, and how far below the true voltage.",
  bench: {
    group: "parts",
    example: { trueVoltage: "100 V", sourceResistance: "1M", ohmsPerVolt: "20k", range: "250 V" },
    headlines: ["indicatedVoltage", "error"],
    alwaysDanger: false,
    chart: null,
    format: { error: "signed-percent" },
  },
  inputs: [
    {
      name: "trueVoltage",
      label: "True voltage",
      unit: "V",
      required: true,
      control: "quantity",
      quantity: "voltage",
      help: "The voltage with no meter connected (negative for bias or AVC).",
    },
    {
      name: "sourceResistance",
      label: "Source resistance",
      unit: "Ω",
      required: true,
      control: "quantity",
      quantity: "resistance",
      help: "The resistance looking into the point: a plate's load resistor in parallel with the tube's plate resistance, a screen's dropping resistor, a grid or AVC resistor.",
    },
    {
      name: "ohmsPerVolt",
      label: "Meter sensitivity",
      unit: "Ω/V",
      required: false,
      control: "quantity",
      quantity: "ratio",
      help: "Ohms per volt, from the dial (1000, 20 000 …). With the range below.",
    },
    {
      name: "range",
      label: "Range in use",
      unit: "V",
      required: false,
      control: "quantity",
      quantity: "voltage",
      help: "Full-scale voltage of the range the meter is set to.",
    },
    {
      name: "inputResistance",
      label: "Or the meter's input resistance",
      unit: "Ω",
      required: false,
      control: "quantity",
      quantity: "resistance",
      help: "For a VTVM or digital meter, which has the same resistance on every range (often 11 MΩ or 10 MΩ).",
    },
  ],
  outputs: [
    { name: "meterResistance", label: "Meter resistance", unit: "Ω" },
    { name: "indicatedVoltage", label: "What the meter reads", unit: "V" },
    { name: "error", label: "Reading error (fraction of the true voltage)", unit: "" },
  ],
  schema: meterLoadingSchema,
  formulas: [
    { label: "Meter resistance", latex: tex`R_m = S \times V_\text{range} \quad\text{or}\quad R_m = R_\text{in}` },
    { label: "Reading (voltage divider)", latex: tex`V_\text{ind} = V\,\frac{R_m}{R_m + R_s}` },
    { label: "Error", latex: tex`\varepsilon = \frac{V_\text{ind} - V}{V} = -\frac{R_s}{R_m + R_s}` },
  ],
  references: [
    {
      title: "The ARRL Handbook for Radio Communications",
      detail: "Test equipment chapter: voltmeter sensitivity in ohms per volt and circuit loading (from memory)",
    },
    {
      title: "F. E. Terman, Radio Engineers' Handbook",
      detail: "Measurements section: voltmeter resistance and the error it causes in high-resistance circuits (from memory)",
    },
  ],
  whyItMatters:
    "A meter draws current from the point it measures. Across a stiff B+ line that costs nothing, but across a plate fed " +
    "through a large resistor, a screen, or an AVC line it drags the voltage down while you read it: a 20 000 Ω/V meter on its " +
    "250 V range is 5 MΩ, and through 1 MΩ of source resistance it shows 83 V where the service data say 100 V. The set is " +
    "fine; the meter is part of the circuit. Knowing the loading keeps you from chasing a fault that is not there.",
  compute(input: MeterLoadingInput) {
    const { trueVoltage: v, sourceResistance: rs, ohmsPerVolt, range, inputResistance } = input;
    const meterResistance = inputResistance ?? ohmsPerVolt! * range!;
    const total = meterResistance + rs;
    const indicatedVoltage = (v * meterResistance) / total;
    const error = -rs / total;
    const warnings: Warning[] = highVoltageWarning(v);
    if (error <= -0.01) {
      warnings.push({
        level: "info",
        message: `The meter reads ${(-100 * error).toPrecision(2)} % low here because it draws current through the source resistance. A meter of higher resistance (a higher range, or a VTVM) reads closer.`,
      });
    }
    if (range !== undefined) {
      const reading = Math.abs(indicatedVoltage);
      if (reading > range) {
        warnings.push({
          level: "caution",
          message: `The reading, ${formatQuantity(reading, "V")}, is beyond the ${formatQuantity(range, "V")} range: the needle pins. Start on the highest range and switch down; each range changes the meter's resistance.`,
        });
      } else if (reading < 0.1 * range) {
        warnings.push({
          level: "info",
          message:
            "The reading falls in the bottom tenth of the scale, where a moving-coil meter's accuracy (a percentage of full scale) is poorest; a lower range reads better, at a lower meter resistance.",
        });
      }
      warnings.push(DC_ONLY);
    }
    warnings.push(SERVICE_DATA);
    return { outputs: { meterResistance, indicatedVoltage, error }, warnings };
  },
  explain(input: MeterLoadingInput, o) {
    const { trueVoltage: v, sourceResistance: rs, ohmsPerVolt, range, inputResistance } = input;
    const rm = texQuantity(o.meterResistance, "Ω", 4);
    const steps: Step[] = [
      inputResistance !== undefined
        ? { label: "Meter resistance (as given)", latex: tex`R_m = ${rm}` }
        : {
            label: "Meter resistance",
            latex: tex`R_m = S \times V_\text{range} = ${texQuantity(ohmsPerVolt!, "Ω/V", 4)} \times ${texQuantity(range!, "V", 4)} = ${rm}`,
          },
      {
        label: "Reading: the meter and the source resistance form a voltage divider",
        latex: tex`V_\text{ind} = ${texQuantity(v, "V", 4)} \times \frac{${rm}}{${rm} + ${texQuantity(rs, "Ω", 4)}} = ${texQuantity(o.indicatedVoltage, "V", 4)}`,
      },
      {
        label: "Error",
        latex: tex`\varepsilon = -\frac{${texQuantity(rs, "Ω", 4)}}{${rm} + ${texQuantity(rs, "Ω", 4)}} = ${texQuantity(100 * o.error, "%", 3)}`,
      },
    ];
    return steps;
  },
});
