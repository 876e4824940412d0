/**
 * Water and steam by IAPWS-IF97 as a model of the language: `if97()` returns a model value that
 * state(), psat(), tsat(), volume() and zfactor() route to lib/thermo's IF97 implementation.
 * IF97 is mass-based; molar fields use M = 18.015268 g/mol (IAPWS).
 */
import {
  R, WATER_P_CRIT_MPA, WATER_T_CRIT, WATER_VALIDITY, M_WATER, if97State, kelvinText, pressureText, toMolar, waterResidual,
  type IF97Input, type WaterState,
} from "../../thermo/index.js";
import { thermoValue, type ModelData } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { guard } from "./thermoArgs.js";

export const IF97_LABEL = "IAPWS-IF97 (water and steam)";
export const IF97_SOURCE = "IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic Properties of Water and Steam";
export const IF97_REFERENCE = "IAPWS-IF97: saturated liquid water at the triple point, u = 0, s = 0";

/** An SI row of a state record (numbers in SI units, text fields as strings). */
export type Row = Record<string, number | string>;

/** Row of a water state; `phase` (if not "stable") must match IF97's single stable phase. */
export function waterRow(st: WaterState, fn: string, phase?: string): Row {
  if (phase && phase !== "stable" && st.phase !== phase && !(st.phase === "two-phase")) {
    throw new ArgumentError(`argument phase of ${fn}(): water at T = ${kelvinText(st.T)}, P = ${pressureText(st.p)} is ${st.phase} (IF97 region ${st.region}); IF97 gives only the stable phase, so "${phase}" cannot be had here`);
  }
  const m = toMolar(st);
  const row: Row = { T: st.T, P: st.p, phase: st.phase };
  if (st.phase === "two-phase") row.x = st.x;
  Object.assign(row, {
    V: m.V, v: st.v, rho: st.rho, Z: (st.p * m.V) / (R * st.T),
    H: m.H, S: m.S, U: m.U, G: m.G, A: m.A,
    h: st.h, s: st.s, u: st.u, g: st.g, a: st.a,
    Cp: m.Cp, Cv: m.Cv, cp: st.cp, cv: st.cv, w: st.w,
  });
  Object.assign(row, departureFields(st));
  const notes: string[] = [`IF97 region ${st.region}`];
  if (Math.abs(st.T / WATER_T_CRIT - 1) < 0.03 && Math.abs(st.p / (WATER_P_CRIT_MPA * 1e6) - 1) < 0.1) {
    notes.push("near the critical point (647.096 K, 22.064 MPa): properties change steeply here");
  }
  if (st.phase === "two-phase") notes.push("two-phase (vapour fraction in x): Cp, Cv and w are undefined inside the dome");
  row.notes = notes.join("; ");
  return row;
}

/**
 * Molar departures HR, SR, UR, GR, AR and phi, lnphi, f of a water state, against IF97's own ideal-gas
 * part (region 2 Table 10; region 5 Table 37 above 1073.15 K), so they vanish as P -> 0.
 */
function departureFields(st: WaterState): Row {
  const r = waterResidual(st);
  return {
    HR: r.hr * M_WATER, SR: r.sr * M_WATER, UR: r.ur * M_WATER, GR: r.gr * M_WATER, AR: r.ar * M_WATER,
    phi: r.phi, lnphi: r.lnphi, f: r.f,
  };
}

/**
 * departure(if97(), T, P): the departure record (T, P, V, Z, phase, HR, SR, UR, GR, AR, lnphi, phi; the same
 * fields as for an equation of state) of the stable IF97 state; state() carries f as well. Only the closed route exists: IF97 is a Gibbs/Helmholtz fit, not a P(T, V) model.
 */
export function waterDeparture(T: number, P: number, options: Record<string, unknown>, fn: string): Row {
  if (options.route !== undefined && options.route !== "closed") {
    throw new ArgumentError(`option route of ${fn}(): if97() has only the "closed" route (its residual part against the IF97 ideal-gas equation); "integrate" needs a pressure-explicit model such as pr("water")`);
  }
  const st = guard(fn, () => if97State({ T, p: P }), rename);
  const ph = options.phase === "vapour" ? "vapor" : (options.phase as string | undefined);
  waterRow(st, fn, ph); // rejects a phase IF97 cannot give, with the usual message
  const V = st.v * M_WATER;
  const { HR, SR, UR, GR, AR, lnphi, phi } = departureFields(st);
  return { T, P, V, phase: st.phase, route: "closed", Z: (P * V) / (R * T), HR, SR, UR, GR, AR, lnphi, phi };
}

const rename = { p: "P", input: "spec" };

export function waterAt(T: number, P: number, fn: string, phase?: string): Row {
  return waterRow(guard(fn, () => if97State({ T, p: P }), rename), fn, phase);
}

/** A water state from a two-property spec in SI (molar or specific keys already known). */
export function waterFromSpec(spec: Record<string, number>, fn: string): Row {
  const keys = Object.keys(spec).sort().join(",");
  let input: IF97Input;
  switch (keys) {
    case "P,T": input = { T: spec.T!, p: spec.P! }; break;
    case "H,P": input = { p: spec.P!, h: spec.H! / M_WATER }; break;
    case "P,h": input = { p: spec.P!, h: spec.h! }; break;
    case "P,S": input = { p: spec.P!, s: spec.S! / M_WATER }; break;
    case "P,s": input = { p: spec.P!, s: spec.s! }; break;
    case "H,S": input = { h: spec.H! / M_WATER, s: spec.S! / M_WATER }; break;
    case "H,s": input = { h: spec.H! / M_WATER, s: spec.s! }; break;
    case "S,h": input = { h: spec.h!, s: spec.S! / M_WATER }; break;
    case "h,s": input = { h: spec.h!, s: spec.s! }; break;
    case "T,x": input = { T: spec.T!, x: spec.x! }; break;
    case "P,x": input = { p: spec.P!, x: spec.x! }; break;
    default:
      throw new ArgumentError(`argument spec of ${fn}(): if97() takes the pairs {T, P}, {P, H or h}, {P, S or s}, {H or h, S or s}, {T, x} or {P, x}; got {${Object.keys(spec).join(", ")}}`);
  }
  return waterRow(guard(fn, () => if97State(input), rename), fn);
}

export function if97Model(ctx: BuiltinContext) {
  const data: ModelData = {
    kind: "model", id: "if97", label: IF97_LABEL, source: IF97_SOURCE, fluidText: "water", M: M_WATER,
    Tc: WATER_T_CRIT, Pc: WATER_P_CRIT_MPA * 1e6,
  };
  const fields: Record<string, unknown> = {
    model: IF97_LABEL,
    fluid: "water",
    source: IF97_SOURCE,
    reference: IF97_REFERENCE,
    M: ctx.units.fromSI(M_WATER, "g/mol"),
    Tc: ctx.units.fromSI(WATER_T_CRIT, "K"),
    Pc: ctx.units.fromSI(WATER_P_CRIT_MPA * 1e6, "pressure"),
    validity: WATER_VALIDITY,
  };
  const record = { ...fields };
  return thermoValue(data, fields, () => ctx.bundleOf(record), () => `if97(): ${IF97_LABEL}`);
}

export const water: BuiltinDef[] = [
  defineBuiltin({
    name: "if97",
    group: "thermo",
    params: [],
    returns: "model",
    doc: "Water and steam by the industrial standard IAPWS-IF97, used with the same built-ins as every other model: state(if97(), T, P), state(if97(), {P: .., h: ..}), state(if97(), {h: .., s: ..}), departure(if97(), T, P), psat(if97(), T), tsat(if97(), P), volume(), zfactor(). States carry the departures HR, SR, UR, GR, AR, phi, lnphi and f against IF97's own ideal-gas part.",
    method: "IF97 regions 1, 2, 3 and 5 (Gibbs and Helmholtz free-energy equations), region 4 saturation line, B23 boundary and the backward equations T(p,h), T(p,s), p(h,s) as starting points, refined on the basic equations. Departures: total minus the IF97 ideal-gas part (region 2 Table 10; region 5 Table 37 above 1073.15 K) at the same T and P. Mass-based; molar values with M = 18.015268 g/mol.",
    source: IF97_SOURCE,
    examples: ["if97()", "state(if97(), 500 K, 10 bar).h", "state(if97(), {h: 3000 kJ/kg, s: 6.5 kJ/(kg K)}).P", "departure(if97(), 500 K, 10 bar).phi"],
    impl: (_args, ctx) => if97Model(ctx),
  }),
];
