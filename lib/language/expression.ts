/**
 * user_expressions (evaluateExpression) read the session; they must never change it. A client sends
 * them with every execute request, often without the user seeing them, so `x = 5` or `f(x) = 1`
 * there is refused with an error that names the statement, before anything runs. (The session also
 * evaluates them against a copy of the scope, so nothing else an expression does can stay behind.)
 */
import type { MathNode } from "mathjs";
import { LanguageError } from "./errors.js";
import { positionOf, scanCell } from "./statements.js";

/** Throws a LanguageError if any statement of `code` assigns a variable, a field or a function. */
export function rejectAssignments(code: string, parse: (text: string) => MathNode): void {
  for (const st of scanCell(code).statements) {
    let node: MathNode;
    try {
      node = parse(st.text);
    } catch {
      continue; // the evaluation reports the syntax error with its position
    }
    let found: MathNode | undefined;
    node.traverse((n) => {
      if (found === undefined && (n.type === "AssignmentNode" || n.type === "FunctionAssignmentNode")) found = n;
    });
    if (found === undefined) continue;
    const target = found.type === "FunctionAssignmentNode" ? `function ${(found as MathNode & { name: string }).name}` : (found as MathNode & { object: MathNode }).object.toString();
    const lead = st.text.length - st.text.trimStart().length;
    const pos = positionOf(code, st.start + lead);
    throw new LanguageError(
      `an expression evaluated for the front end (user_expressions) must not assign: "${found.toString()}" would change ${target}; send an expression that only reads, such as ${target.replace(/^function /, "")}`,
      pos.line, pos.column, pos.lineText, Math.max(1, Array.from(st.text.trim()).length), "AssignmentError",
    );
  }
}
