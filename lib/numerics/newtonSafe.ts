/**
 * Safeguarded Newton's method on a bracket (rtsafe: Press et al., Numerical Recipes, 3rd ed., section
 * 9.4): Newton steps while they stay inside the shrinking bracket and shrink the step fast enough,
 * bisection otherwise. Quadratic convergence near a simple root, never worse than bisection.
 *
 * Units: plain numbers; df must be the derivative of f. Validity: f(lo) and f(hi) of opposite sign.
 * Accuracy: |x - root| <= xtol + rtol |x| when it returns (the last step size), which is also `error`.
 * `evaluations` counts calls of f plus calls of df.
 */
import { RootError, NumericsInputError } from "./errors.js";
import { optionCount, optionNumber, requireFunction, requireKnownOptions, requireNumber, stopper } from "./checks.js";
import type { RootResult } from "./brent.js";

export interface NewtonSafeOptions {
  /** Absolute x tolerance (default 0). */
  xtol?: number;
  /** Relative x tolerance (default 4 eps). */
  rtol?: number;
  /** Iteration limit (default 200). */
  maxIter?: number;
  shouldStop?: () => boolean;
}

const WHERE = "newtonSafe";
const KNOWN = ["xtol", "rtol", "maxIter", "shouldStop"] as const;

export function newtonSafe(
  f: (x: number) => number,
  df: (x: number) => number,
  lo: number,
  hi: number,
  options: NewtonSafeOptions = {},
): RootResult {
  requireFunction(WHERE, "f", f);
  requireFunction(WHERE, "df", df);
  requireNumber(WHERE, "lo", lo);
  requireNumber(WHERE, "hi", hi);
  requireKnownOptions(WHERE, options, KNOWN);
  const xtol = optionNumber(WHERE, "xtol", options.xtol, 0, 0);
  const rtol = optionNumber(WHERE, "rtol", options.rtol, 4 * Number.EPSILON, 0);
  const maxIter = optionCount(WHERE, "maxIter", options.maxIter, 200);
  const poll = stopper(WHERE, options.shouldStop);
  if (lo === hi) throw new NumericsInputError(`${WHERE}: 'lo' and 'hi' are equal (${lo}); give an interval`);

  let evaluations = 0;
  const check = (name: string, x: number, y: unknown): number => {
    if (typeof y !== "number" || !Number.isFinite(y)) {
      throw new RootError(`${WHERE}: ${name} returned ${String(y)} at x = ${x}`, x, evaluations);
    }
    return y;
  };
  const fl = check("f", lo, f(lo));
  const fh = check("f", hi, f(hi));
  evaluations += 2;
  if (fl === 0) return { value: lo, error: 0, residual: 0, evaluations, iterations: 0 };
  if (fh === 0) return { value: hi, error: 0, residual: 0, evaluations, iterations: 0 };
  if (Math.sign(fl) === Math.sign(fh)) {
    throw new RootError(
      `${WHERE}: f(lo) = ${fl} at lo = ${lo} and f(hi) = ${fh} at hi = ${hi} have the same sign, so no root is bracketed`,
      NaN,
      evaluations,
    );
  }
  // Orient so that f(xl) < 0 < f(xh).
  let xl = fl < 0 ? lo : hi;
  let xh = fl < 0 ? hi : lo;
  let x = 0.5 * (lo + hi);
  let dxOld = Math.abs(hi - lo);
  let dx = dxOld;
  let fx = check("f", x, f(x));
  let dfx = check("df", x, df(x));
  evaluations += 2;
  for (let iter = 1; iter <= maxIter; iter++) {
    poll();
    const newtonLeaves = ((x - xh) * dfx - fx) * ((x - xl) * dfx - fx) > 0;
    const newtonSlow = Math.abs(2 * fx) > Math.abs(dxOld * dfx);
    if (newtonLeaves || newtonSlow) {
      dxOld = dx;
      dx = 0.5 * (xh - xl);
      x = xl + dx;
    } else {
      dxOld = dx;
      dx = fx / dfx;
      x -= dx;
    }
    const tol = xtol + rtol * Math.abs(x);
    if (Math.abs(dx) <= tol) {
      return { value: x, error: Math.abs(dx), residual: fx, evaluations, iterations: iter };
    }
    fx = check("f", x, f(x));
    dfx = check("df", x, df(x));
    evaluations += 2;
    if (fx === 0) return { value: x, error: 0, residual: 0, evaluations, iterations: iter };
    if (fx < 0) xl = x;
    else xh = x;
  }
  throw new RootError(`${WHERE}: no convergence within maxIter = ${maxIter} iterations (last x = ${x})`, x, evaluations);
}
