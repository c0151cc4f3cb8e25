/**
 * Cold-cathode glow-discharge voltage-regulator (VR) tubes of the era.
 *
 * Source: RCA receiving tube manual (RC-series) and the makers' data sheets. Every figure was
 * recalled FROM MEMORY of those sheets (the 0A2's 185 V agrees with a published summary of its
 * sheet); the miniature 0A2/0B2 were rated 5–30 mA and the octal 0C3/0D3 5–40 mA.
 * - regulatedVoltage: the operating (burning) voltage in the middle of the current range; a given
 *   tube sits within a few volts of it and moves a little over the range.
 * - minCurrent / maxCurrent: the data sheet's DC operating current range. Below the minimum the glow
 *   may go out (or flicker), above the maximum the cathode wears fast and the tube can arc over.
 * - strikingVoltage: the sheet's "DC anode-supply voltage required for conduction" (minimum): what
 *   the supply has to reach, through the series resistor, for the gas to ionise at switch-on.
 */

export const VR_SOURCE = "RCA receiving tube manual (RC-series) and VR tube data sheets; values recalled from memory, check the data sheet for critical work";

export interface VrTube {
  type: string;
  /** Older and military names for the same tube. */
  aliases: readonly string[];
  regulatedVoltage: number;
  minCurrent: number;
  maxCurrent: number;
  strikingVoltage: number;
  source: string;
}

const mA = 1e-3;

export const VR_TUBES: readonly VrTube[] = [
  {
    type: "0A2",
    aliases: ["OA2"],
    regulatedVoltage: 150,
    minCurrent: 5 * mA,
    maxCurrent: 30 * mA,
    strikingVoltage: 185,
    source: "0A2 data (RCA manual, from memory); the 185 V starting figure agrees with a published summary of the sheet",
  },
  {
    type: "0B2",
    aliases: ["OB2"],
    regulatedVoltage: 108,
    minCurrent: 5 * mA,
    maxCurrent: 30 * mA,
    strikingVoltage: 133,
    source: "0B2 data (RCA manual, from memory)",
  },
  {
    type: "0C3",
    aliases: ["OC3", "VR105", "VR-105"],
    regulatedVoltage: 105,
    minCurrent: 5 * mA,
    maxCurrent: 40 * mA,
    strikingVoltage: 133,
    source: "0C3/VR105 data (RCA manual, from memory)",
  },
  {
    type: "0D3",
    aliases: ["OD3", "VR150", "VR-150"],
    regulatedVoltage: 150,
    minCurrent: 5 * mA,
    maxCurrent: 40 * mA,
    strikingVoltage: 185,
    source: "0D3/VR150 data (RCA manual, from memory)",
  },
];

export const VR_TYPES: readonly string[] = VR_TUBES.map((t) => t.type);

const BY_NAME = new Map<string, VrTube>();
for (const t of VR_TUBES) for (const n of [t.type, ...t.aliases]) BY_NAME.set(n.toUpperCase(), t);

/** A tube by type number, any case, with the letter O typed for the zero ("OA2") and "VR150" accepted. */
export function findVrTube(name: string): VrTube | undefined {
  return BY_NAME.get(name.trim().toUpperCase());
}
