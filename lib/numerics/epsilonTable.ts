/**
 * Wynn's epsilon algorithm: extrapolates the limit of a slowly converging sequence S_1, S_2, ...
 * (here: the running sum of an adaptive quadrature while the interval next to an end-point
 * singularity is halved again and again).
 *
 * Method: P. Wynn, "On a device for computing the e_m(S_n) transformation", Mathematical Tables and
 * Other Aids to Computation 10 (1956) 91-96. Each new element updates the lower diagonal of the
 * epsilon table; the even columns are the Shanks transforms e_k(S_n). This is the bookkeeping of
 * QUADPACK's routine DQELG (R. Piessens, E. de Doncker-Kapenga, C. Ueberhuber, D. Kahaner, "QUADPACK:
 * A Subroutine Package for Automatic Integration", Springer 1983, section 3.4 and appendix): at most
 * 50 elements are kept, irregular parts of the table are dropped, and the error estimate compares the
 * last three extrapolated values, so it is pessimistic until four extrapolations exist (it reports
 * Number.MAX_VALUE before that).
 *
 * Accuracy: exact (to rounding) for sequences S_n = S + sum of k geometric terms c_i q_i^n after 2k + 1
 * elements; such sums are what bisection produces next to x^-alpha and log x end points.
 */

const EPS = Number.EPSILON;
const HUGE = Number.MAX_VALUE;
/** Most elements kept (QUADPACK's limexp). */
const LIMIT = 50;

export interface Extrapolation {
  /** Extrapolated limit (or the latest element when the table is too short). */
  value: number;
  /** Error estimate of value; Number.MAX_VALUE until three extrapolations have been made. */
  error: number;
}

export class EpsilonTable {
  // 1-based like DQELG's epstab(52), with room for the two scratch elements past the last one.
  private readonly table = new Float64Array(LIMIT + 6);
  private n = 0;
  private readonly lastThree: number[] = [0, 0, 0];
  private calls = 0;

  /** Number of sequence elements currently in the table (may shrink when extrapolate drops a part). */
  get size(): number {
    return this.n;
  }

  /** Appends the next element of the sequence. */
  push(x: number): void {
    this.n++;
    this.table[this.n] = x;
  }

  /** Extrapolated limit of the sequence pushed so far. */
  extrapolate(): Extrapolation {
    const ep = this.table;
    this.calls++;
    let n = this.n;
    let error = HUGE;
    let result = ep[n]!;
    if (n < 3) return { value: result, error: Math.max(error, 5 * EPS * Math.abs(result)) };
    ep[n + 2] = ep[n]!;
    const newElements = (n - 1) >> 1;
    ep[n] = HUGE;
    const num = n;
    let k1 = n;
    for (let i = 1; i <= newElements; i++) {
      const k2 = k1 - 1;
      const k3 = k1 - 2;
      let res = ep[k1 + 2]!;
      const e0 = ep[k3]!;
      const e1 = ep[k2]!;
      const e2 = res;
      const e1abs = Math.abs(e1);
      const delta2 = e2 - e1;
      const err2 = Math.abs(delta2);
      const tol2 = Math.max(Math.abs(e2), e1abs) * EPS;
      const delta3 = e1 - e0;
      const err3 = Math.abs(delta3);
      const tol3 = Math.max(e1abs, Math.abs(e0)) * EPS;
      if (err2 <= tol2 && err3 <= tol3) {
        // e0, e1, e2 agree to rounding: the sequence has converged; the table is left as it is.
        return { value: res, error: Math.max(err2 + err3, 5 * EPS * Math.abs(res)) };
      }
      const e3 = ep[k1]!;
      ep[k1] = e1;
      const delta1 = e1 - e3;
      const err1 = Math.abs(delta1);
      const tol1 = Math.max(e1abs, Math.abs(e3)) * EPS;
      // Two elements equal to rounding, or an irregular (nearly singular) step: keep only the part of
      // the table above this row.
      if (err1 <= tol1 || err2 <= tol2 || err3 <= tol3) {
        n = i + i - 1;
        break;
      }
      const ss = 1 / delta1 + 1 / delta2 - 1 / delta3;
      if (!(Math.abs(ss * e1) > 1e-4)) {
        n = i + i - 1;
        break;
      }
      res = e1 + 1 / ss;
      ep[k1] = res;
      k1 -= 2;
      const err = err2 + Math.abs(res - e2) + err3;
      if (err <= error) {
        error = err;
        result = res;
      }
    }
    // Shift the table: drop the oldest elements of each diagonal.
    if (n === LIMIT) n = 2 * (LIMIT / 2) - 1;
    let ib = num % 2 === 0 ? 2 : 1;
    for (let i = 1; i <= newElements + 1; i++) {
      ep[ib] = ep[ib + 2]!;
      ib += 2;
    }
    if (num !== n) {
      let from = num - n + 1;
      for (let i = 1; i <= n; i++) ep[i] = ep[from++]!;
    }
    this.n = n;
    const last = this.lastThree;
    if (this.calls < 4) {
      last[this.calls - 1] = result;
      error = HUGE;
    } else {
      error = Math.abs(result - last[2]!) + Math.abs(result - last[1]!) + Math.abs(result - last[0]!);
      last[0] = last[1]!;
      last[1] = last[2]!;
      last[2] = result;
    }
    return { value: result, error: Math.max(error, 5 * EPS * Math.abs(result)) };
  }
}
