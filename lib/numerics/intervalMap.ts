/**
 * Variable changes that turn any integration range (finite, semi-infinite or infinite) into u in [0, 1]
 * and soften end-point behaviour, so one adaptive Gauss-Kronrod loop serves every case.
 *
 * Smoothing: s(u) = u^2 (3 - 2u), s'(u) = 6u(1 - u). Because s' vanishes at both ends, an integrable
 * end-point singularity (x - a)^-alpha becomes u^(1 - 2 alpha) in the u variable: (x - a)^-0.5 turns
 * into a smooth constant and log(x - a) into the mild u log u. For smooth integrands the map is a cubic
 * polynomial and costs little. (Idea: polynomial "sigmoidal" substitutions, see P. J. Davis and
 * P. Rabinowitz, Methods of Numerical Integration, 2nd ed., section 2.9.)
 *
 * Infinite ranges (as in QUADPACK's DQAGI, Piessens et al. 1983):
 *   [a, inf):   x = a + L (1 - t)/t,   dx = L/t^2 dt
 *   (-inf, b]:  x = b - L (1 - t)/t
 *   (-inf, inf): x = L t'/(1 - t'^2) with t' = 2t - 1, dx = L (1 + t'^2)/(1 - t'^2)^2 dt'
 * with t = s(u) when smoothing. L is a length scale: |a| (or |b|) when nonzero, else 1, so that a
 * volume integral from 1e-4 m^3/mol to infinity is spread over t instead of crowded at t = 1.
 *
 * Both s(u) and 1 - s(u) are computed from the nearer end so that distances to an end point keep full
 * relative precision (what a singular integrand needs).
 */

export interface IntervalMap {
  /** x for a given u in [0, 1]; may return +/-Infinity only at the far end of an infinite range. */
  x(u: number): number;
  /** dx/du at u. */
  jacobian(u: number): number;
}

/** p = s(u) and q = 1 - s(u), each accurate where it is small. */
function ends(u: number, smooth: boolean): { p: number; q: number; ds: number } {
  if (!smooth) return { p: u, q: 1 - u, ds: 1 };
  const v = 1 - u;
  if (u <= 0.5) {
    const p = u * u * (3 - 2 * u);
    return { p, q: 1 - p, ds: 6 * u * v };
  }
  const q = v * v * (3 - 2 * v); // 1 - s(u) = s(1 - u) by symmetry
  return { p: 1 - q, q, ds: 6 * u * v };
}

/**
 * Builds the map for a <= b (the caller swaps and negates otherwise). `scale` overrides L for infinite
 * ranges; `smooth` turns the end-point smoothing on.
 */
export function intervalMap(a: number, b: number, smooth: boolean, scale?: number): IntervalMap {
  const aFinite = Number.isFinite(a);
  const bFinite = Number.isFinite(b);
  if (aFinite && bFinite) {
    const w = b - a;
    return {
      x(u) {
        const { p, q } = ends(u, smooth);
        return p <= 0.5 ? a + w * p : b - w * q;
      },
      jacobian: (u) => w * ends(u, smooth).ds,
    };
  }
  if (aFinite || bFinite) {
    const anchor = aFinite ? a : b;
    const L = scale ?? (anchor !== 0 ? Math.abs(anchor) : 1);
    const sign = aFinite ? 1 : -1;
    return {
      // u = 1 is the finite end; u = 0 is infinity. For the lower-infinite case the variable runs
      // from -inf (u = 0) to b (u = 1), so dx/du stays positive in both cases.
      x(u) {
        const { p, q } = ends(u, smooth);
        return anchor + (sign * L * q) / p;
      },
      jacobian(u) {
        const { p, ds } = ends(u, smooth);
        return (L * ds) / (p * p);
      },
    };
  }
  const L = scale ?? 1;
  return {
    x(u) {
      const { p, q } = ends(u, smooth);
      return (L * (p - q)) / (4 * p * q);
    },
    jacobian(u) {
      const { p, q, ds } = ends(u, smooth);
      const t = p - q;
      return (2 * ds * L * (1 + t * t)) / (16 * p * p * q * q);
    },
  };
}
