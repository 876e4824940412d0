/**
 * Model values: an equation of state from lib/thermo for a fluid, with the fluid's ideal-gas part
 * (Cp and totals against a declared reference state) and molar mass, ready for state() and friends.
 */
import {
  CP_FORM_UNAVAILABLE, DEFAULT_REFERENCE, R, cautionsFor, cpRangeClass, cpRangeText, enthalpyIntegral, entropyIntegral, idealGas, idealGasCp, idealGasFunctions,
  idealMixingEntropy, leeKesler,
  pseudoCritical, pr, referenceState, rk, srk, vdw, virial,
  type EosModel, type Fluid, type ReferenceState,
} from "../../thermo/index.js";
import { thermoValue, type IdealGasPart, type ModelData, type ThermoValue } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import type { BuiltinContext } from "./define.js";
import { guard } from "./thermoArgs.js";

export const MODEL_IDS = ["idealgas", "vdw", "rk", "srk", "pr", "virial", "lk"] as const;
export type ModelId = (typeof MODEL_IDS)[number];

/** Options each model accepts in its second argument (besides reference). */
const MODEL_OPTIONS: Record<ModelId, Record<string, readonly string[]>> = {
  idealgas: {}, vdw: {}, rk: {}, srk: {}, pr: {},
  virial: { correlation: ["abbott", "tsonopoulos"] },
  lk: { mixing: ["ploecker", "kay"] },
};

function build(id: ModelId, fluid: Fluid, opts: Record<string, string>): EosModel {
  switch (id) {
    case "idealgas": return idealGas(fluid);
    case "vdw": return vdw(fluid);
    case "rk": return rk(fluid);
    case "srk": return srk(fluid);
    case "pr": return pr(fluid);
    case "virial": return virial(fluid, (opts.correlation ?? "abbott") as "abbott" | "tsonopoulos");
    case "lk": return leeKesler(fluid, (opts.mixing ?? "ploecker") as "ploecker" | "kay");
  }
}

/** Reads {T, P, H, S} of a reference-state option (all optional; defaults: 298.15 K, 1 bar, 0, 0). */
function referenceOf(r: unknown, fn: string, ctx: BuiltinContext): ReferenceState {
  if (r === undefined) return DEFAULT_REFERENCE;
  if (typeof r !== "object" || r === null || Object.getPrototypeOf(r) !== Object.prototype) {
    throw new ArgumentError(`option reference of ${fn}() needs a record like {T: 298.15 K, P: 1 bar, H: 0 J/mol, S: 0 J/(mol K)}, got ${ctx.textOf(r)}`);
  }
  const o = r as Record<string, unknown>;
  for (const k of Object.keys(o)) if (!["T", "P", "H", "S"].includes(k)) throw new ArgumentError(`option reference of ${fn}(): unknown field "${k}"; valid: T, P, H, S`);
  const T = o.T === undefined ? DEFAULT_REFERENCE.T : ctx.units.toSI(o.T, "temperature", "reference.T", fn);
  const P = o.P === undefined ? DEFAULT_REFERENCE.P : ctx.units.toSI(o.P, "pressure", "reference.P", fn);
  const H = o.H === undefined ? 0 : ctx.units.toSI(o.H, "molar_energy", "reference.H", fn);
  const S = o.S === undefined ? 0 : ctx.units.toSI(o.S, "molar_entropy", "reference.S", fn);
  return guard(fn, () => referenceState(T, P, H, S), { T0: "reference.T", P0: "reference.P", H0: "reference.H", S0: "reference.S" });
}

/**
 * Ideal-gas part of a fluid, or why it is unavailable (a component without Cp). H and S are composed
 * from lib/thermo's exact Cp integrals (the same formulas as idealGasFunctions documents:
 * H = H0 + sum x_i int Cp_i dT, S = S0 + sum x_i int Cp_i/T dT - R ln(P/P0) - R sum x ln x) without
 * building extrapolation texts per call, which a 10,000-point span would otherwise pay for.
 */
export function idealGasPart(fluid: Fluid, ref: ReferenceState): IdealGasPart | string {
  const missing = fluid.components.filter((c) => c.cp.form === CP_FORM_UNAVAILABLE).map((c) => c.name);
  if (missing.length > 0) return `no ideal-gas Cp for ${missing.join(", ")}: totals H, S, U, G, A and Cp, Cv, w are not available (give the substance a cp)`;
  const f = idealGasFunctions(fluid.components, fluid.x, ref);
  const comps = fluid.components.filter((_, i) => fluid.x[i]! > 0);
  const x = fluid.x.filter((xi) => xi > 0);
  const mixing = idealMixingEntropy(fluid.x);
  return {
    Cp: comps.length === 1 ? (T) => idealGasCp(comps[0]!, T) : f.Cp,
    H: (T) => {
      let H = ref.H;
      for (let i = 0; i < comps.length; i++) H += x[i]! * enthalpyIntegral(comps[i]!, ref.T, T);
      return H;
    },
    S: (T, P) => {
      let S = ref.S + mixing - R * Math.log(P / ref.P);
      for (let i = 0; i < comps.length; i++) S += x[i]! * entropyIntegral(comps[i]!, ref.T, T);
      return S;
    },
    reference: f.reference,
    // One text per component and range (not per T), so a vectorised call lists each caution once.
    // Flagged by lib/thermo's rule (cpRangeClass): beyond 10 % outside the fitted range, "far outside"
    // beyond 50 %; the reference temperature counts too (the totals integrate Cp from it).
    warnings: (T) => {
      let out: string[] | undefined;
      for (const c of comps) {
        const a = cpRangeClass(c.cp.Tmin, c.cp.Tmax, T);
        const b = cpRangeClass(c.cp.Tmin, c.cp.Tmax, ref.T);
        const cls = a === "far" || b === "far" ? "far" : a ?? b;
        if (cls) (out ??= []).push(cpRangeText(c.name, c.cp.Tmin, c.cp.Tmax, cls));
      }
      return out ?? NO_WARNINGS;
    },
  };
}

const NO_WARNINGS: string[] = [];

/** The model value for `id` on a fluid; `options` is the user's option record (validated here). */
export function modelValue(id: ModelId, fluid: Fluid, options: Record<string, unknown> | undefined, ctx: BuiltinContext): ThermoValue {
  const fn = id;
  const allowed = MODEL_OPTIONS[id];
  const opts: Record<string, string> = {};
  for (const [k, v] of Object.entries(options ?? {})) {
    if (k === "reference") continue;
    const choices = allowed[k];
    if (!choices) {
      const valid = [...Object.keys(allowed), "reference"].join(", ");
      throw new ArgumentError(`option "${k}" of ${fn}() is not known; valid options: ${valid}`);
    }
    if (typeof v !== "string" || !choices.includes(v)) {
      throw new ArgumentError(`option ${k} of ${fn}() must be one of ${choices.map((c) => `"${c}"`).join(", ")}, got ${ctx.textOf(v)}`);
    }
    opts[k] = v;
  }
  const ref = referenceOf(options?.reference, fn, ctx);
  const eos = guard(fn, () => build(id, fluid, opts), { fluid: "x" });
  const part = idealGasPart(fluid, ref);
  const crit = pseudoCritical(eos);
  const M = fluid.components.reduce((a, c, i) => a + fluid.x[i]! * c.M, 0);
  const fluidText = fluid.components.length === 1
    ? fluid.components[0]!.id
    : fluid.components.map((c, i) => `${c.id} ${fluid.x[i]!.toPrecision(4)}`).join(", ");
  const validity = (eos as { validity?: (T: number, P: number) => string[] }).validity?.bind(eos);
  const data: ModelData = {
    kind: "model", id, label: eos.label, source: eos.source, fluidText, eos, M, Tc: crit.Tc, Pc: crit.Pc,
    ...(typeof part === "string" ? { noTotals: part } : { idealGas: part }),
    ...(validity ? { validity } : {}),
    cautions: cautionsFor(eos),
  };
  const fields: Record<string, unknown> = {
    model: eos.label,
    fluid: fluidText,
    source: eos.source,
    reference: typeof part === "string" ? part : part.reference,
    M: ctx.units.fromSI(M, "g/mol"),
    Tc: ctx.units.fromSI(crit.Tc, "K"),
    Pc: ctx.units.fromSI(crit.Pc, "pressure"),
  };
  if (fluid.components.length > 1) fields.note = "Tc and Pc of a mixture are Kay's-rule pseudo-critical values";
  const record = { ...fields };
  return thermoValue(data, fields, () => ctx.bundleOf(record), () => `${id}(${fluidText}): ${eos.label}`);
}
