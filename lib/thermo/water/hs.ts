/**
 * IF97 state from specific enthalpy and entropy, the (h, s) input of a Mollier chart.
 *
 * Method: along an isentrope (dh/dp)_s = v > 0 (from dh = T ds + v dp), so h(p; s) rises monotonically
 * with p and there is at most one state. Start from the backward equations p(h,s) of IAPWS SR2-01(2014)
 * (region 1 Eq. (1), region 2 Eqs. (3)-(5); the candidate whose (p, s) state lands closest in h is kept),
 * then Newton on ln p with the exact slope d h / d ln p = p v, each step a (p, s) flash on the basic
 * equations; a bracket in ln p with bisection catches steps that leave it. Regions 3, 4 (two-phase) and 5
 * have no p(h,s) start here and are reached by the same iteration from the bracket. The returned state
 * satisfies the basic equations: s exactly (it is the (p, s) flash at the final p), h to 1e-9 relative.
 * Validity: the IF97 range; pressures searched from 1 mPa to 100 MPa.
 * Errors: ThermoError("h") when no IF97 state has this h at this s (the message gives the reachable h).
 */
import { ThermoError } from "../errors.js";
import { P_MAX5_MPA, P_MAX_MPA, P_MIN_SAT_MPA, T_25, T_MAX, T_MIN } from "./constants.js";
import { statePS } from "./flash.js";
import type { WaterState } from "./properties.js";
import { region1, region1PofHS } from "./region1.js";
import { region2 } from "./region2.js";
import { region2PofHS } from "./region2Backward.js";
import { region5 } from "./region5.js";

const LN_P_MIN = Math.log(1e-3);
const LN_P_MAX = Math.log(P_MAX_MPA * 1e6);

/** Either a state at ln p or the side on which s left the IF97 range at that pressure. */
type Probe = { st: WaterState; resid: number } | { side: -1 | 1 };

function probe(lnp: number, h: number, s: number): Probe {
  const p = Math.min(Math.exp(lnp), P_MAX_MPA * 1e6); // exp(ln 1e8) rounds a hair above 100 MPa
  const cold = p >= P_MIN_SAT_MPA * 1e6 ? region1(T_MIN, p) : region2(T_MIN, p);
  // s below the 273.15 K value: this pressure is too low for that entropy (isentropes fall in T with p).
  if (s < cold.s) return { side: -1 };
  const hot = p <= P_MAX5_MPA * 1e6 ? region5(T_MAX, p) : region2(T_25, p);
  if (s > hot.s) return { side: 1 };
  const st = statePS(p, s);
  return { st, resid: st.h - h };
}

/** State at specific enthalpy h (J/kg) and specific entropy s (J/(kg K)). */
export function stateHS(h: number, s: number): WaterState {
  if (!Number.isFinite(h)) throw new ThermoError("h", `h must be a finite number in J/kg; got ${h}`);
  if (!Number.isFinite(s)) throw new ThermoError("s", `s must be a finite number in J/(kg K); got ${s}`);
  let lo = LN_P_MIN;
  let hi = LN_P_MAX;
  const tol = 1e-9 * Math.max(Math.abs(h), 1e4);
  let best: { lnp: number; pr: Probe } | undefined;
  for (const guess of [region1PofHS(h, s), region2PofHS(h, s)]) {
    if (!(guess > 1e-3 && guess <= P_MAX_MPA * 1e6)) continue;
    const lnp = Math.log(guess);
    const pr = probe(lnp, h, s);
    if (!("st" in pr)) continue;
    const step = Math.abs(pr.resid / (pr.st.p * pr.st.v));
    if (!best || !("st" in best.pr) || step < Math.abs(best.pr.resid / (best.pr.st.p * best.pr.st.v))) best = { lnp, pr };
  }
  let lnp = best ? best.lnp : (lo + hi) / 2;
  let pr = best ? best.pr : probe(lnp, h, s);
  for (let k = 0; k < 200; k++) {
    let next: number;
    if ("st" in pr) {
      if (Math.abs(pr.resid) <= tol) return pr.st;
      if (pr.resid < 0) lo = lnp;
      else hi = lnp;
      next = lnp - pr.resid / (pr.st.p * pr.st.v);
      if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    } else {
      if (pr.side < 0) lo = lnp;
      else hi = lnp;
      next = (lo + hi) / 2;
    }
    if (hi - lo < 1e-15 || next === lnp) break;
    lnp = next;
    pr = probe(lnp, h, s);
  }
  if ("st" in pr && Math.abs(pr.resid) <= 1e-7 * Math.max(Math.abs(h), 1e4)) return pr.st;
  throw new ThermoError("h", outOfRange(h, s));
}

/** Error text, with the span of h that IF97 reaches at this s (sampled over ln p: a guide, not a bound). */
function outOfRange(h: number, s: number): string {
  let min: WaterState | undefined;
  let max: WaterState | undefined;
  for (let k = 0; k <= 24; k++) {
    let pr: Probe;
    try {
      pr = probe(LN_P_MIN + (k / 24) * (LN_P_MAX - LN_P_MIN), h, s);
    } catch {
      continue;
    }
    if (!("st" in pr)) continue;
    if (!min || pr.st.h < min.h) min = pr.st;
    if (!max || pr.st.h > max.h) max = pr.st;
  }
  const g = (x: number): number => Number(x.toPrecision(4));
  const reach = min && max
    ? ` (at this s, IF97 states have h from about ${g(min.h)} J/kg at p = ${g(min.p)} Pa to ${g(max.h)} J/kg at p = ${g(max.p)} Pa)`
    : " (no IF97 state has this entropy)";
  return `no IF97 state has h = ${h} J/kg and s = ${s} J/(kg K)${reach}; IF97 covers 273.15 K <= T <= 2273.15 K (p <= 100 MPa, p <= 50 MPa above 1073.15 K)`;
}
