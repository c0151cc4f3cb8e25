import type { TriodeParams } from "../triode-model";

/**
 * Built-in triode models for the triode-stage calculator, in the convention of
 * N. L. Koren, "Improved vacuum tube models for SPICE simulations", Glass Audio 8(5), 1996,
 * and the updated parameter tables that followed it: Ip = (E1^EX/KG1)·(1 + sgn E1).
 *
 * Two kinds of entry, told apart by `source`:
 * - Koren's own published parameters, recalled from memory (not re-read from the paper).
 * - Types for which we did not trust our memory of Koren's figures: parameters fitted by
 *   Glowbench (EX and KVB fixed, µ, KP and KG1 solved) so the model reproduces the
 *   data sheet's typical operating point, itself recalled from memory.
 * Maximum plate dissipation is the data sheet's rating per section, also from memory;
 * ratings differ between suffixes (GT/GTB, A) and makers, so we give the lower one.
 */

export interface TriodeEntry {
  name: string;
  /** Other type numbers of the same tube, accepted in the `tube` input. */
  aliases: readonly string[];
  params: TriodeParams;
  /** Rated maximum plate dissipation per section, W. */
  maxPlateDissipation: number;
  source: string;
  /** True where a figure is recalled rather than read from the source. */
  fromMemory: boolean;
}

const KOREN = "N. L. Koren, Improved vacuum tube models for SPICE simulations, Glass Audio 1996, parameter table";
const FIT = "Glowbench fit of the Koren model to the data sheet's typical operating point";

export const TRIODES: readonly TriodeEntry[] = [
  {
    name: "12AX7",
    aliases: ["ECC83", "7025", "12AX7A"],
    params: { mu: 100, ex: 1.4, kg1: 1060, kp: 600, kvb: 300 },
    maxPlateDissipation: 1.0,
    source: `${KOREN} (from memory); Pa max 1 W per section, data sheet (from memory)`,
    fromMemory: true,
  },
  {
    name: "12AT7",
    aliases: ["ECC81"],
    params: { mu: 60, ex: 1.35, kg1: 460, kp: 300, kvb: 300 },
    maxPlateDissipation: 2.5,
    source: `${KOREN} (from memory); Pa max 2.5 W per section, data sheet (from memory)`,
    fromMemory: true,
  },
  {
    name: "12AU7",
    aliases: ["ECC82", "12AU7A"],
    params: { mu: 21.5, ex: 1.3, kg1: 1180, kp: 84, kvb: 300 },
    maxPlateDissipation: 2.75,
    source: `${KOREN} (from memory); Pa max 2.75 W per section, data sheet (from memory)`,
    fromMemory: true,
  },
  {
    name: "6DJ8",
    aliases: ["ECC88", "6922"],
    params: { mu: 28, ex: 1.3, kg1: 330, kp: 320, kvb: 300 },
    maxPlateDissipation: 1.5,
    source: `${KOREN} (from memory); Pa max 1.5 W per section, the lower of the ratings we recall`,
    fromMemory: true,
  },
  {
    // Fitted at Ep 250 V, Eg −8 V: Ip 9 mA, gm 2.6 mA/V, µ 20 (data sheet, from memory), EX 1.3, KVB 300.
    name: "6SN7",
    aliases: ["6SN7GT", "6SN7GTA", "6SN7GTB"],
    params: { mu: 20.3, ex: 1.3, kg1: 1510, kp: 205, kvb: 300 },
    maxPlateDissipation: 2.5,
    source: `${FIT} (250 V, −8 V, 9 mA; from memory); Pa max 2.5 W per section for the GT, the GTB is rated higher`,
    fromMemory: true,
  },
  {
    // The miniature counterpart of the 6SN7 with the same typical figures, so the same fit.
    name: "6CG7",
    aliases: ["6FQ7"],
    params: { mu: 20.3, ex: 1.3, kg1: 1510, kp: 205, kvb: 300 },
    maxPlateDissipation: 3.5,
    source: `${FIT}, shared with the 6SN7 (same typical figures, from memory); Pa max 3.5 W per section (from memory)`,
    fromMemory: true,
  },
  {
    // Fitted at Ep 250 V, Eg −2 V: Ip 2.3 mA, gm 1.6 mA/V, µ 70 (data sheet, from memory), EX 1.2, KVB 300.
    name: "6SL7",
    aliases: ["6SL7GT"],
    params: { mu: 79.5, ex: 1.2, kg1: 1250, kp: 300, kvb: 300 },
    maxPlateDissipation: 1.0,
    source: `${FIT} (250 V, −2 V, 2.3 mA; from memory); Pa max 1 W per section (from memory)`,
    fromMemory: true,
  },
  {
    // Fitted at Ep 250 V, Eg −4 V: Ip 3 mA, gm 1.75 mA/V, µ 44 (data sheet, from memory), EX 1.2, KVB 300.
    name: "12AY7",
    aliases: ["6072"],
    params: { mu: 44.3, ex: 1.2, kg1: 1330, kp: 305, kvb: 300 },
    maxPlateDissipation: 1.5,
    source: `${FIT} (250 V, −4 V, 3 mA; from memory); Pa max 1.5 W per section (from memory)`,
    fromMemory: true,
  },
];

/** Canonical type names, for the form's select control. */
export const TRIODE_NAMES = TRIODES.map((t) => t.name) as readonly string[];

const byName = new Map<string, TriodeEntry>();
for (const t of TRIODES) for (const n of [t.name, ...t.aliases]) byName.set(n.toUpperCase(), t);

/** Look a type up by name or alias, ignoring case and spaces ("ecc83", "12ax7"). */
export function findTriode(name: string): TriodeEntry | undefined {
  return byName.get(name.replace(/\s+/g, "").toUpperCase());
}
