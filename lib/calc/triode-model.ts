/**
 * The triode model of N. L. Koren, "Improved vacuum tube models for SPICE simulations",
 * Glass Audio 8(5), 1996, in its original convention:
 *
 *   E1 = (Ep/KP)·ln(1 + exp(KP·(1/µ + Eg/√(KVB + Ep²))))
 *   Ip = (E1^EX / KG1)·(1 + sgn E1)          (so Ip = 0 for E1 ≤ 0)
 *
 * Voltages are plate and grid to cathode, in volts; Ip in amperes. Pure functions only.
 * Small-signal parameters come from the analytic partial derivatives, not differences.
 */

export interface TriodeParams {
  /** Amplification factor µ of the model (dimensionless). */
  mu: number;
  /** Exponent EX (≈ 1.3–1.4; 1.5 is Child's law). */
  ex: number;
  /** KG1, scales the current (in the model's own units, V^EX per A). */
  kg1: number;
  /** KP, sets the shape of the curves near cut-off. */
  kp: number;
  /** KVB, in V², sets the knee at low plate voltage. */
  kvb: number;
}

export interface TriodePoint {
  /** Plate current, A. */
  ip: number;
  /** Transconductance ∂Ip/∂Eg, S. */
  gm: number;
  /** Plate conductance ∂Ip/∂Ep, S (1/rp). */
  gp: number;
  /** Amplification factor gm/gp, from the ratio of the E1 partials (finite even when both underflow). */
  mu: number;
}

/** ln(1 + eˣ) without overflow for large x or loss for very negative x. */
function softplus(x: number): number {
  return x > 30 ? x + Math.log1p(Math.exp(-x)) : Math.log1p(Math.exp(x));
}

/** The logistic function 1/(1 + e⁻ˣ), the derivative of softplus. */
function logistic(x: number): number {
  if (x >= 0) return 1 / (1 + Math.exp(-x));
  const e = Math.exp(x);
  return e / (1 + e);
}

/** Plate current in amperes at plate voltage ep and grid voltage eg (both to cathode). */
export function plateCurrent(p: TriodeParams, ep: number, eg: number): number {
  if (!(ep > 0)) return 0;
  const s = Math.sqrt(p.kvb + ep * ep);
  const e1 = (ep / p.kp) * softplus(p.kp * (1 / p.mu + eg / s));
  return e1 > 0 ? (2 * Math.pow(e1, p.ex)) / p.kg1 : 0;
}

/**
 * Plate current and its partial derivatives at (ep, eg), from
 *   ∂E1/∂Eg = Ep·σ(x)/s,   ∂E1/∂Ep = softplus(x)/KP − σ(x)·Eg·Ep²/s³,
 * with x = KP·(1/µ + Eg/s), s = √(KVB + Ep²), σ the logistic function, and
 *   ∂Ip/∂E1 = 2·EX·E1^(EX−1)/KG1.
 */
export function triodePoint(p: TriodeParams, ep: number, eg: number): TriodePoint {
  if (!(ep > 0)) return { ip: 0, gm: 0, gp: 0, mu: 0 };
  const s = Math.sqrt(p.kvb + ep * ep);
  const x = p.kp * (1 / p.mu + eg / s);
  const sp = softplus(x);
  const sig = logistic(x);
  const e1 = (ep / p.kp) * sp;
  const dE1dEg = (ep * sig) / s;
  const dE1dEp = sp / p.kp - (sig * eg * ep * ep) / (s * s * s);
  const mu = dE1dEp > 0 ? dE1dEg / dE1dEp : 0;
  if (!(e1 > 0)) return { ip: 0, gm: 0, gp: 0, mu };
  const pow1 = Math.pow(e1, p.ex - 1);
  const ip = (2 * pow1 * e1) / p.kg1;
  const dIp = (2 * p.ex * pow1) / p.kg1;
  return { ip, gm: dIp * dE1dEg, gp: dIp * dE1dEp, mu };
}

export interface PlateCurvePoint {
  ep: number;
  ip: number;
}

export interface PlateCurveOptions {
  /** Grid voltages, one curve each (usually 0 and negative). */
  gridVoltages: readonly number[];
  /** Right-hand end of the curves, V. */
  maxPlateVoltage: number;
  /** Points per curve, including 0 V and the end (at least 2). */
  points: number;
}

/** Plate curves Ip(Ep) for each grid voltage, for drawing; curves[i] belongs to gridVoltages[i]. */
export function plateCurves(p: TriodeParams, o: PlateCurveOptions): PlateCurvePoint[][] {
  const n = Math.max(2, Math.floor(Number.isFinite(o.points) ? o.points : 2));
  const max = Number.isFinite(o.maxPlateVoltage) && o.maxPlateVoltage > 0 ? o.maxPlateVoltage : 0;
  return o.gridVoltages.map((eg) => {
    const curve: PlateCurvePoint[] = [];
    for (let i = 0; i < n; i++) {
      const ep = (max * i) / (n - 1);
      curve.push({ ep, ip: plateCurrent(p, ep, eg) });
    }
    return curve;
  });
}
