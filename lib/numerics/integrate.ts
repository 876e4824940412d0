/**
 * Adaptive Gauss-Kronrod quadrature over finite, semi-infinite and infinite ranges.
 *
 * Method: the range is mapped onto u in [0, 1] (intervalMap.ts: infinite-range transformation plus a
 * cubic end-point smoothing substitution), then the 21-point Kronrod / 10-point Gauss pair
 * (gaussKronrod.ts, QUADPACK DQK21 constants and error estimate) is applied to the whole range and the
 * subinterval with the largest error estimate is bisected until the summed (global) error estimate
 * meets max(abs, rel * |value|). Same global strategy as QUADPACK's DQAG (Piessens et al., 1983),
 * without its epsilon-algorithm extrapolation; the smoothing substitution does that job for end-point
 * singularities.
 *
 * Units: plain numbers; the result has the units of f times the units of x.
 * Validity: f finite on the open range; integrable end-point singularities (|x - a|^-alpha, alpha < 1;
 * logarithms) are handled; interior singularities or discontinuities converge slowly: split the range
 * there. Infinite ranges need f to decay (faster than 1/|x|) and to carry its mass within a few
 * `scale` lengths of the finite end (or of 0 for (-inf, inf)).
 * Accuracy: the error estimate is conservative (QUADPACK's); for smooth integrands the true error is
 * usually far below it. The estimate cannot go below the rounding limit, about 50 eps * integral|f|:
 * when the request is tighter than that, the result is returned with that limit as its error.
 */
import { kronrod21 } from "./gaussKronrod.js";
import { ErrorHeap } from "./errorHeap.js";
import { intervalMap } from "./intervalMap.js";
import { IntegrationError, NumericsInputError } from "./errors.js";
import {
  optionCount,
  optionNumber,
  requireFunction,
  requireKnownOptions,
  requireNumber,
  stopper,
} from "./checks.js";

export interface IntegrateOptions {
  /** Absolute error target (default 0). */
  abs?: number;
  /** Relative error target (default 1e-10). */
  rel?: number;
  /** Maximum number of f evaluations (default 50,000). */
  maxEval?: number;
  /** Length scale L for infinite ranges (default |finite end|, or 1 when that is 0). */
  scale?: number;
  /** End-point smoothing substitution (default true). */
  smooth?: boolean;
  /** Polled once per subdivision; returning true throws StopRequested. */
  shouldStop?: () => boolean;
}

export interface IntegrateResult {
  value: number;
  /** Estimated absolute error of value. */
  error: number;
  /** Number of calls to f. */
  evaluations: number;
  /** Number of subintervals in the final partition. */
  intervals: number;
}

const WHERE = "integrate";
const KNOWN = ["abs", "rel", "maxEval", "scale", "smooth", "shouldStop"] as const;
const EPS = Number.EPSILON;
// Smallest u worth splitting near 0: keeps x = a + w u^2 (smoothing) far above underflow.
const MIN_U = 1e-100;

/** Integral of f from a to b (either may be +/-Infinity; a > b gives the negated integral). */
export function integrate(
  f: (x: number) => number,
  a: number,
  b: number,
  options: IntegrateOptions = {},
): IntegrateResult {
  requireFunction(WHERE, "f", f);
  requireNumber(WHERE, "a", a, true);
  requireNumber(WHERE, "b", b, true);
  requireKnownOptions(WHERE, options, KNOWN);
  const abs = optionNumber(WHERE, "abs", options.abs, 0, 0);
  const rel = optionNumber(WHERE, "rel", options.rel, 1e-10, 0);
  if (abs === 0 && rel === 0) {
    throw new NumericsInputError(`${WHERE}: options 'abs' and 'rel' are both 0; at least one must be > 0`);
  }
  const maxEval = optionCount(WHERE, "maxEval", options.maxEval, 50_000, 21);
  const scale = options.scale === undefined ? undefined : optionNumber(WHERE, "scale", options.scale, 1, 0, true);
  if (options.smooth !== undefined && typeof options.smooth !== "boolean") {
    throw new NumericsInputError(`${WHERE}: option 'smooth' must be true or false; got ${String(options.smooth)}`);
  }
  const poll = stopper(WHERE, options.shouldStop);

  if (a === b) return { value: 0, error: 0, evaluations: 0, intervals: 0 };
  const sign = a < b ? 1 : -1;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  const map = intervalMap(lo, hi, options.smooth ?? true, scale);

  let evaluations = 0;
  const g = (u: number): number => {
    const x = map.x(u);
    // Only reachable at the far end of an infinite range after deep subdivision: the tail there
    // contributes nothing a decaying f could add.
    if (!Number.isFinite(x)) return 0;
    const fx = f(x);
    evaluations++;
    if (typeof fx !== "number" || !Number.isFinite(fx)) {
      const atEnd = x === lo || x === hi;
      throw new IntegrationError(
        `${WHERE}: f returned ${typeof fx === "number" ? String(fx) : `a non-number (${typeof fx})`} at x = ${x}; ` +
          (atEnd
            ? `resolving a singularity there moved the sample point onto the end point in double precision, ` +
              `so the tolerance cannot be met: loosen 'rel'/'abs', or write f in terms of the distance from that end`
            : `the integrand must be finite on the open range (${lo}, ${hi})`),
        NaN,
        NaN,
        evaluations,
      );
    }
    return fx === 0 ? 0 : fx * map.jacobian(u);
  };

  const heap = new ErrorHeap();
  const first = kronrod21(g, 0, 1);
  heap.push({ lo: 0, hi: 1, ...first });
  let value = first.value;
  let error = first.error;
  let resabs = first.resabs;

  for (;;) {
    poll();
    const target = Math.max(abs, rel * Math.abs(value));
    // The rounding floor: each piece's estimate is at least 50 eps resabs, so the sum never drops
    // below about 50 eps * integral|f|; asking for less than twice that cannot be met by bisection.
    const floor = 100 * EPS * resabs;
    if (error <= target || error <= floor) {
      // Recompute the sums from the pieces so running-sum drift cannot decide convergence.
      const totals = sum(heap);
      value = totals.value;
      error = totals.error;
      resabs = totals.resabs;
      if (error <= Math.max(abs, rel * Math.abs(value)) || error <= 100 * EPS * resabs) {
        return { value: sign * value, error, evaluations, intervals: heap.size };
      }
    }
    const worst = heap.pop()!;
    const mid = 0.5 * (worst.lo + worst.hi);
    if (!(mid > worst.lo && mid < worst.hi) || worst.hi - worst.lo < 64 * EPS * Math.max(Math.abs(mid), MIN_U)) {
      throw new IntegrationError(
        `${WHERE}: tolerance cannot be met: the error concentrates near x = ${map.x(mid)}, where the ` +
          `subinterval is too small to split (estimated error ${error.toPrecision(3)}, requested ` +
          `${Math.max(abs, rel * Math.abs(value)).toPrecision(3)}). f may be singular or discontinuous ` +
          `there: split the range at that point, or loosen 'rel'/'abs'.`,
        sign * value,
        error,
        evaluations,
      );
    }
    if (evaluations + 42 > maxEval) {
      throw new IntegrationError(
        `${WHERE}: tolerance not met within maxEval = ${maxEval} evaluations (estimated error ` +
          `${error.toPrecision(3)}, requested ${Math.max(abs, rel * Math.abs(value)).toPrecision(3)}; ` +
          `largest error near x = ${map.x(mid)}). Raise 'maxEval', loosen 'rel'/'abs', or split the range there.`,
        sign * value,
        error,
        evaluations,
      );
    }
    const left = kronrod21(g, worst.lo, mid);
    const right = kronrod21(g, mid, worst.hi);
    heap.push({ lo: worst.lo, hi: mid, ...left });
    heap.push({ lo: mid, hi: worst.hi, ...right });
    value += left.value + right.value - worst.value;
    error += left.error + right.error - worst.error;
    resabs += left.resabs + right.resabs - worst.resabs;
  }
}

function sum(heap: ErrorHeap): { value: number; error: number; resabs: number } {
  let value = 0;
  let error = 0;
  let resabs = 0;
  for (const p of heap.all()) {
    value += p.value;
    error += p.error;
    resabs += p.resabs;
  }
  return { value, error, resabs };
}
