/**
 * Number-unit literals keep their units whatever the scope holds.
 *
 * mathjs resolves every name through the scope first, so once a cell assigns a name that is also a
 * unit (`m = pr("methane")`, `L = 2`, `g = 9.81 m/s^2`, `s = state(...)`) every later `1 m`, `5 L`,
 * `3 m/s` silently multiplied by that variable. The rule here: a unit written right after a number,
 * and the units joined to it by juxtaposition, `/` or `^`, form one quantity:
 *
 *   `5 m`, `1 m^2`, `3 m/s`, `8.314 J/(mol K)`, `2 kg m/s^2`, `-5 degC`, `5 min` (mathjs alone read
 *   `min` as its function), and the unit after `to` / `in` (`x to m`)
 *
 * always mean units. A name alone (`m`, `m * 2`, `x / m`, `1 / T`) is the variable as before, and an
 * explicit `*` ends a literal (`5 m * T` multiplies the quantity by the variable T). Where a literal's
 * unit name is also a variable or a function parameter, `onShadowed` is called when the literal is
 * evaluated (the session turns it into a one-time warning that says how to reach the variable).
 *
 * Mutates only the `_compile` of the unit names it pins (an own property shadowing the class method),
 * like fold.ts, which runs after this pass.
 */
import type { MathNode } from "mathjs";

interface UnitClassLike {
  isValuelessUnit(name: string): boolean;
  new (value: null, name: string): unknown;
}

type Node = MathNode & {
  fn?: string;
  implicit?: boolean;
  args?: MathNode[];
  content?: MathNode;
  name?: string;
  value?: unknown;
  _compile: (math: Record<string, unknown>, argNames: Record<string, boolean>) => Evaluator;
};
type Evaluator = (scope: { has(name: string): boolean }, args: unknown, context: unknown) => unknown;

/** Called with the unit name and the literal's text ("5 m") when a pinned name is also a variable. */
export type ShadowHandler = (name: string, literal: string) => void;

const op = (n: Node, fn: string): boolean => n.type === "OperatorNode" && n.fn === fn;

/** A number written out: 5, -5, 1/2, (2.5), 1e6. */
function isNumeric(n: Node): boolean {
  if (n.type === "ConstantNode") return typeof n.value === "number";
  if (n.type === "ParenthesisNode") return isNumeric(n.content as Node);
  if (n.type === "OperatorNode" && ["unaryMinus", "unaryPlus", "add", "subtract", "multiply", "divide", "pow"].includes(n.fn!)) {
    return (n.args as Node[]).every(isNumeric);
  }
  return false;
}

/** Unit names joined by juxtaposition, *, / and numeric powers: m, m^2, (mol K), J/(mol*K). */
function isUnitExpr(n: Node, Unit: UnitClassLike): boolean {
  if (n.type === "SymbolNode") return Unit.isValuelessUnit(n.name!);
  if (n.type === "ParenthesisNode") return isUnitExpr(n.content as Node, Unit);
  const a = n.args as Node[] | undefined;
  if (op(n, "pow")) return isUnitExpr(a![0]!, Unit) && isNumeric(a![1]!);
  if (op(n, "multiply") || op(n, "divide")) return isUnitExpr(a![0]!, Unit) && isUnitExpr(a![1]!, Unit);
  return false;
}

/** `number unit`, and a literal continued by juxtaposition or `/` with more units. */
function isLiteral(n: Node, Unit: UnitClassLike): boolean {
  if (n.type !== "OperatorNode" || n.args?.length !== 2) return false;
  const [left, right] = n.args as Node[];
  if (!isUnitExpr(right!, Unit)) return false;
  if (op(n, "multiply") && n.implicit === true) return isNumeric(left!) || isLiteral(left!, Unit);
  if (op(n, "divide")) return isLiteral(left!, Unit);
  return false;
}

function pinSymbols(n: Node, Unit: UnitClassLike, literal: string | undefined, onShadowed: ShadowHandler, pinned: Set<Node>): void {
  if (n.type === "SymbolNode") {
    if (pinned.has(n) || !Unit.isValuelessUnit(n.name!)) return;
    pinned.add(n);
    const name = n.name!;
    n._compile = () => (scope, args) => {
      if (literal !== undefined && (scope.has(name) || isParam(args, name))) onShadowed(name, literal);
      return new Unit(null, name);
    };
    return;
  }
  n.forEach((child: MathNode) => pinSymbols(child as Node, Unit, literal, onShadowed, pinned));
}

/**
 * A literal's value carries the units as written: mathjs's skipAutomaticSimplification flag (what
 * `to` sets) tells display (lib/units simplifyForDisplay) to keep them; `10.73 psi ft^3/(lbmol degR)`
 * is not turned into J/(mol K). Products and quotients with other quantities clear the flag again.
 */
function markAsWritten(n: Node): void {
  const original = n._compile.bind(n);
  n._compile = (math, argNames) => {
    const evaluate = original(math, argNames);
    return (scope, args, context) => {
      const v = evaluate(scope, args, context) as { isUnit?: boolean; skipAutomaticSimplification?: boolean };
      if (typeof v === "object" && v !== null && v.isUnit === true) v.skipAutomaticSimplification = true;
      return v;
    };
  };
}

function isParam(args: unknown, name: string): boolean {
  return typeof args === "object" && args !== null && Object.prototype.hasOwnProperty.call(args, name);
}

/**
 * Pins the unit names of every number-unit literal in `root` (and of every `to`/`in` target made of
 * unit names) to their units; see the module note. Returns how many names were pinned (for tests).
 */
export function pinUnitLiterals(root: MathNode, Unit: UnitClassLike, onShadowed: ShadowHandler): number {
  const pinned = new Set<Node>();
  const visit = (node: Node): void => {
    if (isLiteral(node, Unit)) {
      const text = node.toString().replace(/ \^ /g, "^");
      // Only the unit parts: the number (and anything else) keeps its ordinary meaning.
      const unitParts = (n: Node): void => {
        if (!isLiteral(n, Unit)) return; // the leading number
        const [left, right] = n.args as Node[];
        unitParts(left!);
        pinSymbols(right!, Unit, text, onShadowed, pinned);
      };
      unitParts(node);
      markAsWritten(node);
    } else if (op(node, "to") && isUnitExpr((node.args as Node[])[1]!, Unit)) {
      // The target of a conversion is a unit by its position: no warning needed.
      pinSymbols((node.args as Node[])[1]!, Unit, undefined, onShadowed, pinned);
    }
    node.forEach((child: MathNode) => visit(child as Node));
  };
  visit(root as Node);
  return pinned.size;
}
