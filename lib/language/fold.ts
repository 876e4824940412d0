/**
 * Folds constant quantities once, when a statement is compiled. mathjs evaluates `5 bar` as
 * `5 * bar` on every run: the symbol `bar` builds a new Unit from its name, then a typed multiply
 * makes the quantity (20-80 us for `8.314 J/(mol K)`). Statements are compiled once and cached by
 * source text, so computing such sub-expressions at compile time makes every later run cheaper.
 *
 * What folds: a sub-expression made only of number literals, unit names and the operators
 * * / ^ + - (unary too) and `to`, with at least one unit name in it: `5 bar`, `8.314 J/(mol K)`,
 * `47 degC`, `(20 degC to K)`, a lone `kPa` after `to`. The offset rules run unchanged: folding calls
 * the same instance functions, and a sub-expression that throws (`5 degC/minute`, `2 * 47 degC`) is
 * simply left unfolded, so it throws at run time with its usual message and position.
 *
 * Staying exact where mathjs's meaning of a name can change:
 * - a unit name that is a function parameter (`f(K) = 5 K`) or a name of the instance is not a
 *   unit there: such a sub-expression is compiled as usual;
 * - a user variable can shadow a unit name later (`K = 3`): each run first checks the scope for the
 *   sub-expression's unit names (a Map lookup each) and evaluates normally if any is defined (in a
 *   session, literals.ts has already pinned the units of number-unit literals such as `5 K`, so
 *   those stay units; a bare `K` is the variable);
 * - a folded quantity is handed out as a clone (some mathjs functions change their argument in
 *   place; cbrt of a negative quantity does).
 */
import type { MathNode } from "mathjs";

/** Operators (mathjs OperatorNode fn names) a constant sub-expression may use. */
const FOLDABLE_OPERATORS = new Set(["multiply", "divide", "pow", "unaryMinus", "unaryPlus", "add", "subtract", "to"]);

type Scope = { has(name: string): boolean };
type Evaluator = (scope: Scope, args: Record<string, unknown>, context: unknown) => unknown;
type CompileFn = (math: Record<string, unknown>, argNames: Record<string, boolean>) => Evaluator;
type Compilable = MathNode & { _compile: CompileFn };

interface UnitClassLike {
  isValuelessUnit(name: string): boolean;
}

interface Info {
  constant: boolean;
  /** Unit names used (only meaningful when constant). */
  units: string[];
}

const isUnitValue = (x: unknown): x is { clone(): unknown } =>
  typeof x === "object" && x !== null && (x as { isUnit?: boolean }).isUnit === true;

/**
 * Marks every constant quantity sub-expression of `root` so that compiling it yields a constant
 * (see module note). Returns how many sub-expressions were marked (for tests). Mutates only the
 * nodes' `_compile` (an own property shadowing the class method); the tree's shape is unchanged.
 */
export function foldConstantQuantities(root: MathNode, Unit: UnitClassLike): number {
  let marked = 0;
  const visit = (node: MathNode): Info => {
    const children: Info[] = [];
    node.forEach((child: MathNode) => children.push(visit(child)));
    const info = classify(node, children, Unit);
    if (info.constant && info.units.length > 0) {
      markFoldable(node as Compilable, info.units, Unit);
      marked++;
    }
    return info;
  };
  visit(root);
  return marked;
}

function classify(node: MathNode, children: Info[], Unit: UnitClassLike): Info {
  const n = node as MathNode & { value?: unknown; name?: string; fn?: unknown };
  switch (node.type) {
    case "ConstantNode":
      return { constant: typeof n.value === "number", units: [] };
    case "SymbolNode":
      return Unit.isValuelessUnit(n.name!) ? { constant: true, units: [n.name!] } : { constant: false, units: [] };
    case "ParenthesisNode":
      return children[0] ?? { constant: false, units: [] };
    case "OperatorNode":
      if (typeof n.fn === "string" && FOLDABLE_OPERATORS.has(n.fn) && children.every((c) => c.constant)) {
        return { constant: true, units: [...new Set(children.flatMap((c) => c.units))] };
      }
      return { constant: false, units: [] };
    default:
      return { constant: false, units: [] };
  }
}

function markFoldable(node: Compilable, units: readonly string[], Unit: UnitClassLike): void {
  const original = node._compile.bind(node);
  node._compile = (math, argNames) => {
    // A parameter or an instance name is not a unit here (mathjs resolves those first).
    if (units.some((u) => argNames[u] === true || u in math || !Unit.isValuelessUnit(u))) return original(math, argNames);
    const evaluate = original(math, argNames);
    let value: unknown;
    try {
      value = evaluate(new Map(), {}, null);
    } catch {
      return evaluate; // keep the run-time error, message and position as they are
    }
    const constant: Evaluator = isUnitValue(value) ? () => value.clone() : () => value;
    return (scope, args, context) => {
      for (const u of units) if (scope.has(u)) return evaluate(scope, args, context);
      return constant(scope, args, context);
    };
  };
}
