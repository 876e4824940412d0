/**
 * Size limits on the mathjs functions that build arrays from a few numbers. `1:1e9` or
 * `zeros(1e9)` asks for gigabytes in one synchronous call that no interrupt can reach; the worker
 * would run out of memory and lose every variable. These wrappers count the elements a call would
 * make before making any, and refuse past MAX_ELEMENTS with an error that says what was asked and
 * what the limit is. Everything else goes to the original mathjs function unchanged.
 *
 * Guarded: the range operator `a:b`, `a:step:b` and range(), zeros, ones, identity, random and
 * randomInt with a size, resize, matrixFromFunction, diag of a vector, kron, concat. Not guarded:
 * products that broadcast or multiply a column by a row (an n x 1 times a 1 x n matrix).
 */
import type { MathJsInstance } from "mathjs";
import { ArgumentError } from "./builtins/bind.js";

/** Most elements one array-building call may make: 80 MB of doubles (span, logspan share it). */
export const MAX_ELEMENTS = 10_000_000;

type Fn = ((...args: unknown[]) => unknown) & { transform?: (...args: unknown[]) => unknown };

const isMatrixLike = (x: unknown): x is { valueOf(): unknown; size(): number[] } =>
  typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;

/** A plain number from a number, BigNumber or Fraction; NaN for anything else. */
function num(x: unknown): number {
  if (typeof x === "number") return x;
  if (typeof x === "object" && x !== null && ((x as { isBigNumber?: boolean }).isBigNumber || (x as { isFraction?: boolean }).isFraction)) {
    return Number((x as { valueOf(): unknown }).valueOf());
  }
  return NaN;
}

/** Compact, exact text for counts and range ends in messages: 1e9, 5e8, 10000001 -> 1.0000001e7, 42. */
export function compact(x: number): string {
  if (!Number.isFinite(x)) return String(x);
  if (Math.abs(x) >= 1e6) return x.toExponential().replace("e+", "e");
  return String(x);
}

/** Elements of an array or matrix (nested arrays counted through), for kron and diag. */
function countOf(x: unknown): number {
  if (isMatrixLike(x)) return x.size().reduce((a, b) => a * b, 1);
  if (Array.isArray(x)) return x.reduce((n: number, e) => n + (Array.isArray(e) ? countOf(e) : 1), 0);
  return 1;
}

/** Product of a size given as an array/matrix of numbers; NaN when it is not one. */
function sizeProduct(size: unknown): number {
  const items = isMatrixLike(size) ? (size.valueOf() as unknown[]) : Array.isArray(size) ? size : undefined;
  if (items === undefined) return NaN;
  return items.flat(Infinity).reduce((p: number, v) => p * Math.max(0, Math.floor(num(v))), 1);
}

/** Product of the leading numeric arguments (zeros(3, 4)) or of a size array (zeros([3, 4])). */
function leadingSize(args: unknown[]): number {
  if (args.length > 0 && (Array.isArray(args[0]) || isMatrixLike(args[0]))) return sizeProduct(args[0]);
  let p = 1;
  for (const a of args) {
    const v = num(a);
    if (Number.isNaN(v)) break;
    p *= Math.max(0, Math.floor(v));
  }
  return p;
}

function refuse(fn: string, count: number, what: string): never {
  throw new ArgumentError(`${fn}(): ${what} would make ${compact(count)} elements; the limit is ${compact(MAX_ELEMENTS)}`);
}

/** Numeric view of a range end: numbers as they are, quantities by their SI value. */
function rangeValue(x: unknown): number {
  if (typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true) {
    return Number((x as { value: unknown }).value);
  }
  return num(x);
}

/** Elements of range(start, end[, step]), end included or not; NaN when it cannot be told. */
function rangeCount(args: unknown[], includeEnd: boolean): { count: number; text: string } {
  let parts = args.filter((a) => typeof a !== "boolean");
  const endFlag = args.find((a) => typeof a === "boolean");
  const inclusive = typeof endFlag === "boolean" ? endFlag : includeEnd;
  let text: string;
  if (parts.length === 1 && typeof parts[0] === "string") {
    const p = parts[0].split(":").map((s) => Number(s.trim()));
    parts = p.length === 3 ? [p[0], p[2], p[1]] : p; // "start:step:end" -> start, end, step
    text = parts[0] === undefined ? "" : parts.length === 3 ? `${compact(num(parts[0]))}:${compact(num(parts[2]))}:${compact(num(parts[1]))}` : `${compact(num(parts[0]))}:${compact(num(parts[1]))}`;
  } else {
    const show = (x: unknown) => (typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit ? String(x) : compact(num(x)));
    text = parts.length >= 3 ? `${show(parts[0])}:${show(parts[2])}:${show(parts[1])}` : `${show(parts[0])}:${show(parts[1])}`;
  }
  const [start, end, step = 1] = parts.map(rangeValue);
  if (start === undefined || end === undefined || !Number.isFinite(step) || step === 0) return { count: NaN, text };
  const span = (end - start) / step;
  if (Number.isNaN(span)) return { count: NaN, text };
  const count = span < 0 ? 0 : span === Infinity ? Infinity : Math.floor(span + 1e-9) + (inclusive ? 1 : 0);
  return { count, text };
}

/**
 * The original of `target[name]`, resolved on first use. mathjs builds most functions lazily (an
 * accessor that runs a factory on first read); keeping the accessor's getter lets a wrapper be
 * installed now and the original built only if a cell ever calls it (session creation stays cheap).
 */
function lazyOriginal(target: object, name: string): () => Fn | undefined {
  const desc = Object.getOwnPropertyDescriptor(target, name);
  if (desc === undefined) return () => undefined;
  if (desc.get === undefined) return () => desc.value as Fn;
  const get = desc.get.bind(target);
  let fn: Fn | undefined;
  return () => (fn ??= get() as Fn);
}

/**
 * Guarded replacements for the instance's array builders, to define on the instance (see
 * mathInstance.defineOnInstance) before it is locked. `range` keeps a guarded `transform` (in
 * expressions `a:b` and range() include their end).
 */
export function sizeGuards(math: MathJsInstance): Record<string, Fn> {
  const m = math as unknown as Record<string, Fn> & { expression: { transform: object } };
  const out: Record<string, Fn> = {};
  const guard = (name: string, count: (args: unknown[]) => number, what: (args: unknown[]) => string) => {
    if (!(name in m)) return;
    const original = lazyOriginal(m, name);
    out[name] = (...args: unknown[]) => {
      const n = count(args);
      if (n > MAX_ELEMENTS) refuse(name, n, what(args));
      return original()!(...args);
    };
  };
  const sizeText = (args: unknown[]) => `size ${args.filter((a) => typeof a !== "string").map((a) => (Array.isArray(a) || isMatrixLike(a) ? `[${(isMatrixLike(a) ? (a.valueOf() as unknown[]) : a).flat(Infinity).map((v) => compact(num(v))).join(", ")}]` : compact(num(a)))).join(", ")}`;
  guard("zeros", leadingSize, sizeText);
  guard("ones", leadingSize, sizeText);
  guard("identity", (a) => (a.length >= 1 && typeof a[1] !== "number" && !Array.isArray(a[0]) && !isMatrixLike(a[0]) ? num(a[0]) ** 2 : leadingSize(a)), sizeText);
  guard("random", (a) => sizeProduct(a[0]), (a) => sizeText([a[0]]));
  guard("randomInt", (a) => sizeProduct(a[0]), (a) => sizeText([a[0]]));
  guard("resize", (a) => sizeProduct(a[1]), (a) => sizeText([a[1]]));
  guard("matrixFromFunction", (a) => sizeProduct(a[0]), (a) => sizeText([a[0]]));
  guard("diag", (a) => {
    const n = countOf(a[0]);
    const isVector = Array.isArray(a[0]) ? !a[0].some(Array.isArray) : isMatrixLike(a[0]) && a[0].size().length === 1;
    return isVector ? (n + Math.abs(num(a[1] ?? 0) || 0)) ** 2 : n;
  }, (a) => `a ${compact(countOf(a[0]))}-element vector on the diagonal`);
  guard("kron", (a) => countOf(a[0]) * countOf(a[1]), (a) => `${compact(countOf(a[0]))} x ${compact(countOf(a[1]))} elements`);

  // concat has a transform (its dimension argument counts from 1 in cells): guard both.
  if ("concat" in m) {
    const concat = lazyOriginal(m, "concat");
    const concatTransform = lazyOriginal(m.expression.transform, "concat");
    const check = (args: unknown[]) => {
      const n = args.reduce((sum: number, a) => sum + (Array.isArray(a) || isMatrixLike(a) ? countOf(a) : 0), 0);
      if (n > MAX_ELEMENTS) refuse("concat", n, `joining ${args.filter((a) => Array.isArray(a) || isMatrixLike(a)).length} arrays`);
    };
    const guarded: Fn = (...args: unknown[]) => (check(args), concat()!(...args));
    guarded.transform = (...args: unknown[]) => (check(args), concatTransform()!(...args));
    out.concat = guarded;
  }
  if ("range" in m) {
    const range = lazyOriginal(m, "range");
    // The transform's own lazy accessor (the one on mathWithTransform only reads this one back).
    const rangeTransform = lazyOriginal(m.expression.transform, "range");
    const check = (args: unknown[], includeEnd: boolean) => {
      const { count, text } = rangeCount(args, includeEnd);
      if (count > MAX_ELEMENTS) {
        throw new ArgumentError(`range ${text} has ${compact(count)} elements; the limit is ${compact(MAX_ELEMENTS)}`);
      }
    };
    const guarded: Fn = (...args: unknown[]) => {
      check(args, false);
      return range()!(...args);
    };
    guarded.transform = (...args: unknown[]) => {
      check(args, true);
      return rangeTransform()!(...args);
    };
    out.range = guarded;
  }
  return out;
}
