/**
 * Globally adaptive bisection with epsilon-algorithm extrapolation on u in [0, 1]: the loop behind
 * `integrate` once the range has been mapped.
 *
 * Method: QUADPACK's DQAGS (Piessens et al., "QUADPACK", Springer 1983, section 3.4.2). The K21/G10
 * rule (gaussKronrod.ts) is applied to [0, 1]; the piece with the largest error estimate is bisected
 * until the summed estimate meets max(abs, rel |value|). When the piece to bisect next is one of the
 * smallest ("small" halves at each stage), the larger pieces are first brought below the target, then
 * the running sum joins a Wynn epsilon table (epsilonTable.ts): next to an end-point singularity the
 * successive sums converge geometrically, and the table extrapolates their limit long before
 * bisection alone would get there. Smooth, peaked and oscillating integrands never reach that branch
 * and cost exactly what plain bisection costs. Round-off and divergence tests are DQAGS's.
 *
 * This file works on the mapped integrand only; integrate.ts checks arguments and turns a failed
 * outcome into an IntegrationError naming x.
 */
import { kronrod21, type RuleResult } from "./gaussKronrod.js";
import { EpsilonTable } from "./epsilonTable.js";

const EPS = Number.EPSILON;
const HUGE = Number.MAX_VALUE;
// Smallest u worth splitting near 0: keeps the mapped x far above underflow.
const MIN_U = 1e-100;

interface Piece extends RuleResult {
  lo: number;
  hi: number;
}

export interface SubdivideSettings {
  abs: number;
  rel: number;
  maxEval: number;
  /** Evaluations of g so far (the caller counts them). */
  evaluations: () => number;
  /** Polled once per bisection; throws to stop. */
  poll: () => void;
}

/** Why the loop stopped short of the tolerance (undefined: it met it). */
export type Shortfall = "maxEval" | "tooSmall" | "roundoff" | "slow" | "divergent";

export interface SubdivideOutcome {
  value: number;
  error: number;
  intervals: number;
  /** Whether the value came from the epsilon extrapolation rather than the sum over pieces. */
  extrapolated: boolean;
  /** Set when the tolerance was not met. */
  shortfall?: Shortfall;
  /** u where the error concentrated (the last piece chosen for bisection). */
  worstAt: number;
}

/** Integral of g over [0, 1] (see the file comment). */
export function subdivide(g: (u: number) => number, s: SubdivideSettings): SubdivideOutcome {
  const first = kronrod21(g, 0, 1);
  const pieces: Piece[] = [{ lo: 0, hi: 1, ...first }];
  const defabs = first.resabs;
  let area = first.value;
  let errsum = first.error;
  let absSum = first.resabs;
  const bound = (v: number) => Math.max(s.abs, s.rel * Math.abs(v));
  // The rounding floor: each piece's estimate is at least 50 eps resabs, so the sum never drops below
  // about 50 eps integral|g|; asking for less than twice that cannot be met by bisection.
  const floor = () => 100 * EPS * absSum;
  if ((first.error <= bound(area) && first.error !== first.resasc) || first.error === 0 || first.error <= floor()) {
    return { value: area, error: first.error, intervals: 1, extrapolated: false, worstAt: 0.5 };
  }

  const table = new EpsilonTable();
  table.push(area);
  let result = area; // best extrapolated value and its error (HUGE: none yet)
  let abserr = HUGE;
  let small = 0.375;
  let erlarg = 0;
  let ertest = 0;
  let correc = 0;
  let extrap = false;
  let noext = false;
  let ktmin = 0;
  let iroff1 = 0;
  let iroff2 = 0;
  let iroff3 = 0;
  let tableRoundoff = false;
  let shortfall: Shortfall | undefined;
  const ksgn = Math.abs(area) >= (1 - 50 * EPS) * defabs ? 1 : -1;
  let next = 0;
  let worstAt = 0.5;

  for (let last = 2; ; last++) {
    s.poll();
    const worst = pieces[next]!;
    const mid = 0.5 * (worst.lo + worst.hi);
    worstAt = mid;
    if (!(mid > worst.lo && mid < worst.hi) || worst.hi - worst.lo < 64 * EPS * Math.max(Math.abs(mid), MIN_U)) {
      shortfall = "tooSmall";
      break;
    }
    if (s.evaluations() + 42 > s.maxEval) {
      shortfall = "maxEval";
      break;
    }
    const left = kronrod21(g, worst.lo, mid);
    const right = kronrod21(g, mid, worst.hi);
    const area12 = left.value + right.value;
    const erro12 = left.error + right.error;
    errsum += erro12 - worst.error;
    area += area12 - worst.value;
    absSum += left.resabs + right.resabs - worst.resabs;
    if (left.resasc !== left.error && right.resasc !== right.error) {
      // Bisection changed neither the value nor the error: rounding noise dominates.
      if (Math.abs(worst.value - area12) <= 1e-5 * Math.abs(area12) && erro12 >= 0.99 * worst.error) {
        if (extrap) iroff2++;
        else iroff1++;
      }
      if (last > 10 && erro12 > worst.error) iroff3++;
    }
    pieces[next] = { lo: worst.lo, hi: mid, ...left };
    pieces.push({ lo: mid, hi: worst.hi, ...right });
    if (iroff1 + iroff2 >= 10 || iroff3 >= 20) shortfall = "roundoff";
    // Sums that overflow (1/x towards infinity) cannot be a finite integral.
    if (!Number.isFinite(area) || !Number.isFinite(errsum)) {
      shortfall = "divergent";
      break;
    }
    if (iroff2 >= 5) tableRoundoff = true;

    if (errsum <= bound(area) || errsum <= floor()) {
      // Recompute the sums from the pieces so running-sum drift cannot decide convergence.
      ({ area, errsum, absSum } = totals(pieces));
      if (errsum <= bound(area) || errsum <= floor()) {
        return { value: area, error: errsum, intervals: pieces.length, extrapolated: false, worstAt };
      }
    }
    if (shortfall) break;
    if (last === 2) {
      small = 0.375;
      erlarg = errsum;
      ertest = bound(area);
      table.push(area);
      next = largest(pieces, 0);
      continue;
    }
    if (noext) {
      next = largest(pieces, 0);
      continue;
    }
    erlarg -= worst.error;
    if (mid - worst.lo > small) erlarg += erro12;
    if (!extrap) {
      next = largest(pieces, 0);
      if (pieces[next]!.hi - pieces[next]!.lo > small) continue;
      extrap = true;
    }
    if (!tableRoundoff && erlarg > ertest) {
      // The smallest pieces carry the largest error: first bring the larger ones down.
      const large = largest(pieces, small);
      if (large >= 0) {
        next = large;
        continue;
      }
    }
    table.push(area);
    const e = table.extrapolate();
    ktmin++;
    if (ktmin > 5 && abserr < 1e-3 * errsum) shortfall = "slow";
    if (e.error < abserr) {
      ktmin = 0;
      abserr = e.error;
      result = e.value;
      correc = erlarg;
      ertest = bound(result);
      if (abserr <= ertest) break;
    }
    if (table.size === 1) noext = true;
    if (shortfall) break;
    next = largest(pieces, 0);
    extrap = false;
    small *= 0.5;
    erlarg = errsum;
  }
  return finish();

  function finish(): SubdivideOutcome {
    ({ area, errsum, absSum } = totals(pieces));
    const summed = (): SubdivideOutcome => {
      const met = errsum <= bound(area) || errsum <= floor();
      return { value: area, error: errsum, intervals: pieces.length, extrapolated: false, worstAt, ...(met ? {} : { shortfall: shortfall ?? "slow" }) };
    };
    if (shortfall === "divergent") return { value: area, error: errsum, intervals: pieces.length, extrapolated: false, worstAt, shortfall };
    if (abserr === HUGE) return summed();
    if (shortfall !== undefined || tableRoundoff) {
      if (tableRoundoff) abserr += correc;
      if (result !== 0 && area !== 0) {
        if (abserr / Math.abs(result) > errsum / Math.abs(area)) return summed();
      } else if (abserr > errsum) {
        return summed();
      }
    }
    // DQAGS's divergence test: an extrapolated value far from the running sum, or a sum smaller than
    // its own error, means the sequence did not settle on a finite limit.
    let divergent = false;
    if (!(ksgn === -1 && Math.max(Math.abs(result), Math.abs(area)) <= 0.01 * defabs) && area !== 0) {
      const ratio = result / area;
      divergent = !(ratio >= 0.01 && ratio <= 100) || errsum > Math.abs(area);
    }
    const met = abserr <= bound(result) || abserr <= floor();
    const why = divergent ? "divergent" : met ? undefined : (shortfall ?? "slow");
    return { value: result, error: abserr, intervals: pieces.length, extrapolated: true, worstAt, ...(why ? { shortfall: why } : {}) };
  }
}

/** Index of the piece with the largest error among those wider than minWidth (-1 if none). */
function largest(pieces: readonly Piece[], minWidth: number): number {
  let best = -1;
  let bestError = -1;
  for (let i = 0; i < pieces.length; i++) {
    const p = pieces[i]!;
    if (p.error > bestError && p.hi - p.lo > minWidth) {
      best = i;
      bestError = p.error;
    }
  }
  return best;
}

function totals(pieces: readonly Piece[]): { area: number; errsum: number; absSum: number } {
  let area = 0;
  let errsum = 0;
  let absSum = 0;
  for (const p of pieces) {
    area += p.value;
    errsum += p.error;
    absSum += p.resabs;
  }
  return { area, errsum, absSum };
}
