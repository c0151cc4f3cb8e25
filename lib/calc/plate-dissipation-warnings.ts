import { formatQuantity } from "./format";
import type { PlateDissipationInput } from "./plate-dissipation-schema";
import { RECEIVING_TUBES, type ReceivingTube } from "./tables/tubes";
import type { Warning } from "./types";

/** The plate-dissipation calculator's advice: against the rating and the class AB margin, each tube's notes. */

/** Idle fraction of the maximum above which a class AB (or unstated) stage gets a caution: common practice. */
export const AB_IDLE_MARGIN = 0.7;

/** Each tube's fixed notes, made once: compute only picks them up. */
function tubeNotes(tube: ReceivingTube): { always: Warning[]; fromTable: Warning } {
  const always: Warning[] = [];
  if (tube.sections === 2)
    always.push({
      level: "info",
      message: `The ${tube.type}'s rating is per section: work out each section on its own. The data sheet also limits both together.`,
    });
  if (tube.maxPeakPulseVoltage !== undefined) {
    always.push({
      level: "info",
      message: `In a television's horizontal output the ${tube.type}'s plate sees flyback pulses up to ${formatQuantity(tube.maxPeakPulseVoltage, "V")}; the DC figures here give the average dissipation only.`,
    });
  }
  const fromTable: Warning = {
    level: "info",
    message: `The ${tube.type}'s maximum is from the built-in table, recalled from memory of its data sheet; suffixes and makers differ, so check the sheet of the tube in the set.`,
  };
  return { always, fromTable };
}
const NOTES = new Map(RECEIVING_TUBES.map((t) => [t.type, tubeNotes(t)]));

const percent = (x: number) => `${Math.round(1000 * x) / 10} %`;

// Fixed wording (the fraction itself is an output), so the common cases format nothing.
const ABOVE_AB_MARGIN: Warning = {
  level: "caution",
  message:
    `Above ${AB_IDLE_MARGIN * 100} % of the data-sheet maximum, the most a push-pull class AB stage commonly idles at (common practice), leaving room for signal and a high line. ` +
    "A single-ended class A stage is designed nearer the maximum: if that is this stage, choose class A.",
};
const CLASS_A_NEAR_MAX: Warning = {
  level: "info",
  message:
    `Above ${AB_IDLE_MARGIN * 100} % of the data-sheet maximum, and below it: a single-ended class A stage is designed near the maximum ` +
    "(the 6V6GT's own typical operation is about 94 %), with no signal swing to allow for. A line running high raises it further.",
};

const CATHODE_READING: Warning = {
  level: "info",
  message:
    "Use the plate current alone. A reading worked out from the cathode resistor's voltage also carries the screen current, and with it the " +
    "plate dissipation comes out too high. The figure is at idle (no signal); a class AB stage's dissipation changes with signal.",
};

export interface Dissipation {
  /** Plate to cathode, V. */
  vpk: number;
  dissipation: number;
  fractionOfMax: number;
  ratedDissipation: number;
  screenDissipation: number | null;
  screenFractionOfMax: number | null;
}

/** Appends the plate's and screen's cautions, the tube's own notes and the reading's caveat, in that order. */
export function dissipationWarnings(warnings: Warning[], input: PlateDissipationInput, tube: ReceivingTube | undefined, f: Dissipation): void {
  const { stageClass, maxDissipation } = input;
  const { vpk, dissipation, fractionOfMax, ratedDissipation, screenFractionOfMax } = f;
  if (fractionOfMax > 1) {
    warnings.push({
      level: "danger",
      message: `The plate dissipates ${formatQuantity(dissipation, "W")}, ${percent(fractionOfMax)} of the ${formatQuantity(ratedDissipation, "W")} data-sheet maximum: beyond its rating. Expect a red plate, gas and a short life, and a runaway that can take the output transformer or rectifier with it. Check the bias, the grid's coupling capacitor and the screen supply.`,
    });
  } else if (fractionOfMax > AB_IDLE_MARGIN && stageClass !== "A") {
    warnings.push(ABOVE_AB_MARGIN);
  } else if (fractionOfMax > AB_IDLE_MARGIN) {
    warnings.push(CLASS_A_NEAR_MAX);
  }
  if (tube?.maxPlateVoltage !== undefined && vpk > tube.maxPlateVoltage) {
    warnings.push({
      level: "caution",
      message: `${formatQuantity(vpk, "V")} plate to cathode is above the ${tube.type}'s ${formatQuantity(tube.maxPlateVoltage, "V")} maximum plate voltage (table, from memory of the data sheet).`,
    });
  }
  if (screenFractionOfMax !== null && screenFractionOfMax > 1) {
    warnings.push({
      level: "danger",
      message: `The screen dissipates ${formatQuantity(f.screenDissipation!, "W")}, ${percent(screenFractionOfMax)} of its maximum: beyond its rating; a screen grid this hot warps and glows.`,
    });
  }
  if (tube) {
    const notes = NOTES.get(tube.type)!;
    for (const w of notes.always) warnings.push(w);
    if (maxDissipation === undefined) warnings.push(notes.fromTable);
  }
  warnings.push(CATHODE_READING);
}
