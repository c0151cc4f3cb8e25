import { formatQuantity, texQuantity, tex } from "./format";
import type { HeaterStringInput, HeaterStringOutputs } from "./heater-string-schema";
import { findTapped } from "./heater-string-notes";
import { lampModel } from "./heater-string-lamp";
import { findHeater } from "./tables/heaters";
import type { Step } from "./types";

/** The heaters as voltage and current, from the table when tubes are named. */
export function heaterList(input: HeaterStringInput): { voltage: number; current: number }[] {
  if (input.heaters && input.heaters.length > 0) return input.heaters;
  return (input.tubes ?? []).map((name) => findHeater(name)!);
}

const A = (x: number) => texQuantity(x, "A");
const V = (x: number) => texQuantity(x, "V");
const W = (x: number) => texQuantity(x, "W");
const OHM = (x: number) => texQuantity(x, "Ω", 4);

/** "2P ⇒ rating", or a note that no single standard part is large enough. */
function ratingTex(p: number, rating: number | null): string {
  return rating === null ? tex`2P = ${W(2 * p)} \text{ — above the largest standard rating}` : tex`2P = ${W(2 * p)} \;\Rightarrow\; ${W(rating)}`;
}

/** The working, step by step, in the order an apprentice would do it on paper. */
export function explainHeaterString(input: HeaterStringInput, o: HeaterStringOutputs): Step[] {
  const vLine = input.lineVoltage;
  const heaters = heaterList(input);
  const { stringVoltage: vs, stringCurrent: i, droppingResistance, dissipation } = o;
  const steps: Step[] = [
    {
      label: "String voltage: in series the heaters' voltages add up",
      latex: tex`V_{string} = ${heaters.map((h) => V(h.voltage)).join(" + ")} = ${texQuantity(vs, "V", 4)}`,
    },
  ];
  const distinct = [...new Set(heaters.map((h) => h.current))].sort((a, b) => b - a);
  if (distinct.length === 1) {
    steps.push({
      label: "String current: every heater is rated for the same current, and in series that one current flows through them all",
      latex: tex`I = ${A(i)}`,
    });
  } else {
    steps.push({
      label:
        "String current: in series one current flows through every heater, so it must be the largest any heater is rated for — " +
        "a lower current would starve that heater. Each heater rated for less gets a shunt resistor beside it to carry the rest.",
      latex: tex`I = \max(${distinct.map(A).join(",\\ ")}) = ${A(i)}`,
    });
  }
  for (const s of o.shunts) {
    const h = heaters[s.index];
    const who = `heater ${s.index + 1}${s.type ? ` (${s.type})` : ""}`;
    const rest = i - h.current;
    steps.push(
      {
        label: `Shunt across ${who}: the heater takes its rated ${formatQuantity(h.current, "A")}, so the shunt must carry the rest of the string current`,
        latex: tex`I_{sh} = I - I_h = ${A(i)} - ${A(h.current)} = ${A(rest)}`,
      },
      {
        label: `The shunt sits across the heater, so it has the heater's ${formatQuantity(h.voltage, "V")} across it; Ohm's law gives its value`,
        latex: tex`R_{sh} = \frac{V_h}{I_{sh}} = \frac{${V(h.voltage)}}{${A(rest)}} = ${OHM(s.resistance)}`,
      },
      { label: `Shunt dissipation (${who})`, latex: tex`P_{sh} = V_h\,I_{sh} = ${V(h.voltage)} \times ${A(rest)} = ${W(s.dissipation)}` },
      {
        label: "Shunt rating (at least twice its dissipation) and the nearest E12 value",
        latex: tex`${ratingTex(s.dissipation, s.suggestedRating)}, \quad R_\text{E12} = ${OHM(s.nearestPreferred)}`,
      },
      {
        label: "Check (Kirchhoff's current law): heater plus shunt make the string current",
        latex: tex`I_h + \frac{V_h}{R_{sh}} = ${A(h.current)} + ${A(h.voltage / s.resistance)} = ${A(i)}`,
      },
    );
  }
  if (vLine - vs > 0) {
    steps.push(
      {
        label: "Dropping resistor: it takes the line voltage the heaters do not use, at the string current",
        latex: tex`R = \frac{V_{line} - V_{string}}{I} = \frac{${V(vLine)} - ${V(vs)}}{${A(i)}} = ${OHM(droppingResistance)}`,
      },
      { label: "Dissipation", latex: tex`P = (V_{line} - V_{string})\,I = ${V(vLine - vs)} \times ${A(i)} = ${W(dissipation)}` },
      { label: "Suggested rating (at least twice the dissipation)", latex: ratingTex(dissipation, o.suggestedRating) },
      { label: "Nearest E12 value", latex: tex`R_\text{E12} = ${OHM(o.nearestPreferred)}` },
    );
    if (o.shunts.length) {
      const heat = heaters.reduce((s, h) => s + h.voltage * h.current, 0);
      const shunt = o.shunts.reduce((s, x) => s + x.dissipation, 0);
      steps.push({
        label: "Power check: what the line delivers goes into the heaters, the shunts and the dropper",
        latex: tex`V_{line} I = ${W(vLine * i)} = \underbrace{${W(heat)}}_{heaters} + \underbrace{${W(shunt)}}_{shunts} + \underbrace{${W(dissipation)}}_{dropper}`,
      });
    }
  } else {
    steps.push({
      label: "No dropping resistor: the heaters need all of the line, or more",
      latex: tex`V_{string} = ${texQuantity(vs, "V", 4)} \ge V_{line} = ${V(vLine)} \;\Rightarrow\; R = 0`,
    });
  }
  const lamp = input.pilotLamp;
  const tapped = lamp ? findTapped(input.heaters && input.heaters.length ? null : (input.tubes ?? null)) : null;
  if (lamp && tapped) {
    const m = lampModel(tapped, lamp, vLine, vs, i, droppingResistance);
    steps.push(
      {
        label: `Pilot lamp: the ${tapped.type}'s lamp section and the lamp, each at its hot resistance (V/I at rating)`,
        latex: tex`R_{sec} = \frac{${V(tapped.tapVoltage)}}{${A(tapped.current)}} = ${OHM(m.sectionResistance)}, \quad R_{lamp} = \frac{${V(lamp.voltage)}}{${A(lamp.current)}} = ${OHM(m.lampResistance)}`,
      },
      {
        label: "Side by side they share the current like any two resistors in parallel",
        latex: tex`R_{sec} \parallel R_{lamp} = \frac{R_{sec} R_{lamp}}{R_{sec} + R_{lamp}} = ${OHM(m.parallelResistance)}`,
      },
      {
        label: "That lowers the string's resistance, so the string draws a little more",
        latex: tex`I' = \frac{V_{line}}{R'_{string}} = \frac{${V(vLine)}}{${OHM(m.stringResistanceWithLamp)}} = ${A(m.currentWith)}`,
      },
      {
        label:
          lamp.rectifierCurrent > 0
            ? "Lamp voltage: heater current plus the rectifier's DC through the pair"
            : "Lamp voltage: the heater current through the pair",
        latex:
          lamp.rectifierCurrent > 0
            ? tex`V_{lamp} = (I_h + I_{dc})\,(R_{sec} \parallel R_{lamp}) = (${A(m.heaterCurrent)} + ${A(lamp.rectifierCurrent)}) \times ${OHM(m.parallelResistance)} = ${V(m.lampVoltage)}`
            : tex`V_{lamp} = I_h\,(R_{sec} \parallel R_{lamp}) = ${A(m.heaterCurrent)} \times ${OHM(m.parallelResistance)} = ${V(m.lampVoltage)}`,
      },
      {
        label: "Lamp and section currents (Ohm's law on each)",
        latex: tex`I_{lamp} = \frac{${V(m.lampVoltage)}}{${OHM(m.lampResistance)}} = ${A(m.lampCurrent)}, \quad I_{sec} = \frac{${V(m.lampVoltage)}}{${OHM(m.sectionResistance)}} = ${A(m.sectionCurrent)}`,
      },
    );
  }
  return steps;
}
