/**
 * kernel/runner: `caloric run`. Re-executes notebooks through a caloric kernel, writes the executed
 * notebooks and HTML reports, and sets the exit code from cell errors and design checks.
 */
import { existsSync, mkdirSync, readdirSync, readFileSync, statSync, writeFileSync } from "node:fs";
import { basename, extname, join, relative, resolve } from "node:path";
import { IMPLEMENTATION_VERSION } from "../protocol/index.js";
import { ArgsError, parseRunArgs, RUN_HELP, type RunArgs } from "./args.js";
import { executeNotebook, type NotebookKernel } from "./execute.js";
import { InProcessKernel, KernelSupply, ProcessKernel } from "./kernels.js";
import { parseNotebook, serializeNotebook, withCellIds, type Notebook } from "./notebook.js";
import { checkOverrides, injectOverrides } from "./parameters.js";
import { Progress } from "./progress.js";
import { escapeHtml, renderReport } from "./report.js";

export { executeNotebook, type NotebookKernel, type ExecutedNotebook } from "./execute.js";
export { parseNotebook, serializeNotebook } from "./notebook.js";

export interface NotebookOutcome {
  input: string;
  status: "passed" | "check-failed" | "error";
  message: string;
  notebookPath?: string;
  reportPath?: string;
  checks: { total: number; failed: number };
}

const startKernel = (args: RunArgs): Promise<NotebookKernel> => (args.inProcess ? InProcessKernel.start() : ProcessKernel.start());

/** Notebooks named directly, and the *.ipynb files of named directories (sorted, not recursive). */
export function expandInputs(inputs: string[]): string[] {
  return inputs.flatMap((p) => {
    if (!existsSync(p)) throw new ArgsError(`${p}: no such file or directory`);
    if (statSync(p).isDirectory()) {
      return readdirSync(p).filter((f) => f.endsWith(".ipynb") && !f.startsWith(".")).sort().map((f) => join(p, f));
    }
    return [p];
  });
}

/** The first markdown heading of the notebook, if any. */
const headingOf = (nb: Notebook): string | undefined => {
  for (const c of nb.cells) {
    if (c.cell_type !== "markdown") continue;
    const m = /^#\s+(.+)$/m.exec(Array.isArray(c.source) ? c.source.join("") : c.source);
    if (m) return m[1]!.trim();
  }
  return undefined;
};

export async function runNotebook(input: string, args: RunArgs, log: (s: string) => void, acquire: () => Promise<NotebookKernel> = () => startKernel(args)): Promise<NotebookOutcome> {
  const name = basename(input, extname(input));
  const base: NotebookOutcome = { input, status: "error", message: "", checks: { total: 0, failed: 0 } };
  let kernel: NotebookKernel | undefined;
  try {
    const source = parseNotebook(readFileSync(input, "utf8"), input);
    checkOverrides(source, args.overrides, input);
    const nb = injectOverrides(source, args.overrides);
    kernel = await acquire();
    const progress = new Progress({ write: log, isTTY: Boolean(process.stderr.isTTY) && args.jobs === 1 }, basename(input), args.quiet);
    const parameters = Object.fromEntries(args.overrides.map((o) => [o.name, o.expression]));
    const run = await executeNotebook(nb, kernel, { progress, timeoutSeconds: args.timeoutSeconds, toolVersion: IMPLEMENTATION_VERSION, parameters });
    mkdirSync(args.out, { recursive: true });
    const executed = withCellIds(run.notebook);
    const notebookPath = join(args.out, `${name}.ipynb`);
    writeFileSync(notebookPath, serializeNotebook(executed));
    let reportPath: string | undefined;
    if (args.html) {
      reportPath = join(args.out, `${name}.html`);
      const meta = executed.metadata.caloric as { executed_at: string };
      writeFileSync(reportPath, renderReport(executed, { title: headingOf(executed) ?? name, titleInNotebook: headingOf(executed) !== undefined, source: basename(input), toolVersion: IMPLEMENTATION_VERSION, executedAt: meta.executed_at, checks: run.checks, errors: run.errors }));
    }
    const failed = run.checks.filter((c) => !c.pass);
    const checks = { total: run.checks.length, failed: failed.length };
    const outcome: NotebookOutcome = { ...base, notebookPath, reportPath, checks, status: "passed", message: "" };
    if (run.errors.length) {
      const e = run.errors[0]!;
      outcome.status = "error";
      outcome.message = `cell [${e.cell}] failed: ${e.message}` + (run.cellsRun < run.codeCells ? ` (${run.codeCells - run.cellsRun} later cell(s) not run)` : "");
    } else if (failed.length) {
      outcome.status = "check-failed";
      outcome.message = `design check failed: ${failed[0]!.label} (${failed[0]!.detail}), cell [${failed[0]!.cell}]` + (failed.length > 1 ? `; ${failed.length - 1} more failed` : "");
    } else {
      outcome.message = `${run.codeCells} cells, ${checks.total} design check(s) passed`;
    }
    progress.done(outcome.status === "passed" ? outcome.message : `FAILED: ${outcome.message}`);
    return outcome;
  } catch (e) {
    return { ...base, message: (e as Error).message };
  } finally {
    await kernel?.close().catch(() => undefined);
  }
}

function writeIndex(out: string, outcomes: NotebookOutcome[]): string {
  const rows = outcomes
    .map((o) => {
      const link = o.reportPath ? `<a href="${escapeHtml(relative(out, o.reportPath))}">${escapeHtml(basename(o.input))}</a>` : escapeHtml(basename(o.input));
      return `<tr><td>${o.status === "passed" ? "PASS" : "FAIL"}</td><td>${link}</td><td>${o.checks.total - o.checks.failed} / ${o.checks.total}</td><td>${escapeHtml(o.message)}</td></tr>`;
    })
    .join("\n");
  const path = join(out, "index.html");
  writeFileSync(path, `<!DOCTYPE html><html lang="en"><head><meta charset="utf-8"><title>Caloric design cases</title></head><body style="font:15px system-ui,sans-serif;max-width:60rem;margin:2rem auto">
<h1>Design cases</h1><table><thead><tr><th>result</th><th>notebook</th><th>checks passed</th><th>summary</th></tr></thead><tbody>${rows}</tbody></table></body></html>\n`);
  return path;
}

/**
 * Runs `items` through `work` in `lanes` parallel lanes, keeping input order in the result. Lane k takes
 * items k, k + lanes, k + 2 lanes ... (a fixed share, so each lane knows how many kernels it will need).
 */
async function pool<T, R>(items: T[], lanes: number, work: (item: T, lane: number) => Promise<R>): Promise<R[]> {
  const results: R[] = new Array(items.length);
  const runners = Array.from({ length: lanes }, async (_, lane) => {
    for (let i = lane; i < items.length; i += lanes) results[i] = await work(items[i]!, lane);
  });
  await Promise.all(runners);
  return results;
}

export async function runCli(argv: string[]): Promise<number> {
  const log = (s: string) => process.stderr.write(s);
  let args: RunArgs;
  let inputs: string[];
  try {
    args = parseRunArgs(argv);
    if (args.help) {
      process.stdout.write(RUN_HELP);
      return 0;
    }
    inputs = expandInputs(args.inputs);
    if (inputs.length === 0) throw new ArgsError(`no .ipynb notebooks in ${args.inputs.join(", ")}`);
  } catch (e) {
    log(`caloric run: ${(e as Error).message}\n`);
    return 64;
  }
  // One supply per lane: each lane prestarts the kernel for its next notebook.
  const lanes = Math.min(args.jobs, inputs.length);
  const supplies = Array.from({ length: lanes }, (_, lane) => new KernelSupply(() => startKernel(args), Math.ceil((inputs.length - lane) / lanes)));
  let outcomes: NotebookOutcome[];
  try {
    outcomes = await pool(inputs, lanes, (input, lane) => runNotebook(input, args, log, () => supplies[lane]!.acquire()));
  } finally {
    await Promise.all(supplies.map((s) => s.dispose()));
  }
  const lines = outcomes.map((o) => `  ${o.status === "passed" ? "PASS" : "FAIL"}  ${o.input}: ${o.message}${o.reportPath ? `\n        report: ${o.reportPath}` : o.notebookPath ? `\n        notebook: ${o.notebookPath}` : ""}`);
  const index = args.html && outcomes.length > 1 ? writeIndex(args.out, outcomes) : undefined;
  const bad = outcomes.filter((o) => o.status !== "passed");
  process.stdout.write(`\nCaloric run: ${outcomes.length - bad.length} of ${outcomes.length} notebook(s) passed\n${lines.join("\n")}\n${index ? `Reports: ${resolve(index)}\n` : ""}`);
  if (bad.length) process.stdout.write(`First failure: ${bad[0]!.input}: ${bad[0]!.message}\n`);
  return outcomes.some((o) => o.status === "error") ? 2 : bad.length ? 1 : 0;
}
