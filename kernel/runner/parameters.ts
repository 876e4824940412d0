/**
 * `--set name=value` overrides. They become one code cell placed right after the cell tagged
 * "parameters" (the notebook's defaults), or before the first code cell when no cell carries the tag,
 * so a design case re-runs for other conditions without editing it.
 */
import { codeCell, type Cell, type Notebook } from "./notebook.js";

export interface Override {
  name: string;
  /** Cell-language expression, e.g. "60 bar". */
  expression: string;
}

const IDENT = /^[A-Za-z_][A-Za-z0-9_]*$/;

/** Parse one `name=value` argument; errors say what is wrong with which argument. */
export function parseOverride(arg: string): Override {
  const eq = arg.indexOf("=");
  if (eq <= 0) throw new Error(`--set ${arg}: expected name=value, e.g. --set P2="60 bar"`);
  const name = arg.slice(0, eq).trim();
  const expression = arg.slice(eq + 1).trim();
  if (!IDENT.test(name)) throw new Error(`--set ${arg}: "${name}" is not a variable name (letters, digits, _; not starting with a digit)`);
  if (expression === "") throw new Error(`--set ${arg}: no value after "="`);
  if (/[\n;#]/.test(expression)) throw new Error(`--set ${arg}: the value must be a single expression (no newline, ";" or "#")`);
  return { name, expression };
}

export const PARAMETERS_TAG = "parameters";
export const INJECTED_TAG = "injected-parameters";

/** Names a code cell assigns at the start of a line (`P2 = ...`, not `P2 == ...`). */
export function assignedNames(source: string): Set<string> {
  const names = new Set<string>();
  for (const line of source.split("\n")) {
    for (const statement of line.split(";")) {
      const m = /^\s*([A-Za-z_][A-Za-z0-9_]*)\s*=(?!=)/.exec(statement);
      if (m) names.add(m[1]!);
    }
  }
  return names;
}

/**
 * A mistyped override would silently leave the notebook's own value in place, so every name must be
 * assigned by the cell tagged "parameters" (or, without such a cell, by some code cell).
 */
export function checkOverrides(nb: Notebook, overrides: Override[], where: string): void {
  const code = nb.cells.filter((c) => c.cell_type === "code");
  const tagged = code.filter((c) => (c.metadata.tags as string[] | undefined)?.includes(PARAMETERS_TAG));
  const pool = tagged.length ? tagged : code;
  const known = new Set(pool.flatMap((c) => [...assignedNames(Array.isArray(c.source) ? c.source.join("") : c.source)]));
  const unknown = overrides.filter((o) => !known.has(o.name));
  if (unknown.length) {
    const scope = tagged.length ? "its parameters cell" : "its code cells";
    const list = [...known].sort().join(", ") || "nothing";
    throw new Error(`${where}: --set ${unknown.map((o) => o.name).join(", ")}: not assigned by ${scope} (which assign${tagged.length ? "s" : ""} ${list}); a mistyped name would leave the notebook's own value in place`);
  }
}

export function injectOverrides(nb: Notebook, overrides: Override[]): Notebook {
  if (overrides.length === 0) return nb;
  const source = ["# Parameters set on the command line (caloric run --set)", ...overrides.map((o) => `${o.name} = ${o.expression}`)].join("\n");
  const cell = codeCell(source, [INJECTED_TAG]);
  const cells: Cell[] = [...nb.cells];
  const tagged = cells.findIndex((c) => c.cell_type === "code" && (c.metadata.tags as string[] | undefined)?.includes(PARAMETERS_TAG));
  const firstCode = cells.findIndex((c) => c.cell_type === "code");
  const at = tagged >= 0 ? tagged + 1 : firstCode >= 0 ? firstCode : cells.length;
  cells.splice(at, 0, cell);
  return { ...nb, cells };
}
