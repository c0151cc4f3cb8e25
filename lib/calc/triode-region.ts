import { formatQuantity } from "./format";
import type { Warning } from "./types";

/**
 * Cut-off and bottoming are opposite ends of the load line, so at most one caution fires:
 * - cut-off: the tube, not the resistors, holds the current near zero: under 1 µA and under half
 *   of what the resistors alone would pass (B+/(Ra + Rk)), so most of B+ is still on the plate;
 * - bottomed (saturated): the resistors, not the tube, limit the current: 90% or more of B+ is
 *   across Ra + Rk, the plate is less than 10% of B+ above its cathode and cannot swing further down.
 * (Common practice; the 1 µA and 10% marks are ours.)
 */
export function regionWarnings(bPlus: number, ra: number, rk: number, ip: number, ep: number): Warning[] {
  const resistorLimit = bPlus / (ra + rk);
  if (ip < 1e-6 && ip < 0.5 * resistorLimit) {
    return [
      {
        level: "caution",
        message: `The tube is close to cut-off: it passes only ${formatQuantity(ip, "A")}, and most of the supply is still on its plate. Gain and linearity will be poor; use a smaller cathode resistor.`,
      },
    ];
  }
  if (ip >= 0.9 * resistorLimit) {
    return [
      {
        level: "caution",
        message: `The tube is bottomed (saturated): only ${formatQuantity(ep, "V")} is left from plate to cathode, ${Math.round((100 * ep) / bPlus)}% of the supply, because the plate resistor limits the current. The plate cannot swing lower, so signal peaks clip; use a smaller plate resistor or a larger cathode resistor.`,
      },
    ];
  }
  return [];
}
