/**
 * The 21-point Gauss-Kronrod rule (10-point Gauss rule embedded) on one interval, with QUADPACK's
 * error estimate.
 *
 * Source of the constants: QUADPACK routine DQK21 (R. Piessens, E. de Doncker-Kapenga, C. Ueberhuber,
 * D. Kahaner, "QUADPACK: A Subroutine Package for Automatic Integration", Springer 1983), which gives
 * them to 33 digits. Nodes are the positive half of [-1, 1] in descending order; the centre node is 0.
 * tests/lib/numerics/gaussKronrod.test.ts checks them against numpy's Gauss-Legendre nodes and against
 * exact integrals of monomials (K21 is exact through degree 31, G10 through degree 19).
 */

/** Kronrod abscissae x_k, k = 0..10 (odd k are the 10-point Gauss nodes). */
export const KRONROD21_NODES: readonly number[] = [
  0.995657163025808080735527280689003, 0.973906528517171720077964012084452,
  0.930157491355708226001207180059508, 0.865063366688984510732096688423493,
  0.780817726586416897063717578345042, 0.679409568299024406234327365114874,
  0.562757134668604683339000099272694, 0.433395394129247190799265943165784,
  0.294392862701460198131126603103866, 0.148874338981631210884826001129720, 0,
];

/** Kronrod weights matching KRONROD21_NODES. */
export const KRONROD21_WEIGHTS: readonly number[] = [
  0.011694638867371874278064396062192, 0.03255816230796472747881897245939,
  0.05475589657435199603138130024458, 0.07503967481091995276704314091619,
  0.093125454583697605535065465083366, 0.109387158802297641899210590325805,
  0.123491976262065851077208980185419, 0.134709217311473325928054001771707,
  0.142775938577060080797094273138717, 0.147739104901338491374841515972068,
  0.149445554002916905664936468389821,
];

/** 10-point Gauss weights for nodes KRONROD21_NODES[1], [3], [5], [7], [9]. */
export const GAUSS10_WEIGHTS: readonly number[] = [
  0.066671344308688137593568809893332, 0.149451349150580593145776339657697,
  0.219086362515982043995534934228163, 0.269266719309996355091226921569469,
  0.295524224714752870173892994651338,
];

const EPS = Number.EPSILON;
const TINY = Number.MIN_VALUE / (50 * EPS);

/** One rule application: Kronrod value, error estimate, and the integrals QUADPACK uses to scale it. */
export interface RuleResult {
  /** 21-point Kronrod estimate of the integral over [a, b]. */
  value: number;
  /** Error estimate (QUADPACK's scaled |K21 - G10|, floored at 50 eps * resabs). */
  error: number;
  /** Kronrod estimate of the integral of |f| (sets the rounding floor). */
  resabs: number;
  /**
   * Kronrod estimate of the integral of |f - mean|; an error estimate equal to it means the rule
   * resolved nothing (QUADPACK skips its round-off counters on such intervals).
   */
  resasc: number;
}

/**
 * Applies K21/G10 to g on [a, b] (21 evaluations of g). The error estimate is QUADPACK's: with
 * resasc = integral of |g - mean|, err = resasc * min(1, (200 |K - G| / resasc)^1.5), and never below
 * 50 eps resabs. This is deliberately pessimistic for rough integrands and sharp for smooth ones, where
 * the actual error is usually far below |K - G|.
 */
export function kronrod21(g: (x: number) => number, a: number, b: number): RuleResult {
  const centre = 0.5 * (a + b);
  const half = 0.5 * (b - a);
  const fc = g(centre);
  let resG = 0;
  let resK = KRONROD21_WEIGHTS[10]! * fc;
  let resabs = Math.abs(resK);
  const f1: number[] = new Array<number>(10);
  const f2: number[] = new Array<number>(10);
  for (let j = 0; j < 10; j++) {
    const dx = half * KRONROD21_NODES[j]!;
    const lo = g(centre - dx);
    const hi = g(centre + dx);
    f1[j] = lo;
    f2[j] = hi;
    const w = KRONROD21_WEIGHTS[j]!;
    resK += w * (lo + hi);
    resabs += w * (Math.abs(lo) + Math.abs(hi));
    if (j & 1) resG += GAUSS10_WEIGHTS[(j - 1) >> 1]! * (lo + hi);
  }
  const mean = 0.5 * resK;
  let resasc = KRONROD21_WEIGHTS[10]! * Math.abs(fc - mean);
  for (let j = 0; j < 10; j++) {
    resasc += KRONROD21_WEIGHTS[j]! * (Math.abs(f1[j]! - mean) + Math.abs(f2[j]! - mean));
  }
  const scale = Math.abs(half);
  const value = resK * half;
  resabs *= scale;
  resasc *= scale;
  let error = Math.abs((resK - resG) * half);
  if (resasc !== 0 && error !== 0) error = resasc * Math.min(1, Math.pow((200 * error) / resasc, 1.5));
  if (resabs > TINY) error = Math.max(50 * EPS * resabs, error);
  return { value, error, resabs, resasc };
}
