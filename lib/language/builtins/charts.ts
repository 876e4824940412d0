/**
 * departure_chart and zchart: generalized (corresponding-states) charts computed from model values.
 * A dimensionless departure (HR/(R Tc), SR/R, ln phi, ...) or Z against reduced pressure Pr = P/Pc,
 * one curve per reduced temperature Tr = T/Tc, for one model or several compared (dash per model).
 *
 * Why the rules below:
 * - Reduced by the model's Kay's-rule pseudo-critical constants (a pure fluid's own Tc, Pc), the same
 *   rule for every model, so curves compared in one chart sit at the same real T and P.
 * - A point where the model has no physical root (virial at high density, a requested phase that does
 *   not exist) is left out and counted in a note, never drawn as a made-up value.
 * - Pure fluid below Tc with the stable phase: the curve follows the lowest-Gibbs root, and the
 *   saturation pressure (equal fugacity, lib/thermo psat) is inserted with both saturated phases so
 *   the step is drawn exactly there, as on printed generalized charts.
 * - A sweep that runs longer than about 0.5 s shows a progress display (lib/display
 *   ProgressiveDisplay: the curves so far, a placeholder picture saying how far it has come), updated
 *   at most every 0.5 s and replaced by the finished chart at the end. The returned chart then
 *   carries that display id, so the session does not print it a second time as the cell's result.
 * The thermodynamics is lib/thermo's departure(); lib/display lays the curves out.
 */
import {
  DEPARTURE_TITLES, ProgressiveDisplay, departureChart, newDisplayId, shortNumber, zChart,
  type DepartureProperty, type MimeBundle, type ReducedCurve,
} from "../../display/index.js";
import { R, ThermoError, departure, psat, type EosModel, type Residual } from "../../thermo/index.js";
import type { RichValue } from "../values/rich.js";
import { modelDataOf, type ModelData } from "../values/thermo.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { isVectorArg, siArg } from "./thermoArgs.js";

const SHORT_NAMES: Readonly<Record<string, string>> = {
  idealgas: "ideal gas", vdw: "van der Waals", rk: "Redlich-Kwong", srk: "Soave-Redlich-Kwong",
  pr: "Peng-Robinson", virial: "virial", lk: "Lee-Kesler",
};
const PROPERTIES = Object.keys(DEPARTURE_TITLES) as DepartureProperty[];
const PHASES = ["stable", "vapor", "liquid"] as const;
type Phase = (typeof PHASES)[number];
const DEFAULT_TR = [1, 1.1, 1.2, 1.5, 2, 3];
/** Default sweep: 0.01 to 10 in 100 even steps (a linear axis, as printed generalized charts). */
const DEFAULT_PR = Array.from({ length: 100 }, (_, i) => 0.01 + (i * (10 - 0.01)) / 99);
/** Refuse sweeps that would keep a cell busy for long (about 10 s of Lee-Kesler). */
const MAX_POINTS = 200_000;

interface Entry { label: string; data: ModelData; eos: EosModel }

interface ChartOptions {
  property: DepartureProperty | "Z";
  Tr: number[];
  Pr: number[];
  phase: Phase;
  route: "closed" | "integrate";
  log: boolean;
  title?: string;
}

const isRecord = (x: unknown): x is Record<string, unknown> =>
  typeof x === "object" && x !== null && Object.getPrototypeOf(x) === Object.prototype && modelDataOf(x) === undefined;

const itemsOf = (x: unknown): unknown[] =>
  (typeof (x as { toArray?: unknown }).toArray === "function" ? (x as { toArray(): unknown[] }).toArray() : (x as unknown[])).flat(Infinity);

/** The models from the rest arguments (models, lists of models or a {label: model} record) and the options record. */
function splitArgs(fn: string, args: unknown[], ctx: BuiltinContext): { entries: Entry[]; options: Record<string, unknown> } {
  const list = [...args];
  const last = list[list.length - 1];
  const options = list.length > 1 && isRecord(last) && Object.values(last).every((v) => modelDataOf(v) === undefined)
    ? (list.pop() as Record<string, unknown>) : {};
  const found: { key?: string; value: unknown; where: string }[] = [];
  list.forEach((a, k) => {
    const where = `models[${k + 1}]`;
    if (isVectorArg(a)) itemsOf(a).forEach((v, j) => found.push({ value: v, where: `${where}[${j + 1}]` }));
    else if (isRecord(a)) Object.entries(a).forEach(([key, v]) => found.push({ key, value: v, where: `${where}.${key}` }));
    else found.push({ value: a, where });
  });
  if (found.length === 0) throw new ArgumentError(`${fn}() needs at least one model, like ${fn}(pr("methane")) or ${fn}(pr("methane"), srk("methane"), {...})`);
  const entries = found.map(({ key, value, where }) => {
    const data = modelDataOf(value);
    if (!data) {
      const lost = isRecord(value) && "model" in value && "fluid" in value;
      throw new ArgumentError(`argument ${where} of ${fn}() must be a model like pr("methane"), got ${ctx.textOf(value)}${lost
        ? `; this model lost its data inside a list: pass models as separate arguments, ${fn}(pr("methane"), srk("methane"), {...})` : ""}`);
    }
    if (!data.eos || !(data.Tc > 0 && data.Pc > 0)) {
      throw new ArgumentError(`argument ${where} of ${fn}() must be a corresponding-states model (idealgas, vdw, rk, srk, pr, virial, lk); ${data.id} has no critical constants to reduce by`);
    }
    return { key, data, eos: data.eos };
  });
  const sameFluid = entries.every((e) => e.data.fluidText === entries[0]!.data.fluidText);
  const labels = new Map<string, number>();
  return {
    options,
    entries: entries.map((e) => {
      const base = e.key ?? (sameFluid ? SHORT_NAMES[e.data.id] ?? e.data.id : `${SHORT_NAMES[e.data.id] ?? e.data.id}, ${e.data.fluidText}`);
      const n = (labels.get(base) ?? 0) + 1;
      labels.set(base, n);
      return { label: n > 1 ? `${base} (${n})` : base, data: e.data, eos: e.eos };
    }),
  };
}

/** Positive reduced values from a number, list or column option, ascending. */
function reducedList(fn: string, name: "Tr" | "Pr", v: unknown, ctx: BuiltinContext): number[] {
  const si = siArg(v, "dimensionless", name, fn, ctx);
  const values = typeof si === "number" ? [si] : Array.from(si);
  if (values.length === 0) throw new ArgumentError(`option ${name} of ${fn}() needs at least one value`);
  values.forEach((x, i) => {
    if (!(x > 0) || !Number.isFinite(x)) {
      throw new ArgumentError(`option ${name} of ${fn}() must hold positive reduced values (${name} > 0), got ${x}${values.length > 1 ? ` at ${name}[${i + 1}]` : ""}`);
    }
  });
  return [...new Set(values)].sort((a, b) => a - b);
}

function readOptions(fn: string, o: Record<string, unknown>, withProperty: boolean, ctx: BuiltinContext): ChartOptions {
  const allowed = ["Tr", "Pr", "phase", "log", "title", ...(withProperty ? ["property", "route"] : [])];
  for (const k of Object.keys(o)) {
    if (!allowed.includes(k)) throw new ArgumentError(`${fn}(): unknown option ${k}; options are ${allowed.join(", ")}`);
  }
  const choice = <T extends string>(k: string, choices: readonly T[], dflt: T): T => {
    const v = o[k];
    if (v === undefined) return dflt;
    if (typeof v !== "string" || !choices.includes(v as T)) {
      throw new ArgumentError(`option ${k} of ${fn}() must be one of ${choices.map((c) => `"${c}"`).join(", ")}, got ${typeof v === "string" ? `"${v}"` : ctx.textOf(v)}`);
    }
    return v as T;
  };
  const Tr = o.Tr === undefined ? DEFAULT_TR : reducedList(fn, "Tr", o.Tr, ctx);
  const Pr = o.Pr === undefined ? DEFAULT_PR : reducedList(fn, "Pr", o.Pr, ctx);
  if (o.log !== undefined && typeof o.log !== "boolean") throw new ArgumentError(`option log of ${fn}() must be true or false, got ${ctx.textOf(o.log)}`);
  if (o.title !== undefined && typeof o.title !== "string") throw new ArgumentError(`option title of ${fn}() needs text in quotes, got ${ctx.textOf(o.title)}`);
  return {
    property: withProperty ? choice("property", PROPERTIES, "H") : "Z",
    Tr, Pr,
    phase: choice("phase", PHASES, "stable"),
    route: withProperty ? choice("route", ["closed", "integrate"] as const, "closed") : "closed",
    // A sweep of your own over two decades or more reads best on a log axis; the default sweep is
    // evenly spaced, so it keeps the linear axis of printed generalized charts.
    log: (o.log as boolean | undefined) ?? (o.Pr !== undefined && Pr[Pr.length - 1]! / Pr[0]! >= 100),
    title: o.title as string | undefined,
  };
}

/** The plotted dimensionless group of one residual at T for critical temperature Tc. */
function groupOf(p: ChartOptions["property"], r: Residual, T: number, Tc: number): number {
  switch (p) {
    case "Z": return r.Z;
    case "H": return r.HR / (R * Tc);
    case "U": return r.UR / (R * Tc);
    case "S": return r.SR / R;
    case "G": return r.GR / (R * T);
    case "A": return r.AR / (R * T);
    case "lnphi": return r.lnphi;
    case "phi": return Math.exp(r.lnphi);
  }
}

/** Called after every sweep point: points done of total, and the curves so far (the last may be partial). */
type OnPoint = (done: number, total: number, curvesSoFar: () => ReducedCurve[]) => void;

/** All curves of the chart and the notes that explain what was left out or assumed. */
function computeCurves(fn: string, entries: Entry[], o: ChartOptions, ctx: BuiltinContext, onPoint?: OnPoint): { curves: ReducedCurve[]; notes: string[] } {
  const total = entries.length * o.Tr.length * o.Pr.length;
  if (total > MAX_POINTS) {
    throw new ArgumentError(`${fn}(): ${entries.length} model(s) x ${o.Tr.length} Tr x ${o.Pr.length} Pr = ${total} points, more than ${MAX_POINTS}; use fewer Tr or Pr values`);
  }
  const curves: ReducedCurve[] = [];
  const notes: string[] = [];
  let nearCritical = false;
  let stepDrawn = false;
  let subcritical = false;
  let done = 0;
  for (const e of entries) {
    if (o.route === "integrate" && typeof e.eos.pressure !== "function") {
      throw new ArgumentError(`option route "integrate" of ${fn}() needs a pressure-explicit model P(T, V); ${e.label} has none (use route "closed")`);
    }
    const { Tc, Pc } = e.data;
    const pure = e.eos.fluid.components.length === 1;
    let skipped = 0;
    let firstSkip = "";
    let outside = 0;
    let firstOutside = "";
    for (const tr of o.Tr) {
      const T = tr * Tc;
      const Pr: number[] = [];
      const values: number[] = [];
      const add = (pr: number, r: Residual) => {
        const v = groupOf(o.property, r, T, Tc);
        if (Number.isFinite(v)) {
          Pr.push(pr);
          values.push(v);
        }
      };
      const soFar = () => (Pr.length === 0 ? curves : [...curves, { Tr: tr, ...(entries.length > 1 ? { model: e.label } : {}), Pr, values }]);
      let sat: { pr: number; liquid: Residual; vapor: Residual } | undefined;
      if (pure && o.phase === "stable" && tr < 1) {
        subcritical = true;
        try {
          const s = psat(e.eos, T, { shouldStop: ctx.shouldStop });
          if (s.P / Pc > o.Pr[0]! && s.P / Pc < o.Pr[o.Pr.length - 1]!) sat = { pr: s.P / Pc, liquid: s.liquid, vapor: s.vapor };
        } catch (err) {
          if (!(err instanceof ThermoError)) throw err; // no saturation (e.g. virial: no liquid): no step
          if (ctx.shouldStop()) throw ctx.interrupted();
        }
      }
      for (const pr of o.Pr) {
        if (ctx.shouldStop()) throw ctx.interrupted();
        if (onPoint && done > 0) onPoint(done, total, soFar);
        done++;
        if (sat && pr > sat.pr) {
          add(sat.pr, sat.vapor);
          add(sat.pr, sat.liquid);
          stepDrawn = true;
          sat = undefined;
        }
        const P = pr * Pc;
        let r;
        try {
          r = departure(e.eos, T, P, { phase: o.phase, route: o.route, shouldStop: ctx.shouldStop });
        } catch (err) {
          if (!(err instanceof ThermoError)) throw err;
          if (ctx.shouldStop()) throw ctx.interrupted();
          if (skipped++ === 0) firstSkip = `Tr = ${shortNumber(tr)}, Pr = ${shortNumber(pr)}`;
          continue;
        }
        nearCritical ||= r.flags.nearCritical;
        // The near-critical caution gets one note of its own below, for every model alike.
        const warnings = (e.data.validity?.(T, P) ?? []).filter((w) => !/critical point/.test(w));
        if (warnings.length > 0 && outside++ === 0) firstOutside = warnings[0]!;
        add(pr, r);
      }
      if (Pr.length === 0) notes.push(`${e.label}, Tr = ${shortNumber(tr)}: no ${o.phase === "stable" ? "physical" : o.phase} root at any Pr; curve left out`);
      else curves.push({ Tr: tr, ...(entries.length > 1 ? { model: e.label } : {}), Pr, values });
    }
    const who = entries.length > 1 ? `${e.label}: ` : "";
    if (skipped > 0) notes.push(`${who}${skipped} point(s) with no ${o.phase === "stable" ? "physical" : o.phase} root left out (first at ${firstSkip})`);
    if (outside > 0) notes.push(`${who}${outside} point(s) outside the model's validity range (${firstOutside})`);
    if (!pure) {
      notes.push(`${who}mixture ${e.data.fluidText}: Tr and Pr use Kay's-rule pseudo-critical constants Tpc = ${shortNumber(Tc)} K, Ppc = ${shortNumber(Pc / 1e5)} bar; one phase assumed (no phase-split test)`);
    }
  }
  if (subcritical) {
    notes.push(`Tr < 1: the stable (lowest Gibbs energy) root is followed${stepDrawn ? "; the vertical step is the saturation pressure by equal fugacity, vapour below, liquid above" : ""}`);
  }
  if (o.phase !== "stable") notes.push(`phase "${o.phase}": the ${o.phase === "vapor" ? "vapour" : "liquid"} root is followed where it exists, metastable past the saturation pressure`);
  if (nearCritical) notes.push("points near the critical point (|Tr - 1| < 0.03, |Pr - 1| < 0.1) change steeply; read them with care");
  if (curves.length === 0) throw new ArgumentError(`${fn}(): no curve has any point: ${notes.join("; ")}`);
  return { curves, notes };
}

function subtitleOf(entries: Entry[], o: ChartOptions): string {
  const fluids = [...new Set(entries.map((e) => e.data.fluidText))];
  const crit = entries.length === 1 || fluids.length === 1
    ? ` (Tc = ${shortNumber(entries[0]!.data.Tc)} K, Pc = ${shortNumber(entries[0]!.data.Pc / 1e5)} bar)` : "";
  const models = entries.length === 1 ? `${entries[0]!.data.label}, ` : `${entries.map((e) => e.label).join(" vs ")}, `;
  const phase = o.phase === "stable" ? "" : `, ${o.phase} root`;
  const route = o.route === "integrate" ? ", numerical Maxwell route" : "";
  return `${models}${fluids.join(" | ")}${crit}${phase}${route}`;
}

/** displayId: the chart was already shown progressively under this id (the session will not repeat it). */
function chartValue(bundle: MimeBundle, displayId?: string): RichValue {
  return { kind: "chart", toBundle: () => bundle, toText: () => String(bundle["text/plain"]), ...(displayId === undefined ? {} : { displayId }) };
}

function build(fn: string, args: unknown[], withProperty: boolean, ctx: BuiltinContext): RichValue {
  const { entries, options } = splitArgs(fn, args, ctx);
  const o = readOptions(fn, options, withProperty, ctx);
  const subtitle = subtitleOf(entries, o);
  const draw = (curves: ReducedCurve[], notes: string[]) => {
    const layout = { title: o.title, subtitle, logPr: o.log, notes };
    return o.property === "Z" ? zChart(curves, layout) : departureChart(o.property, curves, layout);
  };
  const progress = new ProgressiveDisplay(ctx, { ...ctx.progress, displayId: newDisplayId(fn) });
  let result: { curves: ReducedCurve[]; notes: string[] };
  try {
    // The partial chart is drawn only when an update is due (at most every 0.5 s by default).
    result = computeCurves(fn, entries, o, ctx, (done, total, soFar) => {
      progress.offer({ done, total }, () => {
        const curves = soFar();
        return curves.length > 0 ? draw(curves, []) : undefined;
      });
    });
  } catch (err) {
    const reason = err instanceof Error ? (err.name === "Interrupted" ? "interrupted" : err.message.split("\n")[0]!) : String(err);
    progress.abandon(reason);
    throw err;
  }
  const { bundle, displayId } = progress.finish(draw(result.curves, result.notes));
  return chartValue(bundle, displayId);
}

const MODELS_DOC = 'one or more models (pr("methane"), srk("methane"), ...), or a record {label: model}; an options record may follow last';
const COMMON_OPTIONS = "Tr: reduced temperatures (default [1, 1.1, 1.2, 1.5, 2, 3]), Pr: reduced pressures (default 0.01 to 10, 100 points), phase: \"stable\" | \"vapor\" | \"liquid\", log: true/false (log Pr axis; default true when your Pr spans two decades or more), title";

export const charts: BuiltinDef[] = [
  defineBuiltin({
    name: "departure_chart",
    group: "output",
    params: [{ name: "models", type: "any", rest: true, doc: `${MODELS_DOC}. Options: property: "H" | "S" | "U" | "G" | "A" | "lnphi" | "phi" (default "H"), route: "closed" | "integrate", ${COMMON_OPTIONS}` }],
    returns: "chart",
    doc: "Generalized departure chart: a dimensionless departure (HR/(R Tc), SR/R, UR/(R Tc), GR/(R T), AR/(R T), ln phi or phi) against reduced pressure Pr = P/Pc, one colour per reduced temperature Tr = T/Tc, one dash pattern per model when several are compared. Departure = real minus ideal gas at the same T and P.",
    method: "lib/thermo departure() at T = Tr Tc, P = Pr Pc on the stable root (or the requested phase); mixtures reduced by Kay's-rule pseudo-critical constants. Points without a physical root are left out and counted in a note; for a pure fluid below Tc the saturation pressure (equal fugacity) is inserted so the step sits exactly there.",
    source: "the models' own sources (see each model's display)",
    examples: [
      'departure_chart(pr("methane"), {property: "H", Tr: [1.1, 1.5, 2], Pr: logspan(0.1, 10, 30)})',
      'departure_chart(pr("propane"), srk("propane"), lk("propane"), {property: "lnphi", Tr: [0.9, 1.2], Pr: span(0.05, 5, 25)})',
      'departure_chart({mix: pr(mixture({methane: 0.9, ethane: 0.1}))}, {property: "S", Tr: [1.2, 1.5], Pr: span(0.1, 5, 20)})',
    ],
    impl: ({ models }, ctx) => build("departure_chart", models as unknown[], true, ctx),
  }),
  defineBuiltin({
    name: "zchart",
    group: "output",
    params: [{ name: "models", type: "any", rest: true, doc: `${MODELS_DOC}. Options: ${COMMON_OPTIONS}` }],
    returns: "chart",
    doc: "Generalized compressibility chart: Z = PV/(RT) against reduced pressure Pr = P/Pc, one colour per reduced temperature Tr = T/Tc, one dash pattern per model when several are compared.",
    method: "lib/thermo departure() (its Z) at T = Tr Tc, P = Pr Pc on the stable root (or the requested phase); the same rules as departure_chart.",
    source: "the models' own sources (see each model's display)",
    examples: [
      'zchart(lk("methane"), {Tr: [1, 1.2, 1.5, 2], Pr: span(0.1, 10, 40)})',
      'zchart(pr("nitrogen"), virial("nitrogen"), {Tr: [1.5, 2.5], Pr: span(0.05, 3, 20)})',
    ],
    impl: ({ models }, ctx) => build("zchart", models as unknown[], false, ctx),
  }),
];
