import { findHeater } from "@/lib/calc/tables/heaters";
import { findTube, tubeHeater, type Heater, type PictureTube, type ReceivingTube, type TubeEntry } from "@/lib/calc/tables/tubes";
import type { WarningLevel } from "@/lib/calc/types";

/**
 * What changes when a substitute goes in a socket, from the built-in tube data (lib/calc/tables/tubes.ts
 * and heaters.ts, figures from memory of the RCA manuals and data sheets). The heater is always compared;
 * the other ratings appear only where they differ, picture tubes' anode range and deflection angle always.
 */

export interface TubeDifference {
  what: string;
  original: string;
  substitute: string;
  level: WarningLevel;
  /** What the difference means at the bench, in a sentence. */
  note?: string;
}

const UNKNOWN = "not in the built-in table";

/** The heater of a type: the tube table's row, or the heater table alone for types it lists only there. */
export function heaterOf(type: string): Heater | undefined {
  const t = findTube(type);
  if (t) return tubeHeater(t);
  const h = findHeater(type);
  return h ? { voltage: h.voltage, current: h.current } : undefined;
}

/**
 * Whether a line-up runs its heaters in a series string: any heater above 6.3 V that is not a centre-tapped
 * twin triode (those run at 6.3 V in parallel sets) belongs to a series string — 150, 300 and 600 mA types
 * such as 12BA6, 50C5, 35W4, 25L6GT, 12SN7GT, 12AX4GTB (common practice).
 */
export function looksLikeSeriesString(types: readonly string[]): boolean {
  return types.some((type) => {
    const t = findTube(type);
    const listed = [type, ...(t ? [t.type, ...t.aliases] : [])].map((n) => findHeater(n)).find(Boolean);
    if (listed) return listed.voltage > 6.3 && !/centre-tapped/.test(listed.note ?? "");
    return (heaterOf(type)?.voltage ?? 0) > 6.3;
  });
}

const volts = (v: number) => `${v} V`;
const amps = (a: number) => `${a} A`;
const kilovolts = (min: number, max: number) => `${min / 1000}–${max / 1000} kV`;
const same = (a: number, b: number) => Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b), 1);

function heaterRows(original: Heater | undefined, substitute: Heater | undefined, seriesString: boolean): TubeDifference[] {
  if (!original || !substitute) {
    const o = original ? `${volts(original.voltage)}, ${amps(original.current)}` : UNKNOWN;
    const s = substitute ? `${volts(substitute.voltage)}, ${amps(substitute.current)}` : UNKNOWN;
    return [{ what: "Heater", original: o, substitute: s, level: "caution", note: "Compare the heaters on the data sheets before fitting it." }];
  }
  const rows: TubeDifference[] = [];
  const vSame = same(original.voltage, substitute.voltage);
  rows.push({
    what: "Heater voltage",
    original: volts(original.voltage),
    substitute: volts(substitute.voltage),
    level: vSame ? "info" : "caution",
    ...(vSame
      ? {}
      : {
          note: seriesString
            ? "The string's total heater voltage changes: recheck the dropping resistor or line cord with the heater-string calculator."
            : substitute.voltage < original.voltage
              ? "The heater would run above its rating on this winding and burn out early."
              : "The heater would run below its rating on this winding: low emission, poor performance.",
        }),
  });
  const iSame = same(original.current, substitute.current);
  let level: WarningLevel = "info";
  let note: string | undefined;
  if (!iSame && seriesString) {
    // Every heater of a series string carries the one string current (common practice).
    level = "danger";
    note = `In a series string every heater carries the same current: a ${amps(substitute.current)} heater in a ${amps(original.current)} string is overrun or starved, and so are the others. Check the string with the heater-string calculator.`;
  } else if (!iSame && substitute.current > original.current) {
    level = "caution";
    note = `Draws ${amps(Number((substitute.current - original.current).toPrecision(3)))} more from the heater winding.`;
  } else if (!iSame) note = "Draws less from the heater winding.";
  rows.push({ what: "Heater current", original: amps(original.current), substitute: amps(substitute.current), level, ...(note ? { note } : {}) });
  return rows;
}

/** A lower maximum is a caution (check the set's figure against it); a higher one is information. */
function ratingRow(what: string, unit: string, o: number | undefined, s: number | undefined): TubeDifference[] {
  if (o === undefined || s === undefined || same(o, s)) return [];
  const lower = s < o;
  return [
    {
      what,
      original: `${o} ${unit}`,
      substitute: `${s} ${unit}`,
      level: lower ? "caution" : "info",
      note: lower ? `Rated lower than the original: check what the set puts on it against ${s} ${unit}.` : "Rated higher than the original.",
    },
  ];
}

function receivingRows(o: ReceivingTube, s: ReceivingTube): TubeDifference[] {
  return [
    ...(o.kind !== s.kind
      ? [{ what: "Kind", original: o.kind, substitute: s.kind, level: "caution" as const, note: "A different kind of tube: check the circuit suits it." }]
      : []),
    ...ratingRow("Max plate voltage", "V", o.maxPlateVoltage, s.maxPlateVoltage),
    ...ratingRow("Max peak pulse voltage", "V", o.maxPeakPulseVoltage, s.maxPeakPulseVoltage),
    ...ratingRow("Max peak inverse voltage", "V", o.maxPeakInverseVoltage, s.maxPeakInverseVoltage),
    ...ratingRow(o.sections === 2 ? "Max plate dissipation (each section)" : "Max plate dissipation", "W", o.maxPlateDissipation, s.maxPlateDissipation),
    ...ratingRow("Max screen dissipation", "W", o.maxScreenDissipation, s.maxScreenDissipation),
  ];
}

function pictureRows(o: PictureTube, s: PictureTube): TubeDifference[] {
  const anodeOutside = s.anodeVoltageMax < o.anodeVoltageMax || s.anodeVoltageMin > o.anodeVoltageMin;
  const rows: TubeDifference[] = [
    {
      what: "Anode voltage range",
      original: kilovolts(o.anodeVoltageMin, o.anodeVoltageMax),
      substitute: kilovolts(s.anodeVoltageMin, s.anodeVoltageMax),
      level: anodeOutside ? "caution" : "info",
      ...(anodeOutside ? { note: "The set's anode supply may fall outside the substitute's range: measure it with a high-voltage probe." } : {}),
    },
    {
      what: "Deflection angle",
      original: `${o.deflectionAngle}°`,
      substitute: `${s.deflectionAngle}°`,
      level: o.deflectionAngle === s.deflectionAngle ? "info" : "caution",
      ...(o.deflectionAngle === s.deflectionAngle
        ? {}
        : { note: "The yoke is wound for one angle: the picture will not fill the screen, or will be cut off, without another yoke." }),
    },
  ];
  if (o.focus !== s.focus)
    rows.push({
      what: "Focus",
      original: o.focus,
      substitute: s.focus,
      level: "caution",
      note: "Magnetic and electrostatic focus are wired differently: check the focus coil or focus-electrode connection.",
    });
  if (o.ionTrap !== s.ionTrap)
    rows.push({
      what: "Ion trap",
      original: o.ionTrap ? "needed" : "none",
      substitute: s.ionTrap ? "needed" : "none",
      level: "caution",
      note: "Fit or remove the ion-trap magnet to suit the substitute.",
    });
  if (o.face !== s.face)
    rows.push({ what: "Face", original: o.face, substitute: s.face, level: "caution", note: "A different face shape needs another mask and mounting." });
  return rows;
}

function bodyRows(o: TubeEntry | undefined, s: TubeEntry | undefined): TubeDifference[] {
  if (!o || !s) return [];
  const rows: TubeDifference[] = [];
  if (o.category !== s.category) {
    return [{ what: "Kind", original: o.kind, substitute: s.kind, level: "caution", note: "Not the same kind of tube at all: check the type numbers." }];
  }
  if (o.base !== s.base) rows.push({ what: "Base", original: o.base, substitute: s.base, level: "caution", note: "Needs an adapter or a rewired socket." });
  if (o.category === "receiving" && s.category === "receiving") rows.push(...receivingRows(o, s));
  if (o.category === "picture" && s.category === "picture") rows.push(...pictureRows(o, s));
  return rows;
}

/** The differences between the original type and a substitute; heater voltage and current always first. */
export function tubeDifferences(original: string, substitute: string, options: { seriesString: boolean }): TubeDifference[] {
  return [...heaterRows(heaterOf(original), heaterOf(substitute), options.seriesString), ...bodyRows(findTube(original), findTube(substitute))];
}
