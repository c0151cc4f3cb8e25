/**
 * One tuned circuit of loaded Q, tuned to f0: how many times less it passes a signal at f than one at f0,
 * α = √(1 + Q²ρ²), ρ = f/f0 − f0/f (Kennedy & Davis, Electronic Communication Systems, receivers chapter:
 * image frequency and its rejection, from memory). Apart from the superhet calculator so the Bench's dial
 * can draw the curve without the schema and unit parser.
 */
export function tunedCircuitRejection(q: number, f0: number, f: number): number {
  const rho = f / f0 - f0 / f;
  return Math.sqrt(1 + q * q * rho * rho);
}
