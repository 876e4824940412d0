/**
 * Public entry of the cell language: createSession (the contract in session.ts), the built-in
 * registry and its helpers for other folders' tests and tools.
 */
import { createSessionWithInternals } from "./createSession.js";
import type { Session, SessionOptions } from "./session.js";

export type * from "./session.js";
export { BUILTINS, defineBuiltin, signatureOf, ArgumentError } from "./builtins/index.js";
export type { BuiltinDef, BuiltinContext, BuiltinArgs, ParamSpec, ParamType } from "./builtins/index.js";
export type { RichValue } from "./values/rich.js";
export { isRichValue } from "./values/rich.js";
export { isQuantityColumn, type QuantityColumn } from "./values/column.js";
export { LanguageError } from "./errors.js";

export function createSession(options: SessionOptions): Session {
  return createSessionWithInternals(options).session;
}
