/**
 * nbformat 4 notebooks: the subset the runner reads and writes, plus light validation so a broken file
 * gets a clear message naming the file and the cell instead of a crash deep in the run.
 */
import { randomUUID } from "node:crypto";

export type MultilineString = string | string[];
export type MimeData = Record<string, unknown>;

export type Output =
  | { output_type: "stream"; name: "stdout" | "stderr"; text: MultilineString }
  | { output_type: "display_data"; data: MimeData; metadata: Record<string, unknown>; transient?: unknown }
  | { output_type: "execute_result"; data: MimeData; metadata: Record<string, unknown>; execution_count: number | null }
  | { output_type: "error"; ename: string; evalue: string; traceback: string[] };

export interface CodeCell {
  cell_type: "code";
  id?: string;
  source: MultilineString;
  metadata: Record<string, unknown> & { tags?: string[] };
  outputs: Output[];
  execution_count: number | null;
}
export interface TextCell {
  cell_type: "markdown" | "raw";
  id?: string;
  source: MultilineString;
  metadata: Record<string, unknown>;
  attachments?: unknown;
}
export type Cell = CodeCell | TextCell;

export interface Notebook {
  nbformat: 4;
  nbformat_minor: number;
  metadata: Record<string, unknown>;
  cells: Cell[];
}

export class NotebookError extends Error {
  override name = "NotebookError";
}

export const sourceText = (s: MultilineString): string => (Array.isArray(s) ? s.join("") : s);

/** Parse and check a notebook file's text; `where` names the file in errors. */
export function parseNotebook(text: string, where: string): Notebook {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    throw new NotebookError(`${where}: not valid JSON (${(e as Error).message})`);
  }
  const nb = raw as Partial<Notebook>;
  if (typeof nb !== "object" || nb === null || nb.nbformat !== 4) {
    throw new NotebookError(`${where}: not an nbformat 4 notebook (nbformat is ${JSON.stringify(nb?.nbformat)})`);
  }
  if (!Array.isArray(nb.cells)) throw new NotebookError(`${where}: "cells" must be a list`);
  nb.cells.forEach((cell, i) => {
    const kind = (cell as Cell | undefined)?.cell_type;
    if (kind !== "code" && kind !== "markdown" && kind !== "raw") {
      throw new NotebookError(`${where}: cell ${i + 1} has unknown cell_type ${JSON.stringify(kind)}`);
    }
    const src = (cell as Cell).source;
    if (typeof src !== "string" && !(Array.isArray(src) && src.every((s) => typeof s === "string"))) {
      throw new NotebookError(`${where}: cell ${i + 1} has no text source`);
    }
  });
  return {
    nbformat: 4,
    nbformat_minor: typeof nb.nbformat_minor === "number" ? nb.nbformat_minor : 4,
    metadata: (nb.metadata as Record<string, unknown>) ?? {},
    cells: nb.cells as Cell[],
  };
}

/** Cell ids are required from nbformat 4.5 on; give every cell one and write 4.5. */
export function withCellIds(nb: Notebook): Notebook {
  const seen = new Set<string>();
  const cells = nb.cells.map((cell) => {
    let id = cell.id && /^[a-zA-Z0-9-_]{1,64}$/.test(cell.id) && !seen.has(cell.id) ? cell.id : randomUUID().slice(0, 8);
    while (seen.has(id)) id = randomUUID().slice(0, 8);
    seen.add(id);
    return { ...cell, id };
  });
  return { ...nb, nbformat_minor: Math.max(nb.nbformat_minor, 5), cells };
}

export function codeCell(source: string, tags: string[] = []): CodeCell {
  return { cell_type: "code", source, metadata: tags.length ? { tags } : {}, outputs: [], execution_count: null };
}

/** Serialise as Jupyter does: one-space indent, trailing newline. */
export function serializeNotebook(nb: Notebook): string {
  return JSON.stringify(nb, null, 1) + "\n";
}
