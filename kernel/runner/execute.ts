/**
 * Executes a notebook's code cells in order through any NotebookKernel (a kernel process over ZeroMQ,
 * or the in-process engine) and returns the executed notebook with its design checks and errors.
 * Execution stops at the first failing cell, as a reviewer re-running the case would: later cells
 * build on earlier ones, so their results would be noise.
 */
import { checksIn, type CheckRow } from "./checks.js";
import { sourceText, type CodeCell, type Notebook } from "./notebook.js";
import { DisplayRegistry, OutputCollector, type IopubEvent } from "./outputs.js";
import type { Progress } from "./progress.js";

export interface ExecuteReply {
  status: "ok" | "error" | "aborted";
  execution_count: number | null;
  ename?: string;
  evalue?: string;
}

/** What the runner needs of a kernel, whatever carries the messages. */
export interface NotebookKernel {
  /** From kernel_info_reply: language_info and the implementation version. */
  info(): Promise<{ language_info: Record<string, unknown>; implementation_version: string }>;
  /** Runs one cell; IOPub traffic of this request goes to onIopub; resolves when reply and idle arrived. */
  execute(code: string, onIopub: (ev: IopubEvent) => void): Promise<ExecuteReply>;
  interrupt(): Promise<void>;
  close(): Promise<void>;
}

export interface ExecutedNotebook {
  notebook: Notebook;
  checks: CheckRow[];
  /** `cell` counts code cells from 1, as the progress line and the execution counts [n] do. */
  errors: { cell: number; message: string }[];
  cellsRun: number;
  codeCells: number;
}

export class CellTimeout extends Error {
  override name = "CellTimeout";
}

export interface ExecuteOptions {
  progress?: Progress;
  /** Per-cell limit in seconds; the cell is interrupted and reported as failed. */
  timeoutSeconds?: number;
  toolVersion: string;
  parameters?: Record<string, string>;
}

async function withTimeout<T>(work: Promise<T>, seconds: number | undefined, onTimeout: () => Promise<void>): Promise<T> {
  if (!seconds) return work;
  let timer: NodeJS.Timeout | undefined;
  const limit = new Promise<never>((_, reject) => {
    timer = setTimeout(() => {
      void onTimeout().finally(() => reject(new CellTimeout(`the cell did not finish within --timeout ${seconds} s and was interrupted`)));
    }, seconds * 1000);
  });
  try {
    return await Promise.race([work, limit]);
  } finally {
    clearTimeout(timer);
  }
}

export async function executeNotebook(input: Notebook, kernel: NotebookKernel, opts: ExecuteOptions): Promise<ExecutedNotebook> {
  const info = await kernel.info();
  const cells = input.cells.map((c) => (c.cell_type === "code" ? ({ ...c, outputs: [], execution_count: null } as CodeCell) : c));
  const codeIndexes = cells.flatMap((c, i) => (c.cell_type === "code" ? [i] : []));
  const displays = new DisplayRegistry();
  const checks: CheckRow[] = [];
  const errors: { cell: number; message: string }[] = [];
  let cellsRun = 0;

  for (const [n, i] of codeIndexes.entries()) {
    const cell = cells[i] as CodeCell;
    const code = sourceText(cell.source);
    opts.progress?.cell(n + 1, codeIndexes.length, code);
    const collector = new OutputCollector(displays);
    cell.outputs = collector.outputs;
    try {
      const reply = await withTimeout(kernel.execute(code, (ev) => collector.handle(ev)), opts.timeoutSeconds, () => kernel.interrupt());
      cell.execution_count = reply.execution_count;
      cellsRun++;
      if (reply.status !== "ok") {
        errors.push({ cell: n + 1, message: reply.status === "aborted" ? "execution aborted" : `${reply.ename ?? "Error"}: ${reply.evalue ?? ""}` });
      }
    } catch (e) {
      errors.push({ cell: n + 1, message: (e as Error).message });
      cell.outputs.push({ output_type: "error", ename: (e as Error).name, evalue: (e as Error).message, traceback: [(e as Error).message] });
    }
    checks.push(...checksIn(cell.outputs, n + 1));
    if (errors.length) break;
  }

  const notebook: Notebook = {
    ...input,
    cells,
    metadata: {
      ...input.metadata,
      kernelspec: { name: "caloric", display_name: "Caloric (thermodynamics)", language: "caloric" },
      language_info: info.language_info,
      caloric: {
        version: opts.toolVersion,
        kernel_version: info.implementation_version,
        executed_at: new Date().toISOString(),
        parameters: opts.parameters ?? {},
        checks: { total: checks.length, failed: checks.filter((c) => !c.pass).length },
      },
    },
  };
  return { notebook, checks, errors, cellsRun, codeCells: codeIndexes.length };
}
