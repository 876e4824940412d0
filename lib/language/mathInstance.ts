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

export function createRestrictedMath(options: RestrictedMathOptions): RestrictedMath {
  const lib = loadMathjs();
  const math = lib.create(lib.all, { number: "number" }) as MathJsInstance;
  options.installUnits?.(math);
  math.import(options.functions(math), { override: true });
  const parse = math.parse.bind(math) as (code: string) => MathNode;
  const locked: Record<string, () => never> = {};
  for (const name of DISABLED_NAMES) {
    locked[name] = () => {
      throw new Error(`${name}() is not available in cells`);
    };
  }
  math.import(locked, { override: true });
  return { math, parse };
}
