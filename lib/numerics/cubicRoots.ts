/**
 * Real roots of the monic cubic x^3 + a2 x^2 + a1 x + a0 = 0, ascending, multiple roots repeated.
 *
 * Method: Q = (a2^2 - 3 a1)/9, R = (2 a2^3 - 9 a2 a1 + 27 a0)/54. If R^2 < Q^3 there are three real
 * roots, from the trigonometric form x_k = -2 sqrt(Q) cos((theta + 2 pi k)/3) - a2/3 with
 * cos(theta) = R/sqrt(Q^3); otherwise one real root from Cardano's form A + Q/A - a2/3 with
 * A = -sign(R) cbrt(|R| + sqrt(R^2 - Q^3)) (Press et al., Numerical Recipes, 3rd ed., section 5.6).
 * Every root is then polished by Newton steps on the original cubic (kept only while the residual
 * falls). In the one-real-root case the cubic is deflated by the polished root and the remaining
 * quadratic's discriminant is examined: a complex pair whose imaginary part is within the rounding
 * uncertainty of the coefficients is reported as a double real root (that is what a computed double or
 * triple root looks like after the coefficients are rounded, and what an equation of state needs at a
 * tangency). The threshold is 4 * min(sqrt(eps M / |p''(c)/2|), cbrt(eps M)), with c the pair's real
 * part and M = |c|^3 + |a2| c^2 + |a1| |c| + |a0|, the size of the terms when p(c) is evaluated.
 *
 * Accuracy: simple roots to a few ulps of the rounded-coefficient problem; double roots to about
 * sqrt(eps) relative and triple roots to about cbrt(eps) relative, the conditioning limit of any method
 * working from rounded coefficients. Validity: finite coefficients with |a2|^3, |a1|^1.5 and |a0| well
 * inside the double range (below about 1e300). Speed: see bench/numerics.ts (several million per s).
 */
import { requireNumber } from "./checks.js";

const EPS = Number.EPSILON;

/**
 * polishCubicRoot: up to `maxSteps` Newton steps on x^3 + a2 x^2 + a1 x + a0 from the estimate x, each
 * kept only if it lowers |p(x)| (near a double or triple root p' -> 0 and a raw step on rounding noise
 * could throw the root far away). Returns x itself when no step helps. Plain numbers, no units.
 * Accuracy: a simple root to a few ulps from a start within the root's basin; a multiple root is left
 * where the residual stops falling (its conditioning limit). Source: Newton's method on the polynomial
 * (Press et al., Numerical Recipes, 3rd ed., section 9.4, from memory).
 */
export function polishCubicRoot(x: number, a2: number, a1: number, a0: number, maxSteps = 4): number {
  let best = x;
  let pBest = ((x + a2) * x + a1) * x + a0;
  for (let k = 0; k < maxSteps && pBest !== 0; k++) {
    const d = (3 * best + 2 * a2) * best + a1;
    if (d === 0) break;
    const next = best - pBest / d;
    const pNext = ((next + a2) * next + a1) * next + a0;
    if (!(Math.abs(pNext) < Math.abs(pBest))) break;
    best = next;
    pBest = pNext;
  }
  return best;
}

/** Roots of x^2 + b1 x + b0 appended to out (double root within rounding kept as two equal roots). */
function quadraticRoots(b1: number, b0: number, a2: number, a1: number, a0: number, out: number[]): void {
  const c = -0.5 * b1;
  const disc = c * c - b0;
  if (disc >= 0) {
    const q = c + (c >= 0 ? Math.sqrt(disc) : -Math.sqrt(disc)); // no cancellation
    out.push(q, q !== 0 ? b0 / q : 0);
    return;
  }
  const im = Math.sqrt(-disc);
  const ac = Math.abs(c);
  const size = ac * ac * ac + Math.abs(a2) * c * c + Math.abs(a1) * ac + Math.abs(a0);
  const curvature = Math.abs(3 * c + a2);
  const spread = Math.min(curvature > 0 ? Math.sqrt((EPS * size) / curvature) : Infinity, Math.cbrt(EPS * size));
  if (im <= 4 * spread) {
    const r = polishCubicRoot(c, a2, a1, a0);
    out.push(r, r);
  }
}

/**
 * Appends r and the real roots of the cubic divided by (x - r) = x^2 + b1 x + b0. Each quotient
 * coefficient has two formulas: forward from the top (b1 = a2 + r, b0 = a1 + r b1) and backward from
 * the constant term (b0 = -a0/r, b1 = (b0 - a1)/r). Each is taken from whichever formula has the
 * smaller rounding bound: forward suits large remaining roots, backward small ones (a close pair of
 * small roots next to a large one is what a cubic equation of state produces at low pressure).
 */
function deflated(r: number, a2: number, a1: number, a0: number, out: number[]): void {
  out.push(r);
  const f1 = a2 + r;
  const f0 = a1 + r * f1;
  let b1 = f1;
  let b0 = f0;
  if (r !== 0) {
    const k0 = -a0 / r;
    const k1 = (k0 - a1) / r;
    const ar = Math.abs(r);
    if ((Math.abs(k0) + Math.abs(a1)) / ar < Math.abs(a2) + ar) b1 = k1;
    if (Math.abs(k0) < Math.abs(a1) + Math.abs(r * f1)) b0 = k0;
  }
  quadraticRoots(b1, b0, a2, a1, a0, out);
  if (out.length === 3) {
    out[1] = polishCubicRoot(out[1]!, a2, a1, a0);
    out[2] = polishCubicRoot(out[2]!, a2, a1, a0);
  }
}

/** Sorts 1 to 3 numbers in place without a comparator closure (this runs millions of times). */
function ascending(r: number[]): number[] {
  if (r.length < 2) return r;
  let t: number;
  if (r[0]! > r[1]!) { t = r[0]!; r[0] = r[1]!; r[1] = t; }
  if (r.length === 3) {
    if (r[1]! > r[2]!) { t = r[1]!; r[1] = r[2]!; r[2] = t; }
    if (r[0]! > r[1]!) { t = r[0]!; r[0] = r[1]!; r[1] = t; }
  }
  return r;
}

/** All real roots of x^3 + a2 x^2 + a1 x + a0, ascending; length 1, 2 (never) or 3. */
export function cubicRoots(a2: number, a1: number, a0: number): number[] {
  requireNumber("cubicRoots", "a2", a2);
  requireNumber("cubicRoots", "a1", a1);
  requireNumber("cubicRoots", "a0", a0);
  const roots: number[] = [];
  if (a0 === 0) {
    // x (x^2 + a2 x + a1): exact zero root, quadratic for the rest.
    roots.push(0);
    quadraticRoots(a2, a1, a2, a1, a0, roots);
    return ascending(roots);
  }
  const shift = a2 / 3;
  const Q = (a2 * a2 - 3 * a1) / 9;
  const R = (2 * a2 * a2 * a2 - 9 * a2 * a1 + 27 * a0) / 54;
  const Q3 = Q * Q * Q;
  if (R * R < Q3) {
    const sq = Math.sqrt(Q);
    const theta = Math.acos(Math.max(-1, Math.min(1, R / (sq * Q))));
    const m = -2 * sq;
    // Take the largest-magnitude trigonometric root, polish it and deflate: the two others come from
    // a quadratic, which resolves a close pair near a double root better than the trigonometric form.
    const t0 = m * Math.cos(theta / 3) - shift;
    const t1 = m * Math.cos((theta + 2 * Math.PI) / 3) - shift;
    const t2 = m * Math.cos((theta - 2 * Math.PI) / 3) - shift;
    const big = Math.abs(t0) >= Math.abs(t1) ? (Math.abs(t0) >= Math.abs(t2) ? t0 : t2) : Math.abs(t1) >= Math.abs(t2) ? t1 : t2;
    deflated(polishCubicRoot(big, a2, a1, a0), a2, a1, a0, roots);
    return ascending(roots);
  }
  const A = -Math.sign(R) * Math.cbrt(Math.abs(R) + Math.sqrt(R * R - Q3));
  const B = A !== 0 ? Q / A : 0;
  deflated(polishCubicRoot(A + B - shift, a2, a1, a0), a2, a1, a0, roots);
  return ascending(roots);
}
