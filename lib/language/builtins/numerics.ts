/**
 * integrate, seek and slope: lib/numerics with units. Units are handled once at the edge: the bounds
 * (or the point) are converted to SI numbers, f is probed once to learn the unit of its output, and
 * the numerics loop then sees plain SI numbers (each call hands f an SI quantity and reads its SI
 * output back). The result carries units of f times x (integrate), of x (seek) or of f over x (slope).
 */
import type { Unit } from "mathjs";
import { brent, derivative, integrate, NumericsError, RootError, StopRequested } from "../../numerics/index.js";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";

const isUnit = (x: unknown): x is Unit => typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;

/** The SI unit a quantity is computed in: the named dimension's unit when known, else its base units. */
function siUnitOf(u: Unit, ctx: BuiltinContext): string {
  const dim = ctx.units.dimensionOf(u);
  return dim ? ctx.units.siUnitOf(dim) : u.toSI().formatUnits();
}

interface Axis {
  /** SI unit of x ("" for plain numbers). */
  unit: string;
  /** The user's unit, for showing x-valued results. */
  shown: string;
  si: (value: unknown, name: string) => number;
  quantity: (x: number) => unknown;
}

/** The x axis shared by the bound-like arguments (plain numbers and Infinity fit any axis). */
function axisOf(fn: string, args: [string, unknown][], ctx: BuiltinContext): Axis {
  const first = args.find(([, v]) => isUnit(v));
  for (const [name, v] of args) {
    if (!(typeof v === "number" || isUnit(v))) {
      throw new ArgumentError(`argument ${name} of ${fn}() needs a number or a quantity, got ${ctx.textOf(v)}`);
    }
  }
  if (!first) {
    return { unit: "", shown: "", si: (v) => v as number, quantity: (x) => x };
  }
  const ref = first[1] as Unit;
  const unit = siUnitOf(ref, ctx);
  const si = (v: unknown, name: string): number => {
    if (typeof v === "number") {
      if (Number.isFinite(v) && v !== 0) {
        throw new ArgumentError(`argument ${name} of ${fn}() needs a quantity like ${first[0]} (${ctx.textOf(ref)}), got the plain number ${v}; only 0 and Infinity may go without a unit`);
      }
      return v;
    }
    const u = v as Unit;
    if (!u.equalBase(ref)) {
      throw new ArgumentError(`argument ${name} of ${fn}() must have the same dimension as ${first[0]} (${ctx.textOf(ref)}), got ${ctx.textOf(u)}`);
    }
    return u.toNumber(unit);
  };
  return { unit, shown: ref.formatUnits(), si, quantity: (x) => ctx.units.fromSI(x, unit) };
}

/** Two bounds on one x axis, as SI numbers (the axis comes from whichever bound has a unit). */
function boundsOf(fn: string, [nameA, a]: [string, unknown], [nameB, b]: [string, unknown], ctx: BuiltinContext): { axis: Axis; lo: number; hi: number } {
  const axis = axisOf(fn, [[nameA, a], [nameB, b]], ctx);
  return { axis, lo: axis.si(a, nameA), hi: axis.si(b, nameB) };
}

/** f as a plain SI function: probes once at x0 to learn the output unit, then converts each call. */
function plainFunction(fn: string, f: unknown, axis: Axis, x0: number, ctx: BuiltinContext): { g: (x: number) => number; yUnit: string; yShown: string } {
  const probe = ctx.call(f, axis.quantity(x0));
  let yUnit: string;
  if (typeof probe === "number") yUnit = "";
  else if (isUnit(probe)) yUnit = siUnitOf(probe, ctx);
  else throw new ArgumentError(`argument f of ${fn}() must return a number or a quantity, got ${ctx.textOf(probe)} at x = ${ctx.textOf(axis.quantity(x0))}`);
  const ref = probe;
  const g = (x: number): number => {
    const y = ctx.call(f, axis.quantity(x));
    if (yUnit === "" && typeof y === "number") return y;
    if (isUnit(y) && isUnit(ref) && y.equalBase(ref)) return y.toNumber(yUnit);
    throw new ArgumentError(
      `argument f of ${fn}() changed its output: ${ctx.textOf(y)} at x = ${ctx.textOf(axis.quantity(x))}, but ${ctx.textOf(ref)} at x = ${ctx.textOf(axis.quantity(x0))}`,
    );
  };
  // f in the user's unit of x when it has the dimension of x (f(p) = p - 0.5 bar), else as f made it.
  const yShown = !isUnit(probe) ? "" : axis.unit !== "" && axis.unit === yUnit ? axis.shown : probe.formatUnits();
  return { g, yUnit, yShown };
}

/**
 * value in the units a*b (op "*") or a/b^power (op "/"); a plain number when both are "" (no unit).
 * Built with mathjs Unit arithmetic so compound units (J Pa / mol) come out right.
 */
function combine(value: number, a: string, b: string, op: "*" | "/", ctx: BuiltinContext, power = 1): unknown {
  if (b === "") return a === "" ? value : ctx.units.fromSI(value, a);
  let x = ctx.units.fromSI(1, b) as Unit;
  // mathjs' typings declare Unit.pow and Unit.multiply for Unit arguments only; at run time they take numbers.
  const pow = (u: Unit, p: number) => (u.pow as unknown as (p: number) => Unit).call(u, p);
  if (power !== 1) x = pow(x, power);
  if (op === "/") x = pow(x, -1);
  if (a === "") return (x.multiply as unknown as (k: number) => Unit).call(x, value);
  return (ctx.units.fromSI(value, a) as Unit).multiply(x);
}

/**
 * Reads an options record of plain numbers (and booleans), naming unknown keys. `xKey` names the one
 * option measured like x (a step or a tolerance): given as a quantity, it is converted on `axis`.
 */
function optionsOf(fn: string, rec: unknown, allowed: readonly string[], axis?: Axis, xKey?: string): Record<string, unknown> {
  if (rec === undefined) return {};
  const out: Record<string, unknown> = {};
  for (const [k, v] of Object.entries(rec as Record<string, unknown>)) {
    if (!allowed.includes(k)) throw new ArgumentError(`argument options of ${fn}() has an unknown key "${k}"; valid keys: ${allowed.join(", ")}`);
    out[k] = v;
  }
  if (axis && xKey && isUnit(out[xKey])) out[xKey] = axis.si(out[xKey], `options.${xKey}`);
  return out;
}

/**
 * A sign change of f that is not a root: where bracketing ended, |f| is not small against its
 * values at the ends of the bracket (a root has |f| near 0 there). Growing without bound (1e6 times the ends) is a pole,
 * such as a division by zero; otherwise a jump (a step or other discontinuity).
 */
function poleError(g: (x: number) => number, x: number, fl: number, fh: number, xText: (x: number) => string, yText: (y: number) => string, converged: boolean): ArgumentError | undefined {
  const y = g(x);
  const ends = Math.max(Math.abs(fl), Math.abs(fh));
  // At a root of a continuous f, |f| where the bracket closed is tiny against the ends (1e-16 for a
  // straight line, 6e-6 for a cube-root crossing). 1/10 of the ends for a converged bracket leaves
  // room for very steep crossings; a run that did not converge is judged more strictly.
  const limit = converged ? 0.1 * ends : 1e-3 * ends;
  if (!(Math.abs(y) > limit) && Number.isFinite(y)) return undefined;
  const pole = !Number.isFinite(y) || Math.abs(y) > 1e6 * ends;
  const how = pole ? `|f| grows without bound there (f = ${yText(y)}): a pole, such as a division by zero` : `f jumps there (f = ${yText(y)}, not near 0): a step or other discontinuity`;
  return new ArgumentError(`seek(): f changes sign near x = ${xText(x)} without crossing zero; ${how}. There is no root there: choose lo and hi on one side of it`);
}

/** Runs a numerics call, turning an interrupt into the language's interrupt and numerics errors into argument-level ones. */
function guarded<T>(fn: string, ctx: BuiltinContext, body: () => T): T {
  try {
    return body();
  } catch (e) {
    if (e instanceof StopRequested) throw ctx.interrupted();
    if (e instanceof NumericsError) throw new ArgumentError(`${fn}(): ${e.message.replace(/^[a-zA-Z]+: /, "")}`);
    throw e;
  }
}

/**
 * Where f is first called (to learn its output unit): a point strictly inside the range, so a
 * function defined only there (a molar volume above zero, a pressure above the vapour pressure) is
 * never probed outside it. Finite bounds: the midpoint. One infinite bound: step from the finite
 * bound towards the infinite one, by |bound| when moving away from zero (b = 1e-4 -> 2e-4) and by
 * |bound| / 2 when moving towards it (b = -4 -> -2: same sign as b), by 1 from 0. Either order of
 * the bounds: the infinite bound's sign gives the direction. Both infinite: 0.
 */
export function probePoint(a: number, b: number): number {
  const fa = Number.isFinite(a);
  const fb = Number.isFinite(b);
  if (fa && fb) return 0.5 * (a + b);
  if (!fa && !fb) return 0;
  const finite = fa ? a : b;
  const dir = Math.sign(fa ? b : a);
  if (finite === 0) return dir;
  const step = finite * dir > 0 ? Math.abs(finite) : 0.5 * Math.abs(finite);
  return finite + dir * step;
}

const F_DOC = "a function of one variable, like f(x) = x^2 or f(P) = V(P)";

export const numerics: BuiltinDef[] = [
  defineBuiltin({
    name: "integrate",
    group: "numerics",
    params: [
      { name: "f", type: "function", doc: F_DOC },
      { name: "a", type: "any", doc: "lower bound: a quantity, a number, or -Infinity" },
      { name: "b", type: "any", doc: "upper bound, same dimension as a; may be Infinity" },
      { name: "options", type: "record", optional: true, doc: "{rel: 1e-10, abs: 0, maxEval: 50000}" },
    ],
    returns: "any",
    doc: "The integral of f from a to b, in the units of f times those of x. Either bound may be Infinity.",
    method: "Adaptive 21-point Gauss-Kronrod quadrature with a global error estimate; infinite ranges and end-point singularities by change of variable (lib/numerics/integrate.ts).",
    source: "QUADPACK (Piessens et al., 1983) rule constants and error estimate",
    examples: ["integrate(f(x) = x^2, 0, 3)", "integrate(f(V) = 1 / V^2 * 1 m^6, 1 m^3, Infinity)", "integrate(f(P) = 8.314 J/(mol K) * 300 K / P, 1 bar, 10 bar, {rel: 1e-12})"],
    impl: ({ f, a, b, options }, ctx) => {
      const { axis, lo, hi } = boundsOf("integrate", ["a", a], ["b", b], ctx);
      const opts = optionsOf("integrate", options, ["rel", "abs", "maxEval"]);
      const { g, yUnit } = plainFunction("integrate", f, axis, probePoint(lo, hi), ctx);
      if (isUnit(opts.abs)) opts.abs = (opts.abs as Unit).toSI().toNumber();
      const r = guarded("integrate", ctx, () => integrate(g, lo, hi, { ...opts, shouldStop: ctx.shouldStop }));
      return combine(r.value, yUnit, axis.unit, "*", ctx);
    },
  }),
  defineBuiltin({
    name: "seek",
    group: "numerics",
    params: [
      { name: "f", type: "function", doc: F_DOC },
      { name: "lo", type: "any", doc: "one end of the bracket (quantity or number)" },
      { name: "hi", type: "any", doc: "other end, same dimension; f(lo) and f(hi) must differ in sign unless expand is true" },
      { name: "options", type: "record", optional: true, doc: "{expand: true, rtol: 1e-12, maxIter: 500}" },
    ],
    returns: "any",
    doc: "The x between lo and hi where f(x) = 0, in the unit of lo.",
    method: "Brent's method (inverse quadratic interpolation with bisection safeguard); optional bracket expansion (lib/numerics/brent.ts).",
    source: "R. P. Brent, Algorithms for Minimization without Derivatives (1973), ch. 4",
    examples: ["seek(f(x) = x^2 - 2, 0, 2)", "seek(f(T) = T - 300 K, 250 K, 350 K)", "seek(f(x) = exp(x) - 1e6, 0, 1, {expand: true})"],
    impl: ({ f, lo, hi, options }, ctx) => {
      const { axis, lo: l, hi: h } = boundsOf("seek", ["lo", lo], ["hi", hi], ctx);
      for (const [name, v] of [["lo", l], ["hi", h]] as const) {
        if (!Number.isFinite(v)) throw new ArgumentError(`argument ${name} of seek() must be finite, got ${v}`);
      }
      const opts = optionsOf("seek", options, ["expand", "rtol", "xtol", "maxIter"], axis, "xtol");
      const { g, yUnit, yShown } = plainFunction("seek", f, axis, l, ctx);
      const show = (x: number, unit: string, shown: string) => (unit === "" ? String(Number(x.toPrecision(6))) : ctx.textOf((ctx.units.fromSI(x, unit) as Unit).to(shown)));
      // An estimate within 1e-9 of the bracket width from 0 is shown as 0 (a pole at 0 stalls at -1e-150).
      const xText = (x: number) => show(Math.abs(x) < 1e-9 * Math.abs(h - l) ? 0 : x, axis.unit, axis.shown);
      const yText = (y: number) => show(y, yUnit, yShown);
      // Checked here rather than left to brent so the message shows the user's units.
      const fl = g(l);
      const fh = g(h);
      if (!opts.expand && fl !== 0 && fh !== 0 && Math.sign(fl) === Math.sign(fh)) {
        throw new ArgumentError(`seek(): f(lo) = ${yText(fl)} at lo = ${xText(l)} and f(hi) = ${yText(fh)} at hi = ${xText(h)} have the same sign, so no root is bracketed; choose lo and hi on either side of the root, or pass {expand: true}`);
      }
      let x: number;
      let lastEstimate: number | undefined;
      try {
        x = guarded("seek", ctx, () => {
          try {
            return brent(g, l, h, { ...opts, shouldStop: ctx.shouldStop }, "seek").value;
          } catch (e) {
            if (e instanceof RootError && /no convergence/.test(e.message)) lastEstimate = e.value;
            throw e;
          }
        });
      } catch (e) {
        if (lastEstimate === undefined || !Number.isFinite(lastEstimate) || !(e instanceof ArgumentError)) throw e;
        const at = lastEstimate;
        throw poleError(g, at, fl, fh, xText, yText, false) ?? new ArgumentError(`${e.message.replace(/ \(bracket \[.*\]\)/, "")} (last estimate x = ${xText(at)}, f = ${yText(g(at))})`);
      }
      const pole = poleError(g, x, fl, fh, xText, yText, true);
      if (pole) throw pole;
      if (axis.unit === "") return x;
      return (ctx.units.fromSI(x, axis.unit) as Unit).to(axis.shown);
    },
  }),
  defineBuiltin({
    name: "slope",
    group: "numerics",
    params: [
      { name: "f", type: "function", doc: F_DOC },
      { name: "x", type: "any", doc: "the point (quantity or number)" },
      { name: "options", type: "record", optional: true, doc: "{h: step like x, order: 1 or 2}" },
    ],
    returns: "any",
    doc: "The derivative df/dx at x (order 2: the second derivative), in the units of f over those of x.",
    method: "Central differences with Richardson extrapolation (Ridders), initial step 1% of |x| (lib/numerics/derivative.ts).",
    source: "C. J. F. Ridders, Adv. Eng. Software 4 (1982) 75",
    examples: ["slope(f(x) = x^3, 2)", "slope(f(P) = 8.314 J/(mol K) * 300 K / P, 1 bar)"],
    impl: ({ f, x, options }, ctx) => {
      const axis = axisOf("slope", [["x", x]], ctx);
      const x0 = axis.si(x, "x");
      if (!Number.isFinite(x0)) throw new ArgumentError(`argument x of slope() must be finite, got ${x0}`);
      const opts = optionsOf("slope", options, ["h", "order"], axis, "h");
      const { g, yUnit } = plainFunction("slope", f, axis, x0, ctx);
      const r = guarded("slope", ctx, () => derivative(g, x0, { ...opts, shouldStop: ctx.shouldStop }));
      return combine(r.value, yUnit, axis.unit, "/", ctx, opts.order === 2 ? 2 : 1);
    },
  }),
];
