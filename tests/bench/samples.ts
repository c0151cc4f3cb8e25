import type { Slug } from "../../lib/calc/registry";

/**
 * One typical input per calculator for the micro-benchmark, keyed by slug, with the input
 * names of docs/PRODUCT.md. Values are the kind a bench would enter, written as the form sends
 * them (engineering text where a person would type it), so validation does real parsing.
 */
const bySlug = {
  "cathode-bias": {
    biasVoltage: "1.5 V",
    plateCurrent: "1 mA",
    screenCurrent: 0,
    bypassCapacitance: "25 uF",
    amplificationFactor: 100,
    plateResistance: "62.5k",
    plateLoad: "100k",
  },
  "time-constant": { resistance: "220k", capacitance: "47 uF", initialVoltage: "350 V", targetVoltage: "30 V", elapsed: "10 s" },
  bleeder: { capacitance: "40 uF", workingVoltage: "450 V", safeVoltage: 60, maxTime: 5, tolerance: 0.05 },
  "series-lamp": { lineVoltage: "120 V", lampPower: "60 W", setPower: "35 W" },
  fuse: { loadPower: "85 W", lineVoltage: "120 V", powerFactor: 0.9, kind: "time-lag" },
  "supply-ripple": {
    loadCurrent: "80 mA",
    capacitance: "40 uF",
    lineFrequency: 60,
    rectifier: "full-wave",
    stages: [
      { kind: "lc", inductance: "10 H", capacitance: "40 uF" },
      { kind: "rc", resistance: "4.7k", capacitance: "20 uF" },
    ],
  },
  "b-plus": {
    secondaryVoltage: "350 V",
    rectifier: "full-wave",
    rectifierTube: "5Y3GT",
    loadCurrent: "90 mA",
    capacitance: "20 uF",
    lineFrequency: 60,
    windingResistance: "120",
  },
  "dropping-resistor": { supplyVoltage: "300 V", loadVoltage: "250 V", loadCurrent: "10 mA" },
  "coupling-cap": { capacitance: "0.05 uF", gridResistance: "470k", sourceResistance: "47k", leakageCurrent: "2 uA", maxGridResistance: "500k" },
  "plate-dissipation": {
    plateVoltage: "250 V",
    cathodeVoltage: "7.2 V",
    plateCurrent: "48 mA",
    tube: "EL84",
    screenVoltage: "250 V",
    screenCurrent: "5.5 mA",
    stageClass: "A",
  },
  "output-transformer": { primaryImpedance: "5k", secondaryImpedance: "8 ohm", newLoad: "4 ohm" },
  "vr-tube": { supplyVoltage: "250 V", tube: "0A2", loadCurrentMin: "5 mA", loadCurrentMax: "20 mA" },
  "heater-string": { lineVoltage: "120 V", tubes: ["12BE6", "12BA6", "12AV6", "50C5", "35W4"] },
  "arc-clearance": { peakVoltage: "15 kV", gap: "5 mm", pressure: 101325, temperature: 293.15, safetyFactor: 2 },
  "resistor-drift": { nominal: "100k", measured: "128k", tolerance: 0.2 },
  "meter-loading": { trueVoltage: "100 V", sourceResistance: "1M", ohmsPerVolt: "20k", range: "250 V" },
  reforming: { capacitance: "40 uF", ratedVoltage: "450 V", seriesResistance: "10k", leakageFactor: 0.01, leakageFloor: "3 uA" },
  "ohms-law": { voltage: "250 V", resistance: "100k" },
  reactance: { frequency: "1 kHz", capacitance: "100 nF", inductance: "10 mH" },
  superhet: { signalFrequency: "1000 kHz", intermediateFrequency: "455 kHz", oscillatorAbove: true, loadedQ: "100" },
  "triode-stage": { tube: "12AX7", supplyVoltage: "250 V", plateResistor: "100k", cathodeResistor: "1.5k", cathodeBypassed: true, loadResistance: "470k" },
  "colour-code": { bands: ["yellow", "violet", "red", "gold"] },
  "vintage-markings": { scheme: "body-end-dot", body: "brown", end: "black", dot: "orange", toleranceEnd: "silver" },
  "preferred-value": { value: "5.13k", series: "E12" },
  "series-parallel": { target: "5.13k", series: "E12", mode: "either" },
} satisfies Record<Slug, Record<string, unknown>>;

/** Keyed by every `Slug` (a calculator without a sample fails to compile), read by any slug string. */
export const samples: Readonly<Record<string, Record<string, unknown>>> = bySlug;

/** Slugs that are closed-form (no iteration), measured against the closed-form targets. */
export const ITERATIVE_SLUGS: readonly string[] = ["triode-stage"];
