/**
 * Interrupt inside user functions. The session polls shouldStop between statements and built-ins
 * poll it in their loops, but a user function runs inside one statement: `map(1:1e6, f)` or a
 * recursive `f(n) = n <= 0 ? 0 : 1 + f(n - 1)` never returns to the statement loop. Every
 * function definition (`f(x) = ...`, also inline as an argument) is compiled so that each call
 * polls shouldStop first (one Atomics load in the worker: cheap next to a mathjs call).
 */
import type { MathNode } from "mathjs";

type Evaluator = (scope: unknown, args: Record<string, unknown>, context: unknown) => unknown;
type CompileFn = (math: Record<string, unknown>, argNames: Record<string, boolean>) => Evaluator;

/**
 * Makes every function body defined in `root` poll `shouldStop` on entry and throw `stop()` when
 * it is true. Returns the number of function bodies wrapped (for tests). Mutates only the body
 * nodes' `_compile` (an own property shadowing the class method).
 */
export function pollInFunctionBodies(root: MathNode, shouldStop: () => boolean, stop: () => Error): number {
  let wrapped = 0;
  root.traverse((node: MathNode) => {
    if (node.type !== "FunctionAssignmentNode") return;
    const body = (node as MathNode & { expr: MathNode & { _compile: CompileFn } }).expr;
    const original = body._compile.bind(body);
    body._compile = (math, argNames) => {
      const evaluate = original(math, argNames);
      return (scope, args, context) => {
        if (shouldStop()) throw stop();
        return evaluate(scope, args, context);
      };
    };
    wrapped++;
  });
  return wrapped;
}
