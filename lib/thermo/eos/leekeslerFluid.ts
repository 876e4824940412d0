/**
 * The Lee-Kesler modified BWR equation for one of its two fluids (simple or reference), in reduced
 * variables. Source: B.I. Lee and M.G. Kesler, "A generalized thermodynamic correlation based on
 * three-parameter corresponding states", AIChE J. 21 (1975) 510-527, Table 1 constants and
 * equations for Z, (H-H^ig)/RTc, (S-S^ig)/R and ln(f/P) (from memory).
 *
 *   Z = Pr Vr / Tr = 1 + B/Vr + C/Vr^2 + D/Vr^5 + c4/(Tr^3 Vr^2) (beta + gamma/Vr^2) exp(-gamma/Vr^2)
 *   B = b1 - b2/Tr - b3/Tr^2 - b4/Tr^3,  C = c1 - c2/Tr + c3/Tr^3,  D = d1 + d2/Tr
 * with Vr = Pc V / (R Tc) (the "pseudo-reduced" volume of the paper, not V/Vc).
 * Validity: 0.3 <= Tr <= 4, 0 <= Pr <= 10 (the range of the paper's tables).
 */

export interface LeeKeslerConstants {
  readonly b1: number; readonly b2: number; readonly b3: number; readonly b4: number;
  readonly c1: number; readonly c2: number; readonly c3: number; readonly c4: number;
  readonly d1: number; readonly d2: number; readonly beta: number; readonly gamma: number;
}

/** Simple fluid (omega = 0), Lee & Kesler (1975) Table 1. */
export const LK_SIMPLE: LeeKeslerConstants = Object.freeze({
  b1: 0.1181193, b2: 0.265728, b3: 0.15479, b4: 0.030323,
  c1: 0.0236744, c2: 0.0186984, c3: 0.0, c4: 0.042724,
  d1: 0.155488e-4, d2: 0.623689e-4, beta: 0.65392, gamma: 0.060167,
});

/** Reference fluid n-octane, Lee & Kesler (1975) Table 1. */
export const LK_REFERENCE: LeeKeslerConstants = Object.freeze({
  b1: 0.2026579, b2: 0.331511, b3: 0.027655, b4: 0.203488,
  c1: 0.0313385, c2: 0.0503618, c3: 0.016901, c4: 0.041577,
  d1: 0.48736e-4, d2: 0.0740336e-4, beta: 1.226, gamma: 0.03754,
});

/** Acentric factor of the reference fluid (n-octane) in the 1975 paper. */
export const LK_OMEGA_REFERENCE = 0.3978;

/** Z from the equation at (Tr, Vr). */
export function lkZ(k: LeeKeslerConstants, Tr: number, Vr: number): number {
  const B = k.b1 - k.b2 / Tr - k.b3 / Tr ** 2 - k.b4 / Tr ** 3;
  const C = k.c1 - k.c2 / Tr + k.c3 / Tr ** 3;
  const D = k.d1 + k.d2 / Tr;
  const g = k.gamma / (Vr * Vr);
  return 1 + B / Vr + C / Vr ** 2 + D / Vr ** 5 + (k.c4 / (Tr ** 3 * Vr ** 2)) * (k.beta + g) * Math.exp(-g);
}

/** Reduced pressure Pr = Z Tr / Vr. */
export function lkPr(k: LeeKeslerConstants, Tr: number, Vr: number): number {
  return (lkZ(k, Tr, Vr) * Tr) / Vr;
}

/**
 * All mechanically stable roots Vr of Pr(Tr, Vr) = Pr, ascending (liquid-like first): a log-spaced scan
 * of Vr brackets every sign change, bisection-secant (Illinois) refines each to 1e-13 relative, and
 * roots with dPr/dVr >= 0 (the unstable middle branch) are dropped.
 */
export function lkRoots(k: LeeKeslerConstants, Tr: number, Pr: number): number[] {
  const f = (Vr: number) => lkPr(k, Tr, Vr) - Pr;
  // Below Vr = 0.01 the D/Vr^5 repulsion dominates at every Tr in range; ideal-gas Vr times 10 is past
  // the last root because Z > 0.1 on the vapour branch.
  const lo = 0.01;
  const hi = Math.max(10 * Tr / Pr, 10);
  const n = 400;
  const ratio = Math.pow(hi / lo, 1 / n);
  const roots: number[] = [];
  let a = lo;
  let fa = f(a);
  for (let i = 1; i <= n; i++) {
    const b = lo * ratio ** i;
    const fb = f(b);
    if (fa === 0) roots.push(a);
    else if (fa * fb < 0) roots.push(illinois(f, a, b, fa, fb));
    a = b;
    fa = fb;
  }
  return roots.filter((Vr) => {
    const h = Vr * 1e-6;
    return lkPr(k, Tr, Vr + h) - lkPr(k, Tr, Vr - h) < 0;
  });
}

function illinois(f: (x: number) => number, a: number, b: number, fa: number, fb: number): number {
  for (let it = 0; it < 200; it++) {
    const c = (a * fb - b * fa) / (fb - fa);
    const fc = f(c);
    if (fc === 0) return c;
    if (fc * fb < 0) {
      a = b;
      fa = fb;
    } else {
      fa /= 2; // Illinois: halve the retained end's value so the secant does not stall on one side
    }
    b = c;
    fb = fc;
    if (Math.abs(b - a) <= 1e-13 * Math.abs(b)) return b;
  }
  return b;
}

export interface LkProperties {
  Z: number;
  /** (H - H^ig)/(R Tc) */
  HRdRTc: number;
  /** (S - S^ig)/R at the same T and P */
  SRdR: number;
  /** ln(f/P) */
  lnphi: number;
}

/** Departure functions of one LK fluid at (Tr, Vr), Lee & Kesler (1975) equations. */
export function lkProperties(k: LeeKeslerConstants, Tr: number, Vr: number): LkProperties {
  const Z = lkZ(k, Tr, Vr);
  const { b1, b2, b3, b4, c1, c2, c3, c4, d1, d2, beta, gamma } = k;
  const B = b1 - b2 / Tr - b3 / Tr ** 2 - b4 / Tr ** 3;
  const C = c1 - c2 / Tr + c3 / Tr ** 3;
  const D = d1 + d2 / Tr;
  const g = gamma / (Vr * Vr);
  const E = (c4 / (2 * Tr ** 3 * gamma)) * (beta + 1 - (beta + 1 + g) * Math.exp(-g));
  const HRdRTc =
    Tr *
    (Z - 1 - (b2 + (2 * b3) / Tr + (3 * b4) / Tr ** 2) / (Tr * Vr) - (c2 - (3 * c3) / Tr ** 2) / (2 * Tr * Vr ** 2) +
      d2 / (5 * Tr * Vr ** 5) + 3 * E);
  const SRdR =
    Math.log(Z) - (b1 + b3 / Tr ** 2 + (2 * b4) / Tr ** 3) / Vr - (c1 - (2 * c3) / Tr ** 3) / (2 * Vr ** 2) -
    d1 / (5 * Vr ** 5) + 2 * E;
  const lnphi = Z - 1 - Math.log(Z) + B / Vr + C / (2 * Vr ** 2) + D / (5 * Vr ** 5) + E;
  return { Z, HRdRTc, SRdR, lnphi };
}
