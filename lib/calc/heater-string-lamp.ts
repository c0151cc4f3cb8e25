import { formatQuantity } from "./format";
import { toPrecision } from "./precision";
import type { Warning } from "./types";

/**
 * A pilot lamp across the tapped section of a 35W4/35Z5-style rectifier heater, in a series string.
 *
 * Model (the linear estimate of the period's notes): every heater, the lamp and the section are taken at
 * their hot resistances, R = V/I at rating. The lamp in parallel with the section lowers that section's
 * resistance, so the string draws a little more, and the current through the pair splits by Ohm's law.
 * Where the rectifier's plate is fed from the tap (the usual wiring), its DC output also flows through the
 * pair and is added to the heater current there, as the magazine note on the 35Z5GT does ("Longer Life for
 * Dial Lamps": 150 mA heater + 50 mA rectified gives the lamp about 110 mA and the section 90 mA, which
 * this model reproduces). That DC comes in pulses, so its heating is somewhat more than its average shows.
 */

export interface LampInput {
  voltage: number;
  current: number;
  rectifierCurrent: number;
}

export interface TappedHeater {
  index: number;
  type: string;
  voltage: number;
  current: number;
  tapVoltage: number;
  tapFrom: string;
}

export interface LampModel {
  heater: TappedHeater;
  sectionResistance: number;
  lampResistance: number;
  parallelResistance: number;
  /** The string's resistance at rating, without and with the lamp (dropper included). */
  stringResistance: number;
  stringResistanceWithLamp: number;
  /** The rated string current (the highest heater current). */
  ratedCurrent: number;
  /** String current without the lamp (the rated one when a dropper is fitted) and with it. */
  currentWithout: number;
  currentWith: number;
  /** Heater current reaching the tapped heater (less than the string's when that heater is shunted). */
  heaterCurrent: number;
  lampVoltage: number;
  lampCurrent: number;
  sectionCurrent: number;
  /** Dropper that brings the string back to its rated current with the lamp fitted; null when none can. */
  resizedDropper: number | null;
}

/**
 * The lamp's effect on a string whose k-th heater is the tapped one. stringVoltage is ΣV, stringCurrent
 * the highest heater current (each lower-current heater shunted to it), dropper the resistor sized without the lamp.
 */
export function lampModel(h: TappedHeater, lamp: LampInput, lineVoltage: number, stringVoltage: number, stringCurrent: number, dropper: number): LampModel {
  const i = stringCurrent;
  const rSec = h.tapVoltage / h.current;
  const rRest = (h.voltage - h.tapVoltage) / h.current;
  const rLamp = lamp.voltage / lamp.current;
  const rPar = (rSec * rLamp) / (rSec + rLamp);
  const branch = rRest + rPar;
  // A heater rated below the string current has a shunt across its whole heater: R = V/(I − Ih).
  const shunted = h.current < i;
  const rShunt = shunted ? h.voltage / (i - h.current) : Infinity;
  const pairWith = shunted ? (branch * rShunt) / (branch + rShunt) : branch;
  const pairWithout = h.voltage / i;
  const stringResistance = stringVoltage / i + dropper;
  const stringResistanceWithLamp = stringResistance - pairWithout + pairWith;
  const currentWithout = lineVoltage / stringResistance;
  const currentWith = lineVoltage / stringResistanceWithLamp;
  const heaterCurrent = shunted ? (currentWith * rShunt) / (rShunt + branch) : currentWith;
  const lampVoltage = (heaterCurrent + lamp.rectifierCurrent) * rPar;
  const resized = lineVoltage / i - (stringVoltage - h.voltage) / i - pairWith;
  return {
    heater: h,
    sectionResistance: rSec,
    lampResistance: rLamp,
    parallelResistance: rPar,
    stringResistance,
    stringResistanceWithLamp,
    ratedCurrent: i,
    currentWithout,
    currentWith,
    heaterCurrent,
    lampVoltage,
    lampCurrent: lampVoltage / rLamp,
    sectionCurrent: lampVoltage / rSec,
    resizedDropper: dropper > 0 && resized > 0 ? resized : null,
  };
}

// A lamp above its rating by more than this burns out early (common practice); the 35Z5GT note's design point is about
// two-thirds of the lamp's current at half its light, so below 60 % it is dimmer than the makers intended.
const OVER = 1.05;
const UNDER = 0.6;

/** The cautions and notes a lamp model calls for. */
export function lampWarnings(m: LampModel, lamp: LampInput, warnings: Warning[]): void {
  const h = m.heater;
  const share = m.lampCurrent / lamp.current;
  const pct = toPrecision(share * 100, 2);
  const at = `${formatQuantity(m.lampCurrent, "A")} (${pct} % of its ${formatQuantity(lamp.current, "A")}), about ${formatQuantity(m.lampVoltage, "V")} across a ${formatQuantity(lamp.voltage, "V")} lamp`;
  const noDc = lamp.rectifierCurrent === 0;
  if (share > OVER) {
    warnings.push({
      level: "caution",
      message: `The pilot lamp would be over-run: ${at}. It will glow bright and burn out early. Use a lamp of higher current rating, or put a resistor across the lamp to take the excess.`,
    });
  } else if (share < UNDER) {
    warnings.push({
      level: "caution",
      message:
        `The pilot lamp would be under-run: ${at}, a dull glow at best.` +
        (noDc
          ? " No rectifier current was entered: where the plate is fed from the tap, its DC also flows through the lamp and brightens it."
          : " A lamp of lower current rating suits this tap better."),
    });
  }
  warnings.push({
    level: "info",
    message:
      `Pilot lamp across the ${formatQuantity(h.tapVoltage, "V")} section of the ${h.type}'s heater (tap ${h.tapFrom}): it carries ${at}; the section's own current falls to ${formatQuantity(m.sectionCurrent, "A")}, so that part of the heater runs cooler. ` +
      "Estimate: lamp and heaters at their hot resistances" +
      (noDc
        ? "."
        : ", and the rectifier's DC added to the heater current in the section (it flows in pulses, so it heats somewhat more than its average suggests)."),
  });
  // Parallel resistance only lowers the string's total, so the current can only rise.
  const change = m.currentWith / m.currentWithout - 1;
  if (change > 0.005) {
    const over = m.currentWith / m.ratedCurrent - 1;
    const fix = m.resizedDropper === null ? "" : ` A dropper of ${formatQuantity(m.resizedDropper, "Ω", 4)} instead brings it back to the rated current.`;
    warnings.push({
      level: over > 0.05 ? "caution" : "info",
      message:
        `The lamp lowers the string's resistance: the string draws ${formatQuantity(m.currentWith, "A")} instead of ${formatQuantity(m.currentWithout, "A")} (+${toPrecision(change * 100, 2)} %), so every other heater runs that much hotter` +
        (over > 0.005 ? `, ${toPrecision(over * 100, 2)} % above the rated string current.` : ".") +
        fix,
    });
  }
  if (!noDc) {
    warnings.push({
      level: "caution",
      message: `If the pilot lamp opens, the tapped section carries the heater current and the rectifier's DC alone, about ${formatQuantity(m.heaterCurrent + lamp.rectifierCurrent, "A")} against its ${formatQuantity(h.current, "A")} rating: it overheats and the rectifier fails early. Replace a dead pilot lamp promptly (the 35W4 Q&A in the sources says the same).`,
    });
  }
}
