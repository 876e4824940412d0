/**
 * A Session: one restricted mathjs instance, one scope that outlives cells, errors and interrupts,
 * the built-in registry bound to the current cell's sink, and the editor services (complete,
 * inspect, isComplete) derived from the same registry.
 */
import type { MathJsInstance, MathNode } from "mathjs";
import { MIME, type MimeBundle } from "../display/index.js";
import { BUILTINS } from "./builtins/index.js";
import { bindBuiltin } from "./builtins/bind.js";
import type { BuiltinContext, BuiltinDef } from "./builtins/define.js";
import { createRestrictedMath, DISABLED_NAMES } from "./mathInstance.js";
import { installUnits } from "../units/index.js";
import { createUnitsBridge, type UnitsBridge } from "./unitsBridge.js";
import { createColumnFactory } from "./values/column.js";
import { isRichValue } from "./values/rich.js";
import { createFormatter } from "./format.js";
import { scanCell, positionOf } from "./statements.js";
import { foldConstantQuantities } from "./fold.js";
import { pinUnitLiterals } from "./literals.js";
import { checkFieldAccess } from "./fields.js";
import { pollInFunctionBodies } from "./interruptible.js";
import { sizeGuards } from "./guards.js";
import { LanguageError, translateError } from "./errors.js";
import { completeAt } from "./complete.js";
import { inspectAt } from "./inspect.js";
import { isCompleteCell } from "./isComplete.js";
import { answerHelp, helpTarget } from "./helpQuery.js";
import { rejectAssignments } from "./expression.js";
import { normalizeSymbols, placeOnOriginal } from "./symbols.js";
import { constantValues } from "./constants.js";
import type { CellSink, RunResult, Session, SessionOptions } from "./session.js";

/** Deeper bracket nesting is refused before parsing (mathjs parses recursively). */
export const MAX_NESTING = 200;

export class Interrupted extends Error {
  override name = "Interrupted";
  constructor() {
    super("interrupted by the user; variables defined so far are kept");
  }
}

const SILENT_SINK: CellSink = { stdout() {}, display() {}, clear() {} };

export interface SessionInternals {
  math: MathJsInstance;
  scope: Map<string, unknown>;
  registry: ReadonlyMap<string, BuiltinDef>;
  /** Every name an expression can call or use: scope, built-ins, mathjs functions and constants, units. */
  knownNames(): string[];
  unitNames(): string[];
  formatText(value: unknown): string;
  units: UnitsBridge;
  /** The private parser (expressions cannot reach it). */
  parse(code: string): MathNode;
  /** The predefined constants' values as the session started (see constants.ts). */
  predefined: ReadonlyMap<string, unknown>;
}

/**
 * The session plus its internals (scope, registry, instance) for tests and benchmarks. `extra`
 * built-ins join the registry for this session only (tests, benchmarks); the product uses BUILTINS.
 */
export function createSessionWithInternals(
  options: SessionOptions,
  extra: readonly BuiltinDef[] = [],
): { session: Session; internals: SessionInternals } {
  const all = [...BUILTINS, ...extra];
  const registry = new Map(all.map((d) => [d.name, d]));
  if (registry.size !== all.length) throw new Error("two built-ins share a name");
  let sink: CellSink = SILENT_SINK;
  let ctx: BuiltinContext | undefined;
  const getCtx = () => ctx!;
  const { math, parse } = createRestrictedMath({
    installUnits,
    functions: (m) => ({ ...sizeGuards(m), ...Object.fromEntries(all.map((def) => [def.name, bindBuiltin(def, m, getCtx)])) }),
  });

  const units = createUnitsBridge(math);
  const column = createColumnFactory(math);
  const formatter = createFormatter(math, units);
  // Predefined constants (R) are ordinary variables; `predefined` remembers the exact objects so
  // inspect can tell whether a name still holds its predefined value.
  const predefined = constantValues(math);
  const scope = new Map<string, unknown>(predefined);
  // Display ids shown in the current cell: a value carrying one was already shown (progressive output).
  const shownIds = new Set<string>();
  // Shows the previous statement's value before a display made by a later statement (show, progress
  // displays), so outputs appear in the order the statements ran.
  let flushPending = () => {};

  ctx = {
    shouldStop: options.shouldStop,
    interrupted: () => new Interrupted(),
    stdout: (t) => sink.stdout(t),
    display: (b, o) => {
      if (o?.displayId !== undefined && sink !== SILENT_SINK) shownIds.add(o.displayId);
      if (!o?.update) flushPending();
      sink.display(b, o);
    },
    clear: (wait) => sink.clear(wait),
    bundleOf: (v) => formatter.bundle(v),
    textOf: (v) => formatter.text(v),
    warn: (t) => sink.stdout(`warning: ${t}\n`),
    units,
    column: (si, dimOrUnit, displayUnit) => {
      return column(si, units.siUnitOf(dimOrUnit), displayUnit ?? units.displayUnitFor(si, dimOrUnit));
    },
    progress: options.progress,
    call: (fn, ...args) => {
      if (typeof fn !== "function") throw new Error(`expected a function, got ${formatter.text(fn)}`);
      return (fn as (...a: unknown[]) => unknown)(...args);
    },
  };

  const unitNames = (() => {
    let cache: string[] | undefined;
    return () => (cache ??= Object.keys((math as unknown as { Unit: { UNITS: object } }).Unit.UNITS));
  })();
  const disabled = new Set<string>(DISABLED_NAMES);
  const mathNames = (() => {
    let cache: string[] | undefined;
    return () => (cache ??= Object.keys(math).filter((k) => /^[a-z][A-Za-z0-9]*$/.test(k) && !disabled.has(k) && !registry.has(k)));
  })();
  const knownNames = () => [...scope.keys(), ...registry.keys(), ...mathNames(), ...unitNames()];

  interface Compiled { evaluate(scope: Map<string, unknown>): unknown; assigned?: string; defines?: string }
  // Parsed statements by source text: re-running a cell skips the parser.
  const compiled = new Map<string, Compiled>();
  const UnitClass = (math as unknown as { Unit: Parameters<typeof pinUnitLiterals>[1] }).Unit;
  // A literal's unit that is also a variable's name (literals.ts): said once per name and session.
  const shadowWarned = new Set<string>();
  const onShadowed = (name: string, literal: string) => {
    if (shadowWarned.has(name) || sink === SILENT_SINK) return;
    shadowWarned.add(name);
    ctx!.warn(
      `in "${literal}", ${name} is read as the unit ${name}, not as your variable ${name}: a unit name right after a number is always the unit; to multiply by the variable write the * (as in 2 * ${name})`,
    );
  };
  // A variable or function named like a built-in hides it for the rest of the session: said once per name.
  const builtinWarned = new Set<string>();
  const onBuiltinShadowed = (name: string) => {
    if (builtinWarned.has(name) || sink === SILENT_SINK) return;
    builtinWarned.add(name);
    ctx!.warn(`${name} now names your own value, which hides the built-in ${name}() in this session (until the kernel restarts); pick another name to keep using ${name}()`);
  };
  const compile = (text: string): Compiled => {
    const node = parse(text) as MathNode & { object?: MathNode & { name?: string } };
    pinUnitLiterals(node, UnitClass, onShadowed);
    checkFieldAccess(node);
    foldConstantQuantities(node, UnitClass);
    pollInFunctionBodies(node, options.shouldStop, () => new Interrupted());
    const code = node.compile() as Compiled;
    const assigned = node.type === "AssignmentNode" && node.object?.type === "SymbolNode" ? node.object.name : undefined;
    const defines = assigned ?? (node.type === "FunctionAssignmentNode" ? (node as MathNode & { name: string }).name : undefined);
    return { evaluate: (s) => code.evaluate(s), assigned, defines };
  };

  const inspect = (code: string, cursorPos: number, detail: 0 | 1) => inspectAt(internals, code, cursorPos, detail);

  /** Runs a cell against `target` (the session's scope, or a copy for evaluateExpression). */
  const run = (source: string, cellSink: CellSink, target: Map<string, unknown> = scope): RunResult => {
    // °C, ×, ÷ ... rewritten (symbols.ts); errors are placed back on the source as written.
    const norm = normalizeSymbols(source);
    const code = norm.code;
    const help = helpTarget(code);
    if (help !== undefined) {
      const answer = answerHelp(help, inspect, knownNames);
      if (answer.found) return { ok: true, result: answer.bundle, help: "page" };
      return { ok: true, result: { [MIME.text]: answer.note }, help: "note" };
    }
    sink = cellSink;
    shownIds.clear();
    let pending: MimeBundle | undefined;
    const flush = () => {
      if (pending) sink.display(pending);
      pending = undefined;
    };
    flushPending = flush;
    const scan = scanCell(code);
    try {
      if (scan.maxDepth > MAX_NESTING) {
        const at = scan.open[0]?.at ?? 0;
        const pos = positionOf(code, at);
        throw new LanguageError(`brackets nested more than ${MAX_NESTING} deep; split the expression into named parts`, pos.line, pos.column, pos.lineText, 1, "SyntaxError");
      }
      for (const st of scan.statements) {
        if (options.shouldStop()) {
          const pos = positionOf(code, st.start + (st.text.length - st.text.trimStart().length));
          throw new LanguageError(new Interrupted().message, pos.line, pos.column, pos.lineText, 1, "Interrupted");
        }
        let value: unknown;
        let entry = compiled.get(st.text);
        try {
          if (!entry) {
            entry = compile(st.text);
            if (compiled.size > 2000) compiled.clear();
            compiled.set(st.text, entry);
          }
          value = entry.evaluate(target);
          if (entry.defines !== undefined && registry.has(entry.defines)) onBuiltinShadowed(entry.defines);
        } catch (err) {
          throw translateError(err, code, st.start, st.text, knownNames);
        }
        // A chart its built-in already showed in this cell (progressive output) is not shown twice;
        // the first statement that yields it uses the mark up, so a later `x` shows it again.
        const alreadyShown = isRichValue(value) && value.displayId !== undefined && shownIds.delete(value.displayId);
        if (st.hidden || value === undefined || alreadyShown) continue;
        flush();
        pending = formatter.bundle(value);
        // `x = 5 bar` shows as "x = 5 bar": the name tells which line a value came from.
        if (entry.assigned && !pending[MIME.text].includes("\n")) pending[MIME.text] = `${entry.assigned} = ${pending[MIME.text]}`;
      }
      const result = pending;
      pending = undefined;
      return result ? { ok: true, result } : { ok: true };
    } catch (err) {
      flush();
      const le = err instanceof LanguageError ? err : translateError(err, code, 0, code, knownNames);
      return { ok: false, error: placeOnOriginal(le, norm, source).toCellError() };
    } finally {
      flushPending = () => {};
      sink = SILENT_SINK;
    }
  };

  const internals: SessionInternals = { math, scope, registry, knownNames, unitNames, formatText: formatter.text, units, parse, predefined };
  const session: Session = {
    run,
    evaluateExpression: (expression) => {
      try {
        rejectAssignments(normalizeSymbols(expression).code, parse);
      } catch (err) {
        if (err instanceof LanguageError) return { ok: false, error: placeOnOriginal(err, normalizeSymbols(expression), expression).toCellError() };
        throw err;
      }
      return run(expression, SILENT_SINK, new Map(scope));
    },
    complete: (code, cursorPos) => completeAt(internals, code, cursorPos),
    inspect,
    isComplete: (code) => isCompleteCell(normalizeSymbols(code).code, parse),
  };
  return { session, internals };
}
