/**
 * Adaptive Gauss-Kronrod quadrature over finite, semi-infinite and infinite ranges.
 *
 * Method: the range is mapped onto u in [0, 1] (intervalMap.ts), then subdivide.ts runs QUADPACK's
 * DQAGS strategy on it (R. Piessens, E. de Doncker-Kapenga, C. Ueberhuber, D. Kahaner, "QUADPACK",
 * Springer 1983): the 21-point Kronrod / 10-point Gauss pair (gaussKronrod.ts) on the whole range,
 * bisection of the piece with the largest error estimate until the summed (global) estimate meets
 * max(abs, rel * |value|), and Wynn epsilon-algorithm extrapolation (epsilonTable.ts) over the
 * sequence of sums once the error concentrates in the smallest pieces, which is what end-point
 * singularities (x^-alpha, log x) produce.
 *
 * End-point smoothing (the cubic substitution of intervalMap.ts) is chosen by the kind of range:
 * - finite ranges: off by default. Extrapolation handles integrable end-point singularities without it,
 *   and interior peaks and oscillations do not pay for a substitution they do not need (it compresses
 *   the middle of the range by 1.5 and cost 20-40 % more evaluations on them). Measured at rel 1e-10
 *   (bench/numerics.ts) this gives the same evaluation counts as DQAGS: x^-0.9, log x, x^-0.5 on [0, 1]
 *   in 231, a sharp interior peak in 315.
 * - semi-infinite and infinite ranges: on by default. After the 1/t tail map the far end carries
 *   algebraic behaviour (x^-1.5 becomes t^-0.5 dt-like) that the smoothing turns into polynomial
 *   behaviour: x^-1.5 on [1, inf) takes 21 evaluations instead of 231.
 * Pass {smooth: true} for a finite range whose end points are known to behave like |x - a|^-1/2 (one
 * rule then suffices), or {smooth: false} to switch it off on an infinite one.
 *
 * Units: plain numbers; the result has the units of f times the units of x.
 * Validity: f finite on the open range; integrable end-point singularities (|x - a|^-alpha, alpha < 1;
 * logarithms) are handled; interior singularities or discontinuities converge slowly: split the range
 * there. Infinite ranges need f to decay (faster than 1/|x|) and to carry its mass within a few
 * `scale` lengths of the finite end (or of 0 for (-inf, inf)).
 * Accuracy: the error estimate is QUADPACK's: conservative for sums over pieces (for smooth integrands
 * the true error is usually far below it); for an extrapolated value it is the spread of the last
 * three extrapolations, so the returned value is accurate to the request but the estimate is less
 * pessimistic. The estimate cannot go below the rounding limit, about 50 eps * integral|f|: when the
 * request is tighter than that, the result is returned with that limit as its error. Integrals that
 * fail DQAGS's divergence test (e.g. 1/x from 0) throw IntegrationError instead of returning a number.
 */
import { subdivide } from "./subdivide.js";
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
  /** End-point smoothing substitution (default: false on finite ranges, true on infinite ones). */
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
  const smooth = options.smooth ?? !(Number.isFinite(lo) && Number.isFinite(hi));
  const map = intervalMap(lo, hi, smooth, scale);

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

  const out = subdivide(g, { abs, rel, maxEval, poll, evaluations: () => evaluations });
  if (out.shortfall === undefined) {
    return { value: sign * out.value, error: out.error, evaluations, intervals: out.intervals };
  }
  const where = map.x(out.worstAt);
  const requested = Math.max(abs, rel * Math.abs(out.value)).toPrecision(3);
  const estimated = `estimated error ${out.error.toPrecision(3)}, requested ${requested}`;
  const message = {
    maxEval:
      `tolerance not met within maxEval = ${maxEval} evaluations (${estimated}; largest error near x = ${where}). ` +
      `Raise 'maxEval', loosen 'rel'/'abs', or split the range there.`,
    tooSmall:
      `tolerance cannot be met: the error concentrates near x = ${where}, where the subinterval is too small ` +
      `to split (${estimated}). f may be singular or discontinuous there: split the range at that point, or ` +
      `loosen 'rel'/'abs'.`,
    roundoff:
      `tolerance cannot be met: rounding noise in f dominates the error (${estimated}; worst near x = ${where}). ` +
      `Loosen 'rel'/'abs', or compute f with less cancellation.`,
    slow:
      `tolerance not met: the subdivision stopped converging (${estimated}; worst near x = ${where}). f may be ` +
      `singular or discontinuous there: split the range at that point, or loosen 'rel'/'abs'.`,
    divergent:
      `the integral appears to diverge (or converges too slowly to tell): the estimate ` +
      `${(sign * out.value).toPrecision(6)} does not settle as the range is subdivided; the trouble is near ` +
      `x = ${where}. Check that f is integrable there (|x - c|^-p needs p < 1; a tail needs decay faster than 1/|x|).`,
  }[out.shortfall];
  throw new IntegrationError(`${WHERE}: ${message}`, sign * out.value, out.error, evaluations);
}
