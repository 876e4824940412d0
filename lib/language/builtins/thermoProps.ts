/**
 * Thermodynamics built-ins, part 3: single properties. pressure(m, T, V), volume(m, T, P),
 * zfactor(m, T, P), internal_pressure(m, T, V), psat(m, T), tsat(m, P). All vectorise over spans.
 */
import {
  if97Psat, if97Tsat, if97State, internalPressure, psat as thermoPsat, selectRoot, tsat as thermoTsat, M_WATER, R,
} from "../../thermo/index.js";
import { modelDataOf, type ModelData } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { guard, if97SaturationHint, requireAbove0 } from "./thermoArgs.js";

const PHASE_PARAM = { name: "phase", type: "string", optional: true, choices: ["stable", "liquid", "vapor", "vapour"], doc: '"stable" (default), "liquid" or "vapor" root' } as const;
const rename = { p: "P" };

function eosOf(m: unknown, fn: string, what: string): ModelData {
  const d = modelDataOf(m)!;
  if (d.id === "if97") throw new ArgumentError(`argument m of ${fn}(): ${what} is not available for if97(); IF97 is explicit in T and P (use state(if97(), T, P))`);
  return d;
}

/** Root V (m^3/mol) and Z at T, P by the model (or IF97). */
function rootAt(m: unknown, T: number, P: number, phase: string | undefined, fn: string, ctx: BuiltinContext): { V: number; Z: number } {
  requireAbove0(fn, "T", T, "K");
  requireAbove0(fn, "P", P, "Pa");
  const d = modelDataOf(m)!;
  const ph = phase === "vapour" ? "vapor" : phase ?? "stable";
  if (d.id === "if97") {
    const st = guard(fn, () => if97State({ T, p: P }), rename);
    if (ph !== "stable" && st.phase !== ph) {
      const hint = if97SaturationHint(T, P, ph, fn === "volume" ? ".V" : ".Z", ctx);
      throw new ArgumentError(`argument phase of ${fn}(): water at T = ${Number(T.toPrecision(6))} K, P = ${Number(P.toPrecision(6))} Pa is ${st.phase} (IF97 region ${st.region}); IF97 gives only the stable phase${hint}`);
    }
    const V = st.v * M_WATER;
    return { V, Z: (P * V) / (R * T) };
  }
  if (ph === "liquid" && T >= d.Tc) {
    throw new ArgumentError(`argument phase of ${fn}(): liquid root asked of a supercritical fluid at T = ${Number(T.toPrecision(5))} K > Tc = ${Number(d.Tc.toPrecision(5))} K (${d.fluidText})`);
  }
  const c = guard(fn, () => selectRoot(d.eos!, T, P, ph as "stable"));
  return { V: c.V, Z: c.residual.Z };
}

export const thermoProps: BuiltinDef[] = [
  defineBuiltin({
    name: "pressure",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a pressure-explicit model (cubic, virial, ideal gas)" },
      { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
      { name: "V", type: "quantity", dim: "molar_volume", doc: "molar volume" },
    ],
    returns: "pressure",
    doc: "Pressure from the equation of state P(T, V).",
    method: "The model's P(T, V) directly (no root finding).",
    examples: ['pressure(vdw("carbon dioxide"), 300 K, 0.5 L/mol)'],
    vectorize: true,
    impl: ({ m, T, V }) => {
      const d = eosOf(m, "pressure", "P(T, V)");
      requireAbove0("pressure", "T", T, "K");
      requireAbove0("pressure", "V", V, "m^3/mol");
      if (typeof d.eos!.pressure !== "function") throw new ArgumentError(`argument m of pressure(): ${d.label} is not explicit in pressure; use volume(m, T, P)`);
      return guard("pressure", () => d.eos!.pressure!(T, V));
    },
  }),
  defineBuiltin({
    name: "volume",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model" },
      { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
      { name: "P", type: "quantity", dim: "pressure", doc: "pressure" },
      PHASE_PARAM,
    ],
    returns: "molar_volume",
    doc: "Molar volume at T, P: the stable root (lowest Gibbs energy), or the liquid or vapour root on request.",
    method: "All real roots of the equation of state; the middle (unstable) root of three is never returned.",
    examples: ['volume(pr("n-butane"), 350 K, 9.4573 bar, "liquid")', 'volume(if97(), 300 K, 1 bar)'],
    vectorize: true,
    impl: ({ m, T, P, phase }, ctx) => rootAt(m, T, P, phase, "volume", ctx).V,
  }),
  defineBuiltin({
    name: "zfactor",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model" },
      { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
      { name: "P", type: "quantity", dim: "pressure", doc: "pressure" },
      PHASE_PARAM,
    ],
    returns: "dimensionless",
    doc: "Compressibility factor Z = P V / (R T) at T, P (stable root unless a phase is asked).",
    method: "Z of the chosen volume root.",
    examples: ['zfactor(pr("methane"), 250 K, 60 bar)', 'zfactor(lk("propane"), span(350 K, 450 K, 3), 20 bar)'],
    vectorize: true,
    impl: ({ m, T, P, phase }, ctx) => rootAt(m, T, P, phase, "zfactor", ctx).Z,
  }),
  defineBuiltin({
    name: "internal_pressure",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a pressure-explicit model" },
      { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
      { name: "V", type: "quantity", dim: "molar_volume", doc: "molar volume" },
    ],
    returns: "pressure",
    doc: "Internal pressure (dU/dV)_T = T (dP/dT)_V - P: zero for an ideal gas, a/V^2 for van der Waals.",
    method: "Numerical (Richardson-extrapolated) temperature derivative of P(T, V) with the ideal part removed first.",
    examples: ['internal_pressure(vdw("nitrogen"), 300 K, 1 L/mol)'],
    vectorize: true,
    impl: ({ m, T, V }) => {
      const d = eosOf(m, "internal_pressure", "(dU/dV)_T");
      requireAbove0("internal_pressure", "T", T, "K");
      requireAbove0("internal_pressure", "V", V, "m^3/mol");
      return guard("internal_pressure", () => internalPressure(d.eos!, T, V));
    },
  }),
  defineBuiltin({
    name: "psat",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model of a pure fluid, or if97()" },
      { name: "T", type: "quantity", dim: "temperature", doc: "temperature below the critical temperature" },
    ],
    returns: "pressure",
    doc: "Saturation (vapour) pressure at T.",
    method: "Equation of state: equal fugacity of the liquid and vapour roots (Newton on ln P from Wilson's estimate). if97(): the IF97 region 4 saturation equation.",
    examples: ['psat(pr("propane"), 300 K)', "psat(if97(), 100 degC)"],
    vectorize: true,
    impl: ({ m, T }) => {
      const d = modelDataOf(m)!;
      requireAbove0("psat", "T", T, "K");
      if (d.id === "if97") return guard("psat", () => if97Psat(T), rename);
      return guard("psat", () => thermoPsat(d.eos!, T).P, { model: "m" });
    },
  }),
  defineBuiltin({
    name: "tsat",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model of a pure fluid, or if97()" },
      { name: "P", type: "quantity", dim: "pressure", doc: "pressure below the critical pressure" },
    ],
    returns: "temperature",
    doc: "Saturation temperature at P (boiling point at that pressure).",
    method: "Equation of state: equal fugacity, Newton on T with the Clausius-Clapeyron slope. if97(): the IF97 region 4 backward saturation equation.",
    examples: ['tsat(pr("propane"), 10 bar)', "tsat(if97(), 1 atm)"],
    vectorize: true,
    impl: ({ m, P }) => {
      const d = modelDataOf(m)!;
      requireAbove0("tsat", "P", P, "Pa");
      if (d.id === "if97") return guard("tsat", () => if97Tsat(P), rename);
      return guard("tsat", () => thermoTsat(d.eos!, P).T, { model: "m" });
    },
  }),
];
