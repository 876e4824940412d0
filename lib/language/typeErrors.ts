/**
 * mathjs's typed-function messages in the user's terms. mathjs names its internal functions
 * (multiplyScalar, equalScalar, number) and its type list (number or Complex or BigNumber or bigint
 * or Fraction or Unit ...); a cell user wrote an operator or a call and needs to know which value
 * was the wrong kind and what would fit.
 */

/** Internal mathjs function names as the operator or call the user wrote. */
const OPERATORS: Record<string, string> = {
  add: "+", addScalar: "+", subtract: "-", subtractScalar: "-", multiply: "*", multiplyScalar: "*",
  divide: "/", divideScalar: "/", pow: "^", dotPow: ".^", dotMultiply: ".*", dotDivide: "./", unaryMinus: "unary -",
  unaryPlus: "unary +", equal: "==", equalScalar: "==", unequal: "!=", larger: ">", largerEq: ">=",
  smaller: "<", smallerEq: "<=", compare: "compare()", mod: "mod", number: "a conversion to a number",
};

/** A mathjs type name as words. */
export function typeWords(type: string): string {
  const t = type.trim();
  if (/undefined/.test(t)) return "nothing (no value)";
  switch (t) {
    case "number": return "a plain number";
    case "Unit": return "a quantity";
    case "Object": return "a record or model";
    case "Complex": return "a complex number";
    case "string": return "text";
    case "boolean": return "true/false";
    case "function": return "a function";
    case "Array": case "Matrix": case "DenseMatrix": case "SparseMatrix": return "an array";
    default: return t;
  }
}

/** What a function accepts, from mathjs's "A or B or C" list, as a short phrase. */
function acceptedWords(expected: string): string {
  const types = expected.split(/\s+or\s+/).map((t) => t.trim());
  const words = new Set<string>();
  if (types.includes("number")) words.add("numbers");
  if (types.includes("Unit")) words.add("quantities");
  if (types.some((t) => /Array|Matrix/.test(t))) words.add("arrays");
  if (words.size === 0) types.forEach((t) => words.add(typeWords(t)));
  return [...words].join(", ");
}

/**
 * A message for "Unexpected type of argument in function fn (expected: ..., actual: ..., index: i)",
 * or undefined when the built-in's own name should be kept (our built-ins check their arguments).
 */
export function wrongTypeMessage(fn: string, expected: string, actual: string, index: number): string {
  if (actual.trim() === "Complex") {
    return "the result is a complex number (for example the square root of a negative value); cells compute with real quantities: check the sign of the argument";
  }
  const op = OPERATORS[fn];
  const where = op ? (/^[a-z]/.test(op) ? op : `the operator ${op}`) : `${fn}()`;
  const pair = expected.trim() === "Unit" && actual.trim() === "number"
    ? "; give the plain number a unit (like 2 bar), or compare numbers: (x to bar) / (1 bar)"
    : "";
  return `${where} cannot take ${typeWords(actual)} as argument ${index + 1}: it works on ${acceptedWords(expected)}${pair}`;
}

/** "Too few arguments in function f (expected: any, index: 1)" and "Too many ... (expected: 2, actual: 3)". */
export function arityMessage(message: string, statement = ""): string | undefined {
  let m = /^Too few arguments in function (\S+) \(expected: [^,]+, index: (\d+)\)/.exec(message);
  if (m) {
    const given = Number(m[2]);
    const caller = /\b(integrate|seek|slope)\s*\(/.exec(statement)?.[1];
    const hint = caller ? `; ${caller}() calls it with one argument (x), so define it with one, like ${m[1]}(x) = ...` : "";
    return `${m[1]} needs more arguments than it was given: it got ${given} (argument ${given + 1} is missing)${hint}`;
  }
  m = /^Too many arguments in function (\S+) \(expected: (\d+), actual: (\d+)\)/.exec(message);
  if (m) return `${m[1]} takes ${m[2]} argument${m[2] === "1" ? "" : "s"}, but was given ${m[3]}`;
  return undefined;
}
