import { describe, expect, it } from "vitest";
import { MIME } from "../../../lib/display/index.js";
import { executeNotebook, type NotebookKernel } from "../../../kernel/runner/execute.js";
import { codeCell, type Notebook } from "../../../kernel/runner/notebook.js";
import type { IopubEvent } from "../../../kernel/runner/outputs.js";

/** A scripted kernel: each code string maps to the IOPub events and reply it produces. */
function scripted(script: Record<string, { events: IopubEvent[]; status?: "ok" | "error"; hang?: boolean }>): NotebookKernel & { interrupted: number; ran: string[] } {
  let count = 0;
  const k = {
    interrupted: 0,
    ran: [] as string[],
    info: async () => ({ language_info: { name: "caloric" }, implementation_version: "9.9.9" }),
    execute: async (code: string, on: (ev: IopubEvent) => void) => {
      k.ran.push(code);
      const s = script[code] ?? { events: [] };
      if (s.hang) await new Promise(() => {});
      s.events.forEach(on);
      count++;
      return s.status === "error" ? { status: "error" as const, execution_count: count, ename: "LanguageError", evalue: "boom" } : { status: "ok" as const, execution_count: count };
    },
    interrupt: async () => { k.interrupted++; },
    close: async () => {},
  };
  return k;
}

const nb = (cells: Notebook["cells"]): Notebook => ({ nbformat: 4, nbformat_minor: 5, metadata: { title: "t" }, cells });

describe("executeNotebook", () => {
  it("executeNotebook fills outputs, counts, checks and metadata", async () => {
    const k = scripted({
      a: { events: [{ msg_type: "stream", content: { name: "stdout", text: "hi\n" } }] },
      b: { events: [{ msg_type: "display_data", content: { data: { [MIME.check]: { label: "ok", pass: true }, [MIME.text]: "PASS ok" }, metadata: {} } }] },
    });
    const r = await executeNotebook(nb([codeCell("a"), { cell_type: "markdown", source: "m", metadata: {} }, codeCell("b")]), k, { toolVersion: "0.1.0", parameters: { P: "1 bar" } });
    expect(r.cellsRun).toBe(2);
    expect(r.errors).toEqual([]);
    expect(r.checks).toEqual([{ label: "ok", pass: true, detail: "PASS ok", cell: 2 }]); // the second code cell (a markdown cell sits between)
    expect(r.notebook.cells[0]).toMatchObject({ execution_count: 1, outputs: [{ output_type: "stream", text: "hi\n" }] });
    expect(r.notebook.metadata).toMatchObject({ title: "t", kernelspec: { name: "caloric" }, language_info: { name: "caloric" }, caloric: { version: "0.1.0", parameters: { P: "1 bar" }, checks: { total: 1, failed: 0 } } });
  });
  it("executeNotebook stops at the first failing cell and reports it", async () => {
    const k = scripted({ bad: { events: [{ msg_type: "error", content: { ename: "LanguageError", evalue: "boom", traceback: [] } }], status: "error" } });
    const r = await executeNotebook(nb([codeCell("ok"), codeCell("bad"), codeCell("never")]), k, { toolVersion: "x" });
    expect(r.errors).toEqual([{ cell: 2, message: "LanguageError: boom" }]);
    expect(k.ran).toEqual(["ok", "bad"]);
  });
  it("executeNotebook interrupts a cell that exceeds the timeout", async () => {
    const k = scripted({ slow: { events: [], hang: true } });
    const r = await executeNotebook(nb([codeCell("slow")]), k, { toolVersion: "x", timeoutSeconds: 0.05 });
    expect(k.interrupted).toBe(1);
    expect(r.errors[0]!.message).toMatch(/--timeout 0.05 s/);
  });
});
