/**
 * The series lamp's circuit, apart from the calculator so the Bench's picture can draw it without the
 * schema and unit parser. Hot resistance R = V²/P; cold about a tenth of it (tungsten, common practice);
 * between the two the lamp is taken as R_lamp(I) = max(R_cold, R_hot·I/I_rated), current rising as √V
 * (lamp makers' characteristic equations give I ∝ V^0.54–0.58, from memory). See lib/calc/series-lamp.ts.
 */

/** Cold (room-temperature) resistance as a fraction of hot: tungsten, common practice. */
export const COLD_FRACTION = 0.1;

/** Current through lamp and set, the set a fixed resistance rSet. Stable forms, no cancellation. */
export function lampCircuitCurrent(v: number, rHot: number, iRated: number, rSet: number): number {
  const rCold = rHot * COLD_FRACTION;
  const cold = v / (rCold + rSet);
  if (cold <= iRated * COLD_FRACTION) return cold;
  // k·I² + rSet·I − V = 0 with k = rHot/iRated; I = 2V / (rSet + √(rSet² + 4kV)).
  const k = rHot / iRated;
  return (2 * v) / (rSet + Math.sqrt(rSet * rSet + 4 * k * v));
}
