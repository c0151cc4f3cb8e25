import { formatQuantity } from "./format";
import type { Warning } from "./types";

/** A tube's figures, from the built-in table or as typed; `notes` holds the table tubes' fixed wording, made once. */
export interface TubeFigures {
  name: string;
  vvr: number;
  iMin: number;
  iMax: number;
  vStrike: number | undefined;
  notes: TubeNotes | null;
}

/** What one compute found, for the wording below. */
export interface VrState {
  vs: number;
  ilMin: number;
  ilMax: number;
  /** Tube current at the least and greatest load, unclamped (negative: the tube has gone out). */
  atMin: number;
  atMax: number;
  /** True when the currents are those of a fitted resistor rather than the calculated one. */
  fitted: boolean;
  voltageBeforeStrike: number;
}

interface TubeNotes {
  range: string;
  strikes: Warning;
}

const CAPACITOR: Warning = {
  level: "info",
  message:
    "Keep any capacitor straight across a VR tube small (the tube manuals' application notes give about 0.1 µF, from memory): a large one " +
    "makes the glow strike and go out over and over (relaxation oscillation). Filter after a further resistor instead.",
};
const PARALLEL: Warning = {
  level: "info",
  message:
    "VR tubes are not paralleled for more current: the one that strikes first takes it all. Two in series give the sum of their voltages, " +
    "each within its own current range (common practice).",
};
const NO_STRIKE: Warning = {
  level: "info",
  message:
    "No striking voltage given. The supply must exceed it at switch-on, with the load connected; it is commonly 15–25 % above the regulated " +
    "voltage (common practice): read it from the tube's data sheet.",
};

const f = (x: number, u: string) => formatQuantity(x, u);

/** The wording that depends only on the tube: built once per table tube, so compute only picks it. */
export function tubeNotes(name: string, iMin: number, iMax: number, vStrike: number | undefined): TubeNotes {
  const strike = vStrike === undefined ? "its striking voltage" : `the ${f(vStrike, "V")}`;
  return {
    range: `the ${f(iMin, "A")} to ${f(iMax, "A")} of the ${name}'s data sheet`,
    strikes: {
      level: "info",
      message:
        `Striking: the supply, and what a full load leaves on the tube before it strikes (see the working), are both above ${strike} the ${name}'s data sheet gives. ` +
        "That is the sheet's figure for a tube in light; an old tube or a dark cabinet can need more.",
    },
  };
}

/** The tube's current range, the striking voltage and the usual notes, pushed onto `out` (one array, no copies). */
export function vrWarnings(out: Warning[], t: TubeFigures, s: VrState): void {
  const notes = t.notes ?? tubeNotes(t.name, t.iMin, t.iMax, t.vStrike);
  const resistor = s.fitted ? "With the fitted resistor" : "With this resistor";
  if (s.atMax < t.iMin * (1 - 1e-9)) {
    out.push({
      level: "caution",
      message:
        s.atMax <= 0
          ? `${resistor} the resistor cannot even feed the greatest load: the tube goes out and the regulated line sags below ${f(t.vvr, "V")}. Use a smaller resistor.`
          : `${resistor} the tube carries only ${f(s.atMax, "A")} at the greatest load, below ${notes.range}: it drops out of regulation (the glow may flicker or go out and the line sags). Use a smaller resistor.`,
    });
  }
  if (s.atMin > t.iMax * (1 + 1e-9)) {
    const swing = s.ilMax - s.ilMin;
    out.push({
      level: "caution",
      message:
        `${resistor} the tube carries ${f(s.atMin, "A")} at the least load, above ${notes.range}: the cathode wears fast and the tube can arc. ` +
        (swing > t.iMax - t.iMin
          ? `The load swings by ${f(swing, "A")}, more than the tube's ${f(t.iMax - t.iMin, "A")} range, so no single resistor keeps it inside both limits: add a bleeder so the load never falls so low, or use a series-pass regulator.`
          : "Use a larger resistor, as long as the greatest load still leaves the tube its minimum."),
    });
  }
  if (t.vStrike === undefined) out.push(NO_STRIKE);
  else if (s.vs < t.vStrike) {
    out.push({
      level: "caution",
      message: `The supply, ${f(s.vs, "V")}, is below the ${f(t.vStrike, "V")} the data sheet asks for the ${t.name} to strike: it may never light, and the "regulated" line then just follows the resistor and load.`,
    });
  } else if (s.voltageBeforeStrike < t.vStrike) {
    // Info, not caution: a load of tubes still warming up draws next to nothing at switch-on, so most sets strike anyway.
    out.push({
      level: "info",
      message:
        `Striking: the supply is above the ${f(t.vStrike, "V")} in the data sheet, but a load already drawing its full current at switch-on ` +
        `(taken as a resistance) leaves the tube only ${f(s.voltageBeforeStrike, "V")} before it strikes, and it may not light. ` +
        "A load of tubes still warming up draws little at first, so the tube usually strikes before it; with a load that draws at once, raise the supply or lower the resistor.",
    });
  } else out.push(notes.strikes);
  out.push(CAPACITOR, PARALLEL);
}
