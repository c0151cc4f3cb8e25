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

/**
 * DC operating point of a cathode-biased common-cathode triode stage. With plate current Ip:
 *   Vk = Ip·Rk,  Eg = −Vk,  Ep = B+ − Ip·(Ra + Rk).
 * f(Ip) = model(Ep(Ip), Eg(Ip)) − Ip falls strictly as Ip rises (both Ep and Eg fall), with
 * f(0) ≥ 0 and f(B+/(Ra+Rk)) < 0, so one root lies in that bracket. Newton's method with the
 * analytic slope d(model)/dIp = −gp·(Ra + Rk) − gm·Rk, kept inside the bracket and falling back
 * to bisection, converges in a handful of steps.
 */

export interface OperatingPoint {
  ok: true;
  /** Plate current, A. */
  ip: number;
  /** Plate-to-cathode voltage, V. */
  ep: number;
  /** Grid-to-cathode voltage, V (−Vk). */
  eg: number;
  /** Cathode voltage to ground, V. */
  vk: number;
  /** Model current and small-signal parameters at (ep, eg). */
  point: TriodePoint;
  iterations: number;
}

export type SolveResult = OperatingPoint | { ok: false; message: string };

const MAX_ITERATIONS = 200;

export function solveOperatingPoint(p: TriodeParams, supply: number, ra: number, rk: number): SolveResult {
  const r = ra + rk;
  const ipMax = supply / r;
  if (!(supply > 0) || !(ra > 0) || !(rk >= 0) || !Number.isFinite(ipMax)) {
    return { ok: false, message: "The supply voltage and plate resistor must be above zero and the cathode resistor not negative." };
  }
  const at = (ip: number) => {
    const ep = supply - ip * r;
    const eg = -ip * rk;
    return { ep, eg, point: triodePoint(p, ep, eg) };
  };

  const start = at(0);
  const f0 = start.point.ip;
  if (!Number.isFinite(f0) || f0 < 0) {
    return { ok: false, message: "The model gives no usable current at these values; check the model parameters." };
  }
  if (f0 === 0) {
    // Model current underflows even with no bias: the tube is cut off and Ip = 0 is the root.
    return { ok: true, ip: 0, ep: supply, eg: 0, vk: 0, point: start.point, iterations: 0 };
  }

  let lo = 0; // model > Ip here
  let hi = ipMax; // model < Ip here, since the model gives 0 at Ep = 0
  // First guess: the current with the full supply on the plate and no bias, clipped to the bracket.
  let ip = Math.min(f0, 0.5 * ipMax);
  for (let i = 1; i <= MAX_ITERATIONS; i++) {
    const s = at(ip);
    const m = s.point.ip;
    if (m === ip) return { ok: true, ip, ep: s.ep, eg: s.eg, vk: ip * rk, point: s.point, iterations: i };
    if (m > ip) lo = ip;
    else hi = ip;
    // Newton on g = ln(model) − ln(Ip), which is nearly straight both in the power-law region
    // and in the exponential tail near cut-off, where Newton on model − Ip crawls.
    const dm = -s.point.gp * r - s.point.gm * rk; // d(model)/dIp ≤ 0
    const newton = m > 0 ? ip - Math.log(m / ip) / (dm / m - 1 / ip) : Number.NaN;
    // Converged: the correction is at rounding level (|model − Ip| ≈ 1e-15·Ip).
    if (Math.abs(newton - ip) <= 2e-15 * ip) return { ok: true, ip, ep: s.ep, eg: s.eg, vk: ip * rk, point: s.point, iterations: i };
    // Safeguard: bisect (geometrically once the bracket is off zero) if Newton leaves the bracket.
    ip = newton > lo && newton < hi ? newton : lo > 0 ? Math.sqrt(lo * hi) : 0.5 * (lo + hi);
    if (hi - lo <= 1e-15 * hi) {
      const end = at(ip);
      return { ok: true, ip, ep: end.ep, eg: end.eg, vk: ip * rk, point: end.point, iterations: i };
    }
  }
  return { ok: false, message: "The operating point did not converge; check the model parameters." };
}
