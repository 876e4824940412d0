/**
 * Evaluation of the IAPWS double power series S(x, y) = sum n_i x^I_i y^J_i and its first and second
 * partial derivatives. Every IF97 basic and backward equation is this sum in shifted, reduced variables.
 */
import type { Terms } from "./tables/terms.js";

export interface SeriesDerivatives {
  f: number;
  fx: number;
  fxx: number;
  fy: number;
  fyy: number;
  fxy: number;
}

/** The sum only (backward equations). Terms with a zero exponent skip the power call. */
export function seriesValue(t: Terms, x: number, y: number): number {
  let sum = 0;
  for (let k = 0; k < t.n.length; k++) {
    const i = t.I[k] as number;
    const j = t.J[k] as number;
    sum += (t.n[k] as number) * (i === 0 ? 1 : Math.pow(x, i)) * (j === 0 ? 1 : Math.pow(y, j));
  }
  return sum;
}

/** The sum over y alone (ideal-gas parts, I empty). */
export function seriesInY(t: Terms, y: number): { f: number; fy: number; fyy: number } {
  let f = 0;
  let fy = 0;
  let fyy = 0;
  for (let k = 0; k < t.n.length; k++) {
    const j = t.J[k] as number;
    const n = t.n[k] as number;
    f += n * (j === 0 ? 1 : Math.pow(y, j));
    if (j !== 0) {
      fy += n * j * Math.pow(y, j - 1);
      if (j !== 1) fyy += n * j * (j - 1) * Math.pow(y, j - 2);
    }
  }
  return { f, fy, fyy };
}

/**
 * The sum and all first and second derivatives. Powers are formed once per term and divided down,
 * which is exact in floating point to the last bit or two and avoids five extra pow calls.
 * x and y must be nonzero (true everywhere inside the IF97 regions).
 */
export function seriesWithDerivatives(t: Terms, x: number, y: number): SeriesDerivatives {
  let f = 0;
  let fx = 0;
  let fxx = 0;
  let fy = 0;
  let fyy = 0;
  let fxy = 0;
  const ix = 1 / x;
  const iy = 1 / y;
  for (let k = 0; k < t.n.length; k++) {
    const i = t.I[k] as number;
    const j = t.J[k] as number;
    const term = (t.n[k] as number) * Math.pow(x, i) * Math.pow(y, j);
    f += term;
    fx += term * i * ix;
    fxx += term * i * (i - 1) * ix * ix;
    fy += term * j * iy;
    fyy += term * j * (j - 1) * iy * iy;
    fxy += term * i * j * ix * iy;
  }
  return { f, fx, fxx, fy, fyy, fxy };
}
