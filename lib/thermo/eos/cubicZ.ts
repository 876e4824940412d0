/**
 * physicalZRoots: the physical compressibility-factor roots (Z > B, i.e. V > b) of a cubic equation of
 * state written as Z^3 + c2 Z^2 + c1 Z + c0 = 0, ascending, written into a caller's scratch array, so
 * loops over many states allocate nothing (lib/numerics cubicRoots returns a fresh array per call).
 *
 * Method: Q = (c2^2 - 3 c1)/9, R = (2 c2^3 - 9 c2 c1 + 27 c0)/54 (Press et al., Numerical Recipes,
 * 3rd ed., section 5.6). R^2 < Q^3: three real roots from the trigonometric form; otherwise one from
 * Cardano's form. Each root is polished by up to four Newton steps on the polynomial, a step kept only
 * while it lowers |f| (near a double root f' -> 0 and a raw step on rounding noise could throw the root
 * away). Roots equal within 1e-12 relative after polishing count once (a double root at a spinodal),
 * the same rule the general path (cubic.ts volumes) applies to volumes.
 * Accuracy: simple roots to a few ulps after polishing; a close pair near a double root to about
 * sqrt(machine epsilon), the conditioning limit. A complex pair whose imaginary part is at the rounding
 * level is reported as no root here (lib/numerics cubicRoots reports it as a double root): the two
 * differ only on a set of states of measure zero (exact tangency).
 * Validity: finite coefficients; B >= 0. Returns the number of roots written to out[0..].
 */
import { polishCubicRoot as polish } from "../../numerics/index.js";

/** Appends z to out[0..count) if physical and not a repeat of the previous root; returns the new count. */
function keep(z: number, B: number, out: Float64Array, count: number): number {
  if (!(z > B) || !Number.isFinite(z)) return count;
  if (count > 0 && z - out[count - 1]! <= 1e-12 * z) return count;
  out[count] = z;
  return count + 1;
}

export function physicalZRoots(c2: number, c1: number, c0: number, B: number, out: Float64Array): number {
  const shift = c2 / 3;
  const Q = (c2 * c2 - 3 * c1) / 9;
  const Rq = (2 * c2 * c2 * c2 - 9 * c2 * c1 + 27 * c0) / 54;
  const Q3 = Q * Q * Q;
  if (Rq * Rq < Q3) {
    const sq = Math.sqrt(Q);
    const theta = Math.acos(Math.max(-1, Math.min(1, Rq / (sq * Q))));
    const m = -2 * sq;
    // Sorted after polishing (a polished close pair may swap).
    let z0 = polish(m * Math.cos(theta / 3) - shift, c2, c1, c0);
    let z1 = polish(m * Math.cos((theta - 2 * Math.PI) / 3) - shift, c2, c1, c0);
    let z2 = polish(m * Math.cos((theta + 2 * Math.PI) / 3) - shift, c2, c1, c0);
    let t: number;
    if (z0 > z1) { t = z0; z0 = z1; z1 = t; }
    if (z1 > z2) { t = z1; z1 = z2; z2 = t; }
    if (z0 > z1) { t = z0; z0 = z1; z1 = t; }
    let n = keep(z0, B, out, 0);
    n = keep(z1, B, out, n);
    return keep(z2, B, out, n);
  }
  const A = -Math.sign(Rq) * Math.cbrt(Math.abs(Rq) + Math.sqrt(Rq * Rq - Q3));
  const Bq = A !== 0 ? Q / A : 0;
  return keep(polish(A + Bq - shift, c2, c1, c0), B, out, 0);
}
