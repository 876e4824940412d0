/**
 * Reading a field a record does not have is an error, not `undefined`.
 *
 * mathjs reads `s.Hr` (and `s["Hr"]`) with a plain property lookup: a misspelt field gave undefined,
 * which showed as no result, was assigned silently (`y = s.Hr`) and failed later inside mathjs
 * (`s.Hr * 2` -> "multiplyScalar(): argument 1 has the wrong type"). This pass wraps the compiled
 * evaluator of every field access so that an undefined result from a record (a plain object or a
 * RichValue) throws a FieldError naming the record, the field, the close matches and the fields
 * there are. Optional chaining (`s?.Hr`) keeps its meaning.
 *
 * Like literals.ts, it only sets the `_compile` of the nodes it wraps (own properties shadowing the
 * class methods), so the object is still evaluated once and read by mathjs's safe property access.
 */
import type { MathNode } from "mathjs";
import { isRichValue } from "./values/rich.js";
import { suggestNames } from "./suggest.js";

type Evaluator = (scope: unknown, args: unknown, context: unknown) => unknown;
type CompileFn = (math: Record<string, unknown>, argNames: Record<string, boolean>) => Evaluator;
type Node = MathNode & {
  object?: Node;
  index?: { isObjectProperty(): boolean; getObjectProperty(): string | null };
  optionalChaining?: boolean;
  _compile: CompileFn;
};

export class FieldError extends Error {
  override name = "FieldError";
  constructor(
    message: string,
    /** The missing field as written, for locating it in the source. */
    readonly field: string,
  ) {
    super(message);
  }
}

/** The field names a value offers, or undefined when it is not a record. */
export function fieldNamesOf(value: unknown): string[] | undefined {
  if (isRichValue(value)) return value.fields?.() ?? [];
  if (typeof value === "object" && value !== null && Object.getPrototypeOf(value) === Object.prototype) return Object.keys(value);
  return undefined;
}

/** The error for reading `field` from `value`, written `objectText` in the source. */
export function missingField(objectText: string, field: string, fields: readonly string[]): FieldError {
  const hints = suggestNames(field, fields);
  // A case slip (hr for HR) is the common mistake: offer it even past the edit-distance limit.
  const sameCase = fields.filter((f) => f.toLowerCase() === field.toLowerCase() && !hints.includes(f));
  const close = [...sameCase, ...hints];
  const mean = close.length ? `; did you mean ${close.join(" or ")}?` : "";
  const list = fields.length ? ` fields: ${fields.join(", ")}` : " it has no fields";
  return new FieldError(`${objectText} has no field ${field}${mean}${mean ? "" : ";"}${list}`, field);
}

/** Wraps every field access (`x.name`, `x["name"]`) below root; returns how many (for tests). */
export function checkFieldAccess(root: MathNode): number {
  let count = 0;
  root.traverse((n) => {
    const node = n as Node;
    if (node.type !== "AccessorNode" || node.optionalChaining || !node.index?.isObjectProperty()) return;
    const field = node.index.getObjectProperty()!;
    const object = node.object!;
    const objectText = object.toString();
    const original = node._compile.bind(node);
    node._compile = (math, argNames) => {
      // The object's evaluator records the value it produced; the accessor then reads from it.
      let last: unknown;
      const objectCompile = object._compile;
      object._compile = (m, a) => {
        const evaluate = objectCompile.call(object, m, a);
        return (scope, args, context) => (last = evaluate(scope, args, context));
      };
      let evaluate: Evaluator;
      try {
        evaluate = original(math, argNames);
      } finally {
        object._compile = objectCompile;
      }
      return (scope, args, context) => {
        const value = evaluate(scope, args, context);
        if (value !== undefined) return value;
        const fields = fieldNamesOf(last);
        if (fields !== undefined && !fields.includes(field)) throw missingField(objectText, field, fields);
        return value;
      };
    };
    count++;
  });
  return count;
}
