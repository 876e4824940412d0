/**
 * Thermodynamics built-ins, part 3: single properties. pressure(m, T, V), volume(m, T, P),
 * zfactor(m, T, P), internal_pressure(m, T, V), psat(m, T), tsat(m, P). All vectorise over spans;
 * volume, zfactor, psat and tsat show state()'s cautions as warnings, each once per call.
 */
import {
  if97Psat, if97Tsat, if97State, internalPressure, kelvinText, pressureText, psat as thermoPsat, requireSaturationP,
  requireSaturationT, selectRoot, tsat as thermoTsat, M_WATER, R, type StateFlags,
} from "../../thermo/index.js";
import { modelDataOf, type ModelData } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { guard, if97SaturationHint, phaseArg, propertyCall, requireAbove0, siArg } from "./thermoArgs.js";
import { notesFor } from "./thermoRows.js";

const PHASE_PARAM = { name: "phase", type: "any", optional: true, doc: '"stable" (default), "liquid" or "vapor" root, as text or as a record {phase: "liquid"}' } as const;
const rename = { p: "P" };
const NO_FLAGS: StateFlags = { supercritical: false, nearCritical: false, metastable: false, twoPhase: false, multipleRoots: false, mixtureSinglePhase: false };

function eosOf(m: unknown, fn: string, what: string): ModelData {
  const d = modelDataOf(m)!;
  if (d.id === "if97") throw new ArgumentError(`argument m of ${fn}(): ${what} is not available for if97(); IF97 is explicit in T and P (use state(if97(), T, P))`);
  return d;
}

/** Root V (m^3/mol) and Z at T, P by the model (or IF97), with the cautions state() would give. */
function rootAt(m: unknown, T: number, P: number, ph: string, fn: string, ctx: BuiltinContext): { V: number; Z: number; notes?: readonly string[] } {
  requireAbove0(fn, "T", T, "K");
  requireAbove0(fn, "P", P, "Pa");
  const d = modelDataOf(m)!;
  if (d.id === "if97") {
    const st = guard(fn, () => if97State({ T, p: P }), rename);
    if (ph !== "stable" && st.phase !== ph) {
      const hint = if97SaturationHint(T, P, ph, fn === "volume" ? ".V" : ".Z", ctx);
      throw new ArgumentError(`argument phase of ${fn}(): water at T = ${kelvinText(T)}, P = ${pressureText(P)} is ${st.phase} (IF97 region ${st.region}); IF97 gives only the stable phase${hint}`);
    }
    const V = st.v * M_WATER;
    return { V, Z: (P * V) / (R * T) };
  }
  if (ph === "liquid" && T >= d.Tc) {
    throw new ArgumentError(`argument phase of ${fn}(): liquid root asked of a supercritical fluid at T = ${kelvinText(T)} > Tc = ${kelvinText(d.Tc)} (${d.fluidText})`);
  }
  const c = guard(fn, () => selectRoot(d.eos!, T, P, ph as "stable"));
  return { V: c.V, Z: c.residual.Z, notes: notesFor(d, T, P, c.phase, c.flags, undefined, false) };
}

/** m, T, V of the pressure-explicit built-ins: the model's data after T > 0 and V > 0 are checked. */
function eosAtTV(m: unknown, T: number, V: number, fn: string, what: string): ModelData {
  const d = eosOf(m, fn, what);
  requireAbove0(fn, "T", T, "K");
  requireAbove0(fn, "V", V, "m^3/mol");
  return d;
}

/** Parameters (m, T, V) of the pressure-explicit built-ins. */
const TV_PARAMS = (modelDoc: string) => [
  { name: "m", type: "model", doc: modelDoc },
  { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
  { name: "V", type: "quantity", dim: "molar_volume", doc: "molar volume" },
] as const;

/** Parameters (m, T, P, phase) of the built-ins that pick a volume root. */
const TP_PHASE_PARAMS = [
  { name: "m", type: "model", doc: "a model" },
  { name: "T", type: "quantity", doc: "temperature (or a span of them)" },
  { name: "P", type: "quantity", doc: "pressure (or a span of them)" },
  PHASE_PARAM,
] as const;

/** impl of a built-in that returns one number of the chosen root at T, P (vectorised over spans). */
function atRoot(fn: string, returns: string, pick: (r: { V: number; Z: number }) => number): BuiltinDef["impl"] {
  return ({ m, T, P, phase }, ctx) => {
    const ph = phaseArg(phase, fn, ctx) ?? "stable";
    const inputs = { T: si(T, "temperature", "T", fn, ctx), P: si(P, "pressure", "P", fn, ctx) };
    return propertyCall(fn, inputs, returns, (a) => {
      const r = rootAt(m, a.T!, a.P!, ph, fn, ctx);
      return { value: pick(r), notes: r.notes };
    }, ctx);
  };
}

/** Quantity or array argument -> SI (the property built-ins vectorise themselves to show each caution once). */
const si = (v: unknown, dim: string, name: string, fn: string, ctx: BuiltinContext) => siArg(v, dim, name, fn, ctx);

/** Saturation notes: near-critical (the flag rule of eos/phase.ts) and the model's validity range. */
function saturationNotes(d: ModelData, T: number, P: number): string[] {
  const flags = { ...NO_FLAGS, nearCritical: Math.abs(T / d.Tc - 1) < 0.03 && Math.abs(P / d.Pc - 1) < 0.1 };
  return notesFor(d, T, P, "two-phase", flags, undefined, false);
}

/** One side of the saturation curve: psat reads T and gives P, tsat reads P and gives T. */
interface SaturationSide {
  fn: "psat" | "tsat";
  given: "T" | "P";
  dim: "temperature" | "pressure";
  unit: "K" | "Pa";
  returns: "pressure" | "temperature";
  if97: (x: number) => number;
  /** The saturation point (T, P) from the given coordinate by the model, with its range checks. */
  eos: (d: ModelData, x: number) => { T: number; P: number };
}

/** impl of psat/tsat: IF97 region 4 for if97(), else the model's equal-fugacity solve with its cautions. */
function saturationImpl(side: SaturationSide): BuiltinDef["impl"] {
  const { fn, given } = side;
  return (args, ctx) => {
    const d = modelDataOf(args.m)!;
    return propertyCall(fn, { [given]: si(args[given], side.dim, given, fn, ctx) }, side.returns, (a) => {
      const x = a[given]!;
      requireAbove0(fn, given, x, side.unit);
      if (d.id === "if97") return { value: guard(fn, () => side.if97(x), rename) };
      const pt = side.eos(d, x);
      return { value: given === "T" ? pt.P : pt.T, notes: saturationNotes(d, pt.T, pt.P) };
    }, ctx);
  };
}

export const thermoProps: BuiltinDef[] = [
  defineBuiltin({
    name: "pressure",
    group: "thermo",
    params: TV_PARAMS("a pressure-explicit model (cubic, virial, ideal gas)"),
    returns: "pressure",
    doc: "Pressure from the equation of state P(T, V).",
    method: "The model's P(T, V) directly (no root finding).",
    examples: ['pressure(vdw("carbon dioxide"), 300 K, 0.5 L/mol)'],
    vectorize: true,
    impl: ({ m, T, V }) => {
      const d = eosAtTV(m, T, V, "pressure", "P(T, V)");
      if (typeof d.eos!.pressure !== "function") throw new ArgumentError(`argument m of pressure(): ${d.label} is not explicit in pressure; use volume(m, T, P)`);
      return guard("pressure", () => d.eos!.pressure!(T, V));
    },
  }),
  defineBuiltin({
    name: "volume",
    group: "thermo",
    params: TP_PHASE_PARAMS,
    returns: "molar_volume",
    doc: "Molar volume at T, P: the stable root (lowest Gibbs energy), or the liquid or vapour root on request.",
    method: "All real roots of the equation of state; the middle (unstable) root of three is never returned.",
    examples: ['volume(pr("n-butane"), 350 K, 9.4573 bar, "liquid")', 'volume(pr("n-butane"), 350 K, 9.4573 bar, {phase: "vapor"})', 'volume(if97(), 300 K, 1 bar)'],
    impl: atRoot("volume", "molar_volume", (r) => r.V),
  }),
  defineBuiltin({
    name: "zfactor",
    group: "thermo",
    params: TP_PHASE_PARAMS,
    returns: "dimensionless",
    doc: "Compressibility factor Z = P V / (R T) at T, P (stable root unless a phase is asked).",
    method: "Z of the chosen volume root.",
    examples: ['zfactor(pr("methane"), 250 K, 60 bar)', 'zfactor(lk("propane"), span(350 K, 450 K, 3), 20 bar)'],
    impl: atRoot("zfactor", "dimensionless", (r) => r.Z),
  }),
  defineBuiltin({
    name: "internal_pressure",
    group: "thermo",
    params: TV_PARAMS("a pressure-explicit model"),
    returns: "pressure",
    doc: "Internal pressure (dU/dV)_T = T (dP/dT)_V - P: zero for an ideal gas, a/V^2 for van der Waals.",
    method: "Numerical (Richardson-extrapolated) temperature derivative of P(T, V) with the ideal part removed first.",
    examples: ['internal_pressure(vdw("nitrogen"), 300 K, 1 L/mol)'],
    vectorize: true,
    impl: ({ m, T, V }) => {
      const d = eosAtTV(m, T, V, "internal_pressure", "(dU/dV)_T");
      return guard("internal_pressure", () => internalPressure(d.eos!, T, V));
    },
  }),
  defineBuiltin({
    name: "psat",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model of a pure fluid, or if97()" },
      { name: "T", type: "quantity", doc: "temperature (or a span), between the triple point and the critical temperature" },
    ],
    returns: "pressure",
    doc: "Saturation (vapour) pressure at T.",
    method: "Equation of state: equal fugacity of the liquid and vapour roots (Newton on ln P from Wilson's estimate). if97(): the IF97 region 4 saturation equation.",
    examples: ['psat(pr("propane"), 300 K)', "psat(if97(), 100 degC)"],
    impl: saturationImpl({
      fn: "psat", given: "T", dim: "temperature", unit: "K", returns: "pressure", if97: if97Psat,
      eos: (d, T) => {
        guard("psat", () => requireSaturationT(d.eos!, T));
        return { T, P: guard("psat", () => thermoPsat(d.eos!, T).P, { model: "m" }) };
      },
    }),
  }),
  defineBuiltin({
    name: "tsat",
    group: "thermo",
    params: [
      { name: "m", type: "model", doc: "a model of a pure fluid, or if97()" },
      { name: "P", type: "quantity", doc: "pressure (or a span), between the triple-point and the critical pressure" },
    ],
    returns: "temperature",
    doc: "Saturation temperature at P (boiling point at that pressure).",
    method: "Equation of state: equal fugacity, Newton on T with the Clausius-Clapeyron slope. if97(): the IF97 region 4 backward saturation equation.",
    examples: ['tsat(pr("propane"), 10 bar)', "tsat(if97(), 1 atm)"],
    impl: saturationImpl({
      fn: "tsat", given: "P", dim: "pressure", unit: "Pa", returns: "temperature", if97: if97Tsat,
      eos: (d, P) => {
        guard("tsat", () => requireSaturationP(d.eos!, P));
        const T = guard("tsat", () => thermoTsat(d.eos!, P).T, { model: "m" });
        guard("tsat", () => requireSaturationP(d.eos!, P, T));
        return { T, P };
      },
    }),
  }),
];
