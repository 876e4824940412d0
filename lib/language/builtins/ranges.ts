/**
 * span and logspan: evenly and logarithmically spaced values with units, returned as one compact
 * column (SI numbers + the unit of the first end point) that vectorised built-ins read directly.
 * Offset units (degC, barg): both space absolute values; for span that is the same as spacing the
 * offset numbers, for logspan it is the only meaningful ratio (documented in its help, noted on use).
 */
import type { Unit } from "mathjs";
import { ArgumentError } from "./bind.js";
import { defineBuiltin, type BuiltinContext, type BuiltinDef } from "./define.js";
import { MAX_ELEMENTS as MAX_POINTS } from "../guards.js";
import { isOffsetQuantity } from "../../units/index.js";

interface Ends { a: number; b: number; siUnit: string; displayUnit: string }

const N_PARAM = { name: "n", type: "number", doc: "number of points, 2 or more" } as const;

/** The ends of span/logspan in SI and the checked point count n. */
function endsAndCount(fn: string, a: unknown, b: unknown, n: number, ctx: BuiltinContext): Ends & { k: number } {
  const e = ends(fn, a, b, ctx);
  return { ...e, k: count(fn, n) };
}

/** Both ends to SI numbers of one dimension; offsets (degC, barg) are resolved to absolute values. */
function ends(fn: string, a: unknown, b: unknown, ctx: BuiltinContext): Ends {
  const isUnit = (x: unknown): x is Unit => typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;
  if (typeof a === "number" && typeof b === "number") return { a, b, siUnit: "", displayUnit: "" };
  if (isUnit(a) && isUnit(b)) {
    if (!a.equalBase(b)) {
      throw new ArgumentError(`${fn}(): a and b must have the same dimension, got ${ctx.textOf(a)} and ${ctx.textOf(b)}`);
    }
    const siA = a.toSI();
    const siUnit = siA.formatUnits();
    return { a: siA.toNumber(siUnit), b: b.toSI().toNumber(siUnit), siUnit, displayUnit: a.formatUnits() || siUnit };
  }
  throw new ArgumentError(`${fn}(): a and b must both be quantities (like 300 K) or both plain numbers, got ${ctx.textOf(a)} and ${ctx.textOf(b)}`);
}

function count(fn: string, n: number): number {
  if (!Number.isInteger(n) || n < 2 || n > MAX_POINTS) {
    throw new ArgumentError(`argument n of ${fn}() must be a whole number from 2 to ${MAX_POINTS}, got ${n}`);
  }
  return n;
}

/** k points at(0..k-1) as one column in the unit of a; the last is exactly e.b (no rounding drift). */
function spaced(e: Ends, k: number, at: (i: number) => number, ctx: BuiltinContext): unknown {
  const out = new Float64Array(k);
  for (let i = 0; i < k; i++) out[i] = at(i);
  out[k - 1] = e.b;
  return ctx.column(out, e.siUnit, e.displayUnit);
}

export const ranges: BuiltinDef[] = [
  defineBuiltin({
    name: "span",
    group: "ranges",
    params: [
      { name: "a", type: "quantity", doc: "first value (a quantity or a plain number)" },
      { name: "b", type: "quantity", doc: "last value, same dimension as a" },
      N_PARAM,
    ],
    returns: "column",
    doc: "n evenly spaced values from a to b inclusive, in the unit of a. Feed it to any built-in that takes a quantity to get a whole curve in one call.",
    method: "a + i (b - a)/(n - 1) for i = 0..n-1 on absolute SI values, so 20 degC..80 degC steps in kelvin; the last point is exactly b.",
    examples: ["span(300 K, 400 K, 5)", "span(20 degC, 80 degC, 4)", "span(0, 1, 11)"],
    impl: ({ a, b, n }, ctx) => {
      const { k, ...e } = endsAndCount("span", a, b, n, ctx);
      const step = (e.b - e.a) / (k - 1);
      return spaced(e, k, (i) => e.a + i * step, ctx);
    },
  }),
  defineBuiltin({
    name: "logspan",
    group: "ranges",
    params: [
      { name: "a", type: "quantity", doc: "first value, > 0 (absolute)" },
      { name: "b", type: "quantity", doc: "last value, > 0, same dimension as a" },
      N_PARAM,
    ],
    returns: "column",
    doc: "n logarithmically spaced values from a to b inclusive (constant ratio between neighbours), in the unit of a. Suits pressure sweeps over decades. With an offset unit (degC, degF, barg, psig) the constant ratio is between ABSOLUTE values (K, Pa), and the points are shown back in the unit of a: logspan(1 degC, 100 degC, 3) is 274.15 K, 319.84 K, 373.15 K = 1, 46.69, 100 degC. A ratio of Celsius or gauge numbers has no physical meaning (0 degC or 0 barg would be a log of zero); a note says so when it applies.",
    method: "a (b/a)^(i/(n-1)) for i = 0..n-1 on absolute SI values (offset units resolved first); the last point is exactly b.",
    examples: ["logspan(1 bar, 100 bar, 3)", "logspan(1e-3, 1, 4)", "logspan(1 barg, 100 barg, 3)"],
    impl: ({ a, b, n }, ctx) => {
      const { k, ...e } = endsAndCount("logspan", a, b, n, ctx);
      if (!(e.a > 0 && e.b > 0)) {
        throw new ArgumentError(`logspan(): a and b must be positive (absolute), got ${ctx.textOf(a)} and ${ctx.textOf(b)}`);
      }
      if (isOffsetQuantity(a) || isOffsetQuantity(b)) {
        const dim = ctx.units.dimensionOf(a as Unit);
        const named = dim ? ctx.units.siUnitOf(dim) : e.siUnit;
        const abs = (x: number) => ctx.textOf(ctx.units.fromSI(x, named));
        ctx.warn(`logspan(): ${e.displayUnit} is an offset unit; the points have a constant ratio of absolute values (${abs(e.a)} to ${abs(e.b)}) and are shown in ${e.displayUnit}`);
      }
      const ratio = Math.log(e.b / e.a) / (k - 1);
      return spaced(e, k, (i) => e.a * Math.exp(i * ratio), ctx);
    },
  }),
];
