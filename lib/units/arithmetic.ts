/**
 * Installs the offset policy (offset.ts) into a mathjs instance by overriding the operators the
 * expression parser calls (its OperatorNodes look functions up on the instance when compiled). Values
 * without offset quantities take a fast path straight to the original functions. Must run before the
 * instance is locked (import disabled).
 */
import type { MathJsInstance, Matrix, Unit } from "mathjs";
import { UnitsError } from "./errors.js";
import { isMathjsMismatch, isOpaque, opaqueOperand, operandMismatch } from "./mismatch.js";
import { absoluteOf, checkPower, comparable, isOffsetQuantity, isUnitValue, productOperands, sumOperands } from "./offset.js";

type Binary = (a: unknown, b: unknown) => unknown;

function isMatrix(x: unknown): x is Matrix {
  return typeof x === "object" && x !== null && (x as { isMatrix?: boolean }).isMatrix === true;
}

/** True when x is, or (for arrays and matrices) contains, an offset quantity. */
export function containsOffset(x: unknown): boolean {
  if (isOffsetQuantity(x)) return true;
  if (Array.isArray(x)) return x.some(containsOffset);
  if (isMatrix(x)) return containsOffset(x.valueOf());
  return false;
}

/** Apply a scalar rule element by element (scalar broadcast, or equal shapes); keep matrix type. */
function elementwise(math: MathJsInstance, f: Binary, a: unknown, b: unknown): unknown {
  const wasMatrix = isMatrix(a) || isMatrix(b);
  const plain = (x: unknown): unknown => (isMatrix(x) ? x.valueOf() : x);
  const go = (x: unknown, y: unknown): unknown => {
    if (Array.isArray(x) && Array.isArray(y)) {
      if (x.length !== y.length) throw new UnitsError("bad_argument", `arrays of different lengths (${x.length} and ${y.length})`);
      return x.map((xi, i) => go(xi, y[i]));
    }
    if (Array.isArray(x)) return x.map((xi) => go(xi, y));
    if (Array.isArray(y)) return y.map((yi) => go(x, yi));
    return f(x, y);
  };
  const out = go(plain(a), plain(b));
  return wasMatrix ? math.matrix(out as never) : out;
}

const isCollection = (x: unknown): boolean => Array.isArray(x) || isMatrix(x);

/**
 * Override add, subtract, multiply, divide, dotMultiply, dotDivide, pow, dotPow, sum and the
 * comparison functions of `math` with offset-aware versions.
 */
export function installOffsetPolicy(math: MathJsInstance): void {
  const m = math as unknown as Record<string, (...args: unknown[]) => unknown>;
  // The originals, each built on first use: mathjs creates functions lazily (an accessor running a
  // factory on first read), and reading all eighteen here cost about 25 ms of session creation for
  // functions most cells never call (dotPow, mean, compare ...).
  const orig: Record<string, (...args: unknown[]) => unknown> = {};
  for (const n of ["add", "subtract", "multiply", "divide", "dotMultiply", "dotDivide", "pow", "dotPow", "sum", "mean",
    "compare", "equal", "unequal", "larger", "largerEq", "smaller", "smallerEq", "cbrt"]) {
    Object.defineProperty(orig, n, { get: lazyOriginal(m, n), enumerable: true });
  }

  const sumLike = (op: "add" | "subtract"): Binary => {
    const scalar: Binary = (a, b) =>
      isUnitValue(a) && isUnitValue(b) && a.value !== null && b.value !== null && a.equalBase(b) && (isOffsetQuantity(a) || isOffsetQuantity(b))
        ? sumOperands(math, op, a, b)
        : orig[op]!(a, b);
    return (a, b) => {
      if (!containsOffset(a) && !containsOffset(b)) return orig[op]!(a, b);
      return isCollection(a) || isCollection(b) ? elementwise(math, scalar, a, b) : scalar(a, b);
    };
  };

  const productLike = (name: string, op: "multiply" | "divide", elementwiseOnly: boolean): Binary => {
    const scalar: Binary = (a, b) => {
      const [x, y] = productOperands(math, op, a, b);
      return orig[name]!(x, y);
    };
    return (a, b) => {
      if (!containsOffset(a) && !containsOffset(b)) return orig[name]!(a, b);
      if (isCollection(a) && isCollection(b) && !elementwiseOnly) {
        throw new UnitsError("ambiguous_offset", `${name} of two arrays holding offset temperatures or gauge pressures: convert them first, e.g. (T to K) or (P to bara)`);
      }
      if (isCollection(b) && op === "divide" && !elementwiseOnly) {
        throw new UnitsError("ambiguous_offset", "dividing by an array holding offset quantities: convert it first, e.g. (T to K)");
      }
      return isCollection(a) || isCollection(b) ? elementwise(math, scalar, a, b) : scalar(a, b);
    };
  };

  const powLike = (name: string): Binary => (a, b) => {
    if (containsOffset(a)) {
      if (isCollection(a)) elementwise(math, (x, p) => (checkPower(math, x, p), x), a, b);
      else checkPower(math, a, b);
    }
    return orig[name]!(a, b);
  };

  const COMPARISON: Record<string, string> = { compare: "compare", equal: "==", unequal: "!=", larger: ">", largerEq: ">=", smaller: "<", smallerEq: "<=" };
  // A dimension mismatch between two single quantities names both (mismatch.ts); arrays keep mathjs's words.
  const named = (op: string, f: Binary): Binary => (a, b) => {
    try {
      return f(a, b);
    } catch (err) {
      if (isMathjsMismatch(err) && !isCollection(a) && !isCollection(b)) throw operandMismatch(op, a, b);
      // A record, model or function as an operand: mathjs would list its internal signatures.
      if (!(err instanceof UnitsError) && (isOpaque(a) || isOpaque(b))) throw opaqueOperand(op, a, b);
      throw err;
    }
  };
  const compareLike = (name: string): Binary => named(COMPARISON[name] ?? name, (a, b) =>
    containsOffset(a) || containsOffset(b)
      ? isCollection(a) || isCollection(b)
        ? elementwise(math, (x, y) => orig[name]!(comparable(math, x), comparable(math, y)), a, b)
        : orig[name]!(comparable(math, a), comparable(math, b))
      : orig[name]!(a, b));

  const binary = (name: string, f: Binary) =>
    math.typed(name, {
      "any, any": f,
      "any, any, ...any": (a: unknown, b: unknown, rest: unknown[]) => rest.reduce((acc, c) => f(acc, c), f(a, b)),
    });

  const sum = (...args: unknown[]): unknown => {
    const items = args.length === 1 && isCollection(args[0]) ? (isMatrix(args[0]) ? (args[0].valueOf() as unknown[]) : (args[0] as unknown[])).flat(Infinity) : args;
    if (items.filter(isOffsetQuantity).length > 1) {
      throw new UnitsError("absolute_plus_absolute", "sum of several absolute temperatures or gauge pressures has no meaning; sum differences (e.g. in K or bar) or convert first with (T to K)");
    }
    return orig.sum!(...args);
  };

  // The mean of absolute temperatures is itself absolute: average the absolute values.
  const mean = (...args: unknown[]): unknown => {
    if (!args.some(containsOffset)) return orig.mean!(...args);
    const flat = args.length === 1 && isCollection(args[0]) ? (isMatrix(args[0]) ? (args[0].valueOf() as unknown[]) : (args[0] as unknown[])).flat(Infinity) : args;
    if (!flat.every(isOffsetQuantity)) {
      throw new UnitsError("ambiguous_offset", "mean of offset temperatures or gauge pressures mixed with other values: convert them first, e.g. (T to K)");
    }
    const first = flat[0] as Unit;
    return (orig.mean!(flat.map((x) => absoluteOf(math, x as Unit))) as Unit).to(first.units[0]!.unit.name);
  };

  // mathjs 15's cbrt of a negative quantity flips the sign of its ARGUMENT in place (x = -8 m^3;
  // cbrt(x) leaves x = 8 m^3): hand it a copy.
  const own = (x: unknown): unknown => (isUnitValue(x) ? x.clone() : isCollection(x) ? math.clone(x as never) : x);

  const overrides: Record<string, unknown> = {
    cbrt: math.typed("cbrt", {
      any: (x: unknown) => orig.cbrt!(own(x)),
      "any, boolean": (x: unknown, all: boolean) => orig.cbrt!(own(x), all),
    }),
    add: binary("add", named("+", sumLike("add"))),
    subtract: math.typed("subtract", { "any, any": named("-", sumLike("subtract")) }),
    multiply: binary("multiply", named("*", productLike("multiply", "multiply", false))),
    divide: math.typed("divide", { "any, any": named("/", productLike("divide", "divide", false)) }),
    dotMultiply: math.typed("dotMultiply", { "any, any": productLike("dotMultiply", "multiply", true) }),
    dotDivide: math.typed("dotDivide", { "any, any": productLike("dotDivide", "divide", true) }),
    pow: math.typed("pow", { "any, any": named("^", powLike("pow")) }),
    dotPow: math.typed("dotPow", { "any, any": powLike("dotPow") }),
    sum: math.typed("sum", { "...any": (args: unknown[]) => sum(...args) }),
    mean: math.typed("mean", { "...any": (args: unknown[]) => mean(...args) }),
  };
  for (const n of ["compare", "equal", "unequal", "larger", "largerEq", "smaller", "smallerEq"]) {
    overrides[n] = math.typed(n, { "any, any": compareLike(n) });
  }
  for (const [name, fn] of Object.entries(overrides)) replaceFunction(math, name, fn);
}

/** A getter for the original `target[name]`, resolving mathjs's lazy accessor only when first read. */
function lazyOriginal(target: object, name: string): () => (...args: unknown[]) => unknown {
  const desc = Object.getOwnPropertyDescriptor(target, name);
  if (desc?.get === undefined) return () => desc?.value as (...args: unknown[]) => unknown;
  const get = desc.get.bind(target);
  let fn: ((...args: unknown[]) => unknown) | undefined;
  return () => (fn ??= get() as (...args: unknown[]) => unknown);
}

/**
 * What math.import(..., {override: true}) does for a function without a transform, minus reading
 * the old value (which would build it): the instance and the namespace expressions compile against
 * get `fn`; mathjs's transform of that name (sum and mean have one) is dropped, as import drops it.
 */
function replaceFunction(math: MathJsInstance, name: string, fn: unknown): void {
  const expression = (math as unknown as { expression: { transform: Record<string, unknown>; mathWithTransform: object } }).expression;
  const put = (target: object) => Object.defineProperty(target, name, { value: fn, writable: true, configurable: true, enumerable: true });
  put(math);
  delete expression.transform[name];
  put(expression.mathWithTransform);
}
