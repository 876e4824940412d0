/**
 * Public entry of the cell language. PLACEHOLDER implementation: plain mathjs evaluation behind the
 * final Session contract, so the kernel can be built against it. Replaced by the real language.
 */
import { MIME, type MimeBundle } from "../display/index.js";
import { loadMathjs } from "./mathjs.js";
import type { CellSink, RunResult, Session, SessionOptions } from "./session.js";

export type * from "./session.js";

export function createSession(options: SessionOptions): Session {
  const math = loadMathjs().create(loadMathjs().all, {});
  const scope = new Map<string, unknown>();
  const bundle = (value: unknown): MimeBundle => ({ [MIME.text]: math.format(value, { precision: 6 }) });
  const run = (code: string, _sink: CellSink): RunResult => {
    try {
      if (options.shouldStop()) throw new Error("interrupted");
      const value = math.evaluate(code, scope) as unknown;
      const last = Array.isArray(value) ? value[value.length - 1] : (value as { entries?: unknown[] })?.entries?.at(-1) ?? value;
      return last === undefined ? { ok: true } : { ok: true, result: bundle(last) };
    } catch (e) {
      const err = e as Error;
      return { ok: false, error: { ename: err.name, evalue: err.message, traceback: [`${err.name}: ${err.message}`] } };
    }
  };
  return {
    run,
    evaluateExpression: (expression) => run(expression, { stdout() {}, display() {}, clear() {} }),
    complete: (_code, cursorPos) => ({ matches: [], cursorStart: cursorPos, cursorEnd: cursorPos }),
    inspect: () => ({ found: false }),
    isComplete: () => ({ status: "complete" }),
  };
}
