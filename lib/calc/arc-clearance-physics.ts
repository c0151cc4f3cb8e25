/**
 * Breakdown of air across a uniform-field gap and the air's density (the formulas and sources are in
 * lib/calc/arc-clearance.ts's header): pure functions of numbers, shared by the calculator and its chart.
 */

const A = 24.22; // kV per cm
const B = 6.08; // kV per √cm
/** Standard air: 101.325 kPa and 20 °C, where δ = 1. */
export const P0 = 101_325;
export const T0 = 293.15;

export function relativeAirDensity(pressure: number, temperature: number): number {
  return (pressure / P0) * (T0 / temperature);
}

/** Uniform-field breakdown voltage in volts for a gap in metres. */
export function breakdownVolts(gapM: number, delta: number): number {
  const x = delta * gapM * 100; // δ·d in cm
  return 1000 * (A * x + B * Math.sqrt(x));
}

/** The gap in metres whose uniform-field breakdown is `volts`: the positive root of A·s² + B·s = V_kV, s = √(δd). */
export function gapForVolts(volts: number, delta: number): number {
  const kv = volts / 1000;
  // 2c/(b + √(b² + 4ac)) avoids cancellation at small voltages
  const s = (2 * kv) / (B + Math.sqrt(B * B + 4 * A * kv));
  return (s * s) / delta / 100;
}

/**
 * Pressure of the standard atmosphere at an altitude (ISO 2533 / ICAO: troposphere to 11 km, then
 * isothermal; constants from memory). Only used to notice a sea-level pressure typed for a high workshop.
 */
export function standardAtmospherePressure(altitude: number): number {
  if (altitude <= 11_000) return P0 * Math.pow(1 - 2.25577e-5 * altitude, 5.25588);
  return 22_632 * Math.exp(-(altitude - 11_000) / 6341.6);
}
