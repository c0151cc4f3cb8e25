import { formatQuantity } from "./format";
import { DEFAULT_CHOKE_RESISTANCE, type LcStageResult, type StageResult } from "./ripple-stages";
import type { SupplyRippleInput } from "./supply-ripple-schema";
import { RECTIFIER_SOURCE, findRectifier } from "./tables/rectifiers";
import type { Warning } from "./types";

const CHOKE_MODEL: Warning = {
  level: "info",
  message:
    "Each choke is modelled as its inductance in series with its DC resistance; the load's own resistance, which damps a resonance further, is left out, so a resonant peak here errs on the high side. " +
    "A choke-input supply (choke straight after the rectifier, no reservoir capacitor) behaves differently and needs at least the critical inductance, " +
    "about R_load/1000 henries at 60 Hz full-wave (common practice); this calculator does not model it.",
};

const RESERVOIR_MODEL: Warning = {
  level: "info",
  message:
    "The reservoir estimate assumes the capacitor alone feeds the load for the whole ripple period, and ripple small beside the DC voltage; it errs on the high side.",
};

/** Cautions and notes of the supply-ripple calculator, pushed onto `warnings` (compute puts the danger warning first). */
export function rippleWarnings(input: SupplyRippleInput, fr: number, stages: readonly StageResult[], warnings: Warning[]): void {
  const stagesIn = input.stages ?? [];
  let assumed = "";
  let hasChoke = false;
  let upstream = input.loadCurrent;
  for (let k = 0; k < stages.length; k++) {
    const s = stagesIn[k];
    const out = stages[k];
    // Every later stage's current also flows through the stages before it.
    if (out.current > upstream * (1 + 1e-9)) {
      warnings.push({
        level: "caution",
        message:
          `Stage ${k + 1} is given ${formatQuantity(out.current, "A")}, more than the ${formatQuantity(upstream, "A")} through stage ${k} before it. ` +
          "A later stage's current also flows through every stage before it, so this cannot be; a stage left blank takes the whole load current.",
      });
    }
    upstream = out.current;
    if (s.kind !== "lc") continue;
    hasChoke = true;
    if (s.resistance === undefined) assumed += assumed ? `, ${k + 1}` : String(k + 1);
    const lc = out as LcStageResult;
    const f0 = lc.resonantFrequency;
    // Common practice: keep the LC resonance at a third of the ripple frequency or lower.
    if (f0 > fr / 3) {
      const where = f0 >= fr ? "above" : "near";
      const effect =
        lc.attenuation >= 1
          ? `multiplies the ripple by ${lc.attenuation.toPrecision(3)} instead of reducing it`
          : `passes ${lc.attenuation.toPrecision(2)} of the ripple, far less smoothing than a choke should give`;
      warnings.push({
        level: "caution",
        message:
          `Stage ${k + 1}: the choke and capacitor resonate at ${formatQuantity(f0, "Hz")}, ${where} the ${formatQuantity(fr, "Hz")} ripple frequency, so this stage ${effect}. ` +
          `At exact resonance only the choke's ${formatQuantity(lc.resistance, "Ω")} resistance holds the rise down, to Q = ${lc.q.toPrecision(3)} times. ` +
          "Common practice keeps the resonance at a third of the ripple frequency or lower; use a larger choke or capacitor.",
      });
    }
  }
  if (assumed) {
    warnings.push({
      level: "info",
      message:
        `Choke resistance not given for stage ${assumed}: ${DEFAULT_CHOKE_RESISTANCE} Ω assumed, typical of a receiver filter choke (they measure roughly 50–300 Ω, common practice). ` +
        "Measure yours across the choke's leads with the set off and the capacitors discharged; it sets the DC drop and how high a resonance can peak.",
    });
  }
  if (hasChoke) warnings.push(CHOKE_MODEL);
  if (input.rectifierTube) tubeWarnings(input, warnings);
  warnings.push(RESERVOIR_MODEL);
}

/** The row's source up to its first remark, brackets flattened, for quoting inside a sentence. */
const cite = (source: string) => source.split(";")[0].replace(/\s*\(([^)]*)\)/g, ", $1");

/** The chosen rectifier tube against its data sheet: reservoir size, current, and circuit. */
function tubeWarnings(input: SupplyRippleInput, out: Warning[]): void {
  const tube = input.rectifierTube ? findRectifier(input.rectifierTube) : undefined;
  if (!tube) return;
  const cMax = formatQuantity(tube.maxInputCapacitance, "F");
  const iMax = formatQuantity(tube.maxCurrent, "A");
  if (input.capacitance > tube.maxInputCapacitance * (1 + 1e-9)) {
    out.push({
      level: "caution",
      message:
        `The ${formatQuantity(input.capacitance, "F")} reservoir is larger than the ${cMax} the ${tube.type} data sheet allows as the filter-input capacitor (${cite(tube.source)}). ` +
        `A larger one draws bigger charging pulses through the tube every cycle and a heavy surge at switch-on, which wears the cathode or makes the tube arc. ` +
        `Fit ${cMax} or less, or see the data sheet for the plate-supply resistance it asks for.`,
    });
  }
  if (input.loadCurrent > tube.maxCurrent * (1 + 1e-9)) {
    out.push({
      level: "caution",
      message: `The ${formatQuantity(input.loadCurrent, "A")} load is more than the ${iMax} DC output the ${tube.type} data sheet rates it for with a capacitor-input filter (${cite(tube.source)}).`,
    });
  }
  if (tube.circuit === "half-wave" && input.rectifier === "full-wave") {
    out.push({ level: "info", message: `The ${tube.type} is a half-wave rectifier: with one in the set, choose half-wave.` });
  }
  out.push({
    level: "info",
    message:
      `${tube.type}, from its data sheet: filter-input capacitor up to ${cMax}, DC output up to ${iMax}, about ${formatQuantity(tube.tubeDrop, "V")} across the tube at ${formatQuantity(tube.tubeDropCurrent, "A")}. ` +
      `${RECTIFIER_SOURCE}.`,
  });
}
