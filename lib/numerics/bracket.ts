/**
 * Bracket expansion for root finding: grows [lo, hi] geometrically (factor 1.6, as in Numerical
 * Recipes' zbrac, Press et al., 3rd ed., section 9.1) on the side where |f| is smaller, until f changes
 * sign. A side where f stops being finite (outside the function's domain, e.g. a volume below the
 * co-volume) or reaches the caller's limit is frozen and only the other side grows.
 */
import { RootError } from "./errors.js";

export interface Bracket {
  lo: number;
  hi: number;
  flo: number;
  fhi: number;
  evaluations: number;
}

const GROW = 1.6;

export function expandBracket(
  where: string,
  f: (x: number) => number,
  start: Bracket,
  tries: number,
  lower: number,
  upper: number,
  poll: () => void,
): Bracket {
  let { lo, hi, flo, fhi, evaluations } = start;
  let loFrozen = lo <= lower;
  let hiFrozen = hi >= upper;
  for (let k = 0; k < tries; k++) {
    poll();
    if (Math.sign(flo) !== Math.sign(fhi)) return { lo, hi, flo, fhi, evaluations };
    if (loFrozen && hiFrozen) break;
    const width = hi - lo;
    const growLow = !loFrozen && (hiFrozen || Math.abs(flo) < Math.abs(fhi));
    if (growLow) {
      const x = Math.max(lower, lo - GROW * width);
      const fx = f(x);
      evaluations++;
      if (!Number.isFinite(fx)) loFrozen = true;
      else {
        lo = x;
        flo = fx;
        if (x <= lower) loFrozen = true;
      }
    } else {
      const x = Math.min(upper, hi + GROW * width);
      const fx = f(x);
      evaluations++;
      if (!Number.isFinite(fx)) hiFrozen = true;
      else {
        hi = x;
        fhi = fx;
        if (x >= upper) hiFrozen = true;
      }
    }
  }
  if (Math.sign(flo) !== Math.sign(fhi)) return { lo, hi, flo, fhi, evaluations };
  throw new RootError(
    `${where}: no sign change found after expanding the bracket to [${lo}, ${hi}] ` +
      `(f(${lo}) = ${flo}, f(${hi}) = ${fhi}); the function may have no real root, or an even number of ` +
      `roots in the range: try another starting interval`,
    NaN,
    evaluations,
  );
}
