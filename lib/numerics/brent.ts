/**
 * Root of f on a bracket by Brent's method (R. P. Brent, Algorithms for Minimization without
 * Derivatives, Prentice-Hall 1973, chapter 4, procedure zero): inverse quadratic interpolation and
 * secant steps, falling back to bisection so the bracket at least halves every two steps.
 *
 * Units: plain numbers. Validity: f continuous on [lo, hi] with f(lo) and f(hi) of opposite sign (or
 * with `expand`, a sign change reachable by growing the bracket). Accuracy: the returned x is within
 * `error` of a sign change of f, error <= xtol + rtol |x| + 4 eps |x| (Brent's guarantee).
 */
import { expandBracket } from "./bracket.js";
import { RootError, NumericsInputError } from "./errors.js";
import {
  optionCount,
  optionNumber,
  requireFunction,
  requireKnownOptions,
  requireNumber,
  stopper,
} from "./checks.js";

export interface BrentOptions {
  /** Absolute x tolerance (default 0). */
  xtol?: number;
  /** Relative x tolerance (default 4 eps, as scipy's brentq). */
  rtol?: number;
  /** Iteration limit (default 500). */
  maxIter?: number;
  /** Grow the bracket when f(lo), f(hi) have the same sign: true (60 tries) or a number of tries. */
  expand?: boolean | number;
  /** Expansion never goes below this (default -Infinity). */
  lower?: number;
  /** Expansion never goes above this (default +Infinity). */
  upper?: number;
  shouldStop?: () => boolean;
}

export interface RootResult {
  /** The root estimate x. */
  value: number;
  /** Bound on |x - root|: the width of the final bracket. */
  error: number;
  /** f(value). */
  residual: number;
  evaluations: number;
  iterations: number;
}

const KNOWN = ["xtol", "rtol", "maxIter", "expand", "lower", "upper", "shouldStop"] as const;
const EPS = Number.EPSILON;

/** Brent's method. `where` names the caller in messages (the language passes "seek"). */
export function brent(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: BrentOptions = {},
  where = "brent",
): RootResult {
  requireFunction(where, "f", f);
  requireNumber(where, "lo", lo);
  requireNumber(where, "hi", hi);
  requireKnownOptions(where, options, KNOWN);
  const xtol = optionNumber(where, "xtol", options.xtol, 0, 0);
  const rtol = optionNumber(where, "rtol", options.rtol, 4 * EPS, 0);
  const maxIter = optionCount(where, "maxIter", options.maxIter, 500);
  const lower = options.lower === undefined ? -Infinity : requireNumber(where, "lower", options.lower, true);
  const upper = options.upper === undefined ? Infinity : requireNumber(where, "upper", options.upper, true);
  const expand = options.expand;
  if (expand !== undefined && typeof expand !== "boolean" && !(Number.isInteger(expand) && expand >= 0)) {
    throw new NumericsInputError(`${where}: option 'expand' must be true, false or a whole number of tries; got ${String(expand)}`);
  }
  const poll = stopper(where, options.shouldStop);
  if (lo > hi) [lo, hi] = [hi, lo];
  if (lo === hi) throw new NumericsInputError(`${where}: 'lo' and 'hi' are equal (${lo}); give an interval`);

  let evaluations = 0;
  const call = (x: number): number => {
    const y = f(x);
    evaluations++;
    if (typeof y !== "number" || Number.isNaN(y)) {
      throw new RootError(`${where}: f returned ${typeof y === "number" ? "NaN" : `a non-number (${typeof y})`} at x = ${x}`, x, evaluations);
    }
    return y;
  };
  let flo = call(lo);
  let fhi = call(hi);
  if (flo === 0) return { value: lo, error: 0, residual: 0, evaluations, iterations: 0 };
  if (fhi === 0) return { value: hi, error: 0, residual: 0, evaluations, iterations: 0 };
  if (Math.sign(flo) === Math.sign(fhi)) {
    const tries = expand === true ? 60 : typeof expand === "number" ? expand : 0;
    if (tries === 0) {
      throw new RootError(
        `${where}: f(lo) = ${flo} at lo = ${lo} and f(hi) = ${fhi} at hi = ${hi} have the same sign, so no ` +
          `root is bracketed; choose lo and hi on either side of the root, or pass {expand: true}`,
        NaN,
        evaluations,
      );
    }
    const grown = expandBracket(where, f, { lo, hi, flo, fhi, evaluations }, tries, lower, upper, poll);
    ({ lo, hi, flo, fhi, evaluations } = grown);
  }

  // Brent's zero: b is the best estimate, c the other end of the bracket, a the previous b.
  let a = lo, fa = flo, b = hi, fb = fhi, c = a, fc = fa;
  let d = b - a, e = d;
  for (let iter = 1; iter <= maxIter; iter++) {
    poll();
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a; fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * EPS * Math.abs(b) + 0.5 * (xtol + rtol * Math.abs(b)) + Number.MIN_VALUE;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) {
      return { value: b, error: fb === 0 ? 0 : Math.abs(c - b), residual: fb, evaluations, iterations: iter };
    }
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number, q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s; q = 1 - s; // secant
      } else {
        const qq = fa / fc, r = fb / fc; // inverse quadratic interpolation
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d; d = p / q;
      } else {
        d = m; e = m;
      }
    } else {
      d = m; e = m;
    }
    a = b; fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = call(b);
  }
  throw new RootError(
    `${where}: no convergence within maxIter = ${maxIter} iterations (bracket [${Math.min(b, c)}, ${Math.max(b, c)}])`,
    b,
    evaluations,
  );
}
