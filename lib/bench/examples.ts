/**
 * A worked bench case per calculator, filled in when a page opens without inputs in its URL, so
 * a newcomer sees an answer, its working and its picture straight away. Written as a person types them.
 */
export const EXAMPLES: Record<string, Record<string, unknown>> = {
  "cathode-bias": { biasVoltage: "1.5 V", plateCurrent: "1 mA", bypassCapacitance: "25 uF" },
  "triode-stage": { tube: "12AX7", supplyVoltage: "250 V", plateResistor: "100k", cathodeResistor: "1.5k", cathodeBypassed: true, loadResistance: "470k" },
  superhet: { signalFrequency: "1000 kHz", intermediateFrequency: "455 kHz", loadedQ: "100" },
  "dropping-resistor": { supplyVoltage: "300 V", loadVoltage: "250 V", loadCurrent: "10 mA" },
  "coupling-cap": { capacitance: ".05 mfd", gridResistance: "470k", sourceResistance: "47k", leakageCurrent: "2 uA" },
  "plate-dissipation": { plateVoltage: "250 V", cathodeVoltage: "12.5 V", plateCurrent: "45 mA", tube: "6V6GT", stageClass: "A" },
  "output-transformer": { primaryImpedance: "5k", secondaryImpedance: "8 ohm", newLoad: "4 ohm" },
  "heater-string": { lineVoltage: "120 V", tubes: ["12BE6", "12BA6", "12AV6", "35C5", "35W4"] },
  "supply-ripple": {
    loadCurrent: "60 mA",
    capacitance: "40 uF",
    rectifier: "full-wave",
    // A 5Y3GT with the 40 µF a recap often fits: the page shows the data sheet's 20 µF limit straight away.
    rectifierTube: "5Y3GT",
    stages: [{ kind: "rc", resistance: "470", capacitance: "20 uF" }],
  },
  "b-plus": { secondaryVoltage: "350 V", rectifier: "full-wave", rectifierTube: "5Y3GT", loadCurrent: "90 mA", capacitance: "20 uF" },
  "vr-tube": { supplyVoltage: "250 V", tube: "0A2", loadCurrentMax: "20 mA" },
  "time-constant": { resistance: "220k", capacitance: "47 uF", initialVoltage: "350 V", targetVoltage: "30 V" },
  bleeder: { capacitance: "40 uF", workingVoltage: "450 V" },
  "series-lamp": { lineVoltage: "120 V", lampPower: "60 W", setPower: "35 W" },
  fuse: { loadPower: "85 W", lineVoltage: "120 V", kind: "time-lag" },
  "arc-clearance": { peakVoltage: "15 kV", gap: "5 mm" },
  "resistor-drift": { nominal: "100k", measured: "128k" },
  "meter-loading": { trueVoltage: "100 V", sourceResistance: "1M", ohmsPerVolt: "20k", range: "250 V" },
  reforming: { capacitance: "40 uF", ratedVoltage: "450 V", seriesResistance: "10k" },
  "preferred-value": { value: "5.13k" },
  "series-parallel": { target: "5.13k", series: "E12", mode: "either" },
  "colour-code": { bands: ["yellow", "violet", "red", "gold"] },
  "vintage-markings": { scheme: "body-end-dot", body: "brown", end: "black", dot: "orange" },
  "ohms-law": { voltage: "250 V", resistance: "100k" },
  reactance: { frequency: "1 kHz", capacitance: "100 nF", inductance: "10 mH" },
};

/** The outputs shown large at the top of the result; the rest follow in a list. */
export const HEADLINES: Record<string, readonly string[]> = {
  "cathode-bias": ["cathodeResistance", "suggestedRating"],
  "triode-stage": ["plateVoltage", "gain"],
  superhet: ["oscillatorFrequency", "imageFrequency"],
  "dropping-resistor": ["resistance", "suggestedRating"],
  "coupling-cap": ["cornerFrequency", "gridShift"],
  "plate-dissipation": ["dissipation", "fractionOfMax"],
  "output-transformer": ["turnsRatio", "reflectedImpedance"],
  "heater-string": ["droppingResistance", "suggestedRating"],
  "supply-ripple": ["rippleRms", "finalRippleRms"],
  "b-plus": ["dcOutput", "ripplePeakToPeak"],
  "vr-tube": ["seriesResistance", "tubeCurrentAtMinLoad"],
  "time-constant": ["timeConstant", "timeToTarget"],
  // The rating that allows for the voltage as well as the power (a chain's cautions follow in the notes).
  bleeder: ["suggestedResistance", "resistorRating"],
  "series-lamp": ["maxCurrent", "setVoltage"],
  fuse: ["suggestedRating", "runningCurrent"],
  "arc-clearance": ["recommendedClearance", "standardClearance"],
  "resistor-drift": ["verdict", "deviation"],
  "meter-loading": ["indicatedVoltage", "error"],
  reforming: ["leakageLimit", "resistorPower"],
  "preferred-value": ["nearest", "errorOfNearest"],
  "series-parallel": ["combined", "error"],
  "colour-code": ["resistance", "tolerance"],
  "vintage-markings": ["resistance", "tolerance"],
  "ohms-law": ["current", "power"],
  reactance: ["capacitiveReactance", "resonantFrequency"],
};
