/**
 * The restricted mathjs instance a session evaluates in. Order matters: our units are installed
 * first, then the built-ins, then every function that could reach the parser or mathjs internals from
 * inside an expression is replaced by one that throws. We keep private references to parse for
 * the session itself. mathjs already refuses property access to constructor, __proto__ and
 * prototype methods (getSafeProperty); security.test.ts keeps the escape attempts as regressions.
 */
import type { MathJsInstance, MathNode } from "mathjs";
import { loadMathjs } from "./mathjs.js";

/** Names removed from expressions: they parse code, change the instance or build raw typed functions. */
export const DISABLED_NAMES = [
  "import", "createUnit", "evaluate", "parse", "compile", "parser", "simplify", "simplifyConstant",
  "simplifyCore", "derivative", "resolve", "rationalize", "symbolicEqual", "leafCount", "reviver",
  "replacer", "config", "help",
] as const;

export interface RestrictedMath {
  math: MathJsInstance;
  /** The parser, kept for the session only. */
  parse(code: string): MathNode;
}

export interface RestrictedMathOptions {
  /** Adds units and the offset policy to the instance before it is locked. */
  installUnits?: (math: MathJsInstance) => void;
  /** Built-in functions by name (override mathjs functions of the same name), made for the instance. */
  functions: (math: MathJsInstance) => Record<string, (...args: unknown[]) => unknown>;
}

type AnyFn = ((...args: unknown[]) => unknown) & { transform?: (...args: unknown[]) => unknown };

/**
 * Puts `value` under `name` on the instance and in the namespace expressions compile against
 * (with its transform, if it has one), like math.import with override, but without reading the
 * old value first: math.import resolves mathjs's lazily built function of that name just to
 * inspect it, which costs up to tens of ms each for functions never called (simplify, evaluate,
 * symbolicEqual) and made session creation slower.
 */
export function defineOnInstance(math: MathJsInstance, name: string, value: AnyFn): void {
  const expression = (math as unknown as { expression: { transform: Record<string, unknown>; mathWithTransform: Record<string, unknown> } }).expression;
  const put = (target: object, v: unknown) => Object.defineProperty(target, name, { value: v, writable: true, configurable: true, enumerable: true });
  put(math, value);
  if (typeof value.transform === "function") put(expression.transform, value.transform);
  else delete expression.transform[name];
  put(expression.mathWithTransform, value.transform ?? value);
}

export function createRestrictedMath(options: RestrictedMathOptions): RestrictedMath {
  const lib = loadMathjs();
  const math = lib.create(lib.all, { number: "number" }) as MathJsInstance;
  options.installUnits?.(math);
  for (const [name, fn] of Object.entries(options.functions(math))) defineOnInstance(math, name, fn);
  const parse = math.parse.bind(math) as (code: string) => MathNode;
  for (const name of DISABLED_NAMES) {
    defineOnInstance(math, name, () => {
      throw new Error(`${name}() is not available in cells`);
    });
  }
  return { math, parse };
}
