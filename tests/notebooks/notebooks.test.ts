/**
 * caloric run on the demo design cases in notebooks/ and on the runner fixtures, end to end through the
 * compiled CLI (npm test builds dist/ first): a real kernel process over ZeroMQ unless a test says
 * --in-process. Executed notebooks are validated by Debian's python3-nbformat (an outside judge of the
 * nbformat 4 schema); design checks are read straight from the check MIME rows of the executed
 * notebooks, not only from the runner's own summary.
 */
import { spawnSync } from "node:child_process";
import { copyFileSync, existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { CLI, REPO_ROOT } from "../support/kernelProcess.js";

const DEMO_DIR = join(REPO_ROOT, "notebooks");
const FIXTURES = join(REPO_ROOT, "tests", "fixtures", "notebooks");
const CHECK_MIME = "application/vnd.caloric.check+json";
const VEGALITE_MIME = "application/vnd.vegalite.v5+json";

const demos = existsSync(DEMO_DIR) ? readdirSync(DEMO_DIR).filter((f) => f.endsWith(".ipynb") && !f.startsWith(".")).sort() : [];

interface Run {
  status: number | null;
  stdout: string;
  stderr: string;
  out: string;
}

/** `node dist/kernel/cli.js run ARGS --out TMP`, synchronously, with a generous wall-clock cap. */
function caloricRun(args: string[], timeoutSeconds = 600): Run {
  if (!existsSync(CLI)) throw new Error(`${CLI} is missing: run npm run build first (npm test does)`);
  const out = mkdtempSync(join(tmpdir(), "caloric-nbtest-"));
  const r = spawnSync(process.execPath, [CLI, "run", ...args, "--out", out], { encoding: "utf8", cwd: REPO_ROOT, timeout: timeoutSeconds * 1000, maxBuffer: 1 << 26 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr, out };
}

const show = (r: Run) => `exit ${r.status}\nstdout:\n${r.stdout}\nstderr (tail):\n${r.stderr.slice(-4000)}`;

type Json = Record<string, any>;
const readNotebook = (path: string): Json => JSON.parse(readFileSync(path, "utf8")) as Json;
const text = (v: unknown): string => (Array.isArray(v) ? v.join("") : String(v ?? ""));
const codeCells = (nb: Json): Json[] => (nb.cells as Json[]).filter((c) => c.cell_type === "code");
const richOutputs = (nb: Json): Json[] =>
  codeCells(nb).flatMap((c) => (c.outputs as Json[]).filter((o) => o.output_type === "display_data" || o.output_type === "execute_result"));

/** Every design-check row in an executed notebook, as the kernel sent it. */
function checkRows(nb: Json): Json[] {
  return richOutputs(nb).flatMap((o) => {
    const p = o.data?.[CHECK_MIME];
    if (p === undefined) return [];
    const list = Array.isArray(p) ? p : [p];
    return list.map((item) => (typeof item === "string" ? JSON.parse(item) : item) as Json);
  });
}

const chartCount = (nb: Json): number => richOutputs(nb).filter((o) => o.data?.[VEGALITE_MIME] !== undefined).length;
const svgCount = (html: string): number => html.match(/<svg[\s>]/g)?.length ?? 0;

/** nbformat.validate on each file with Debian's python3-nbformat; returns "" when all are valid. */
function nbformatErrors(files: string[]): string {
  const script = [
    "import nbformat, sys",
    "bad = []",
    "for f in sys.argv[1:]:",
    "    try: nbformat.validate(nbformat.read(f, as_version=4))",
    "    except Exception as e: bad.append(f + ': ' + str(e).splitlines()[0])",
    "print('\\n'.join(bad)); sys.exit(1 if bad else 0)",
  ].join("\n");
  const r = spawnSync("/usr/bin/python3", ["-c", script, ...files], { encoding: "utf8", timeout: 120_000 });
  return r.status === 0 ? "" : `${r.stdout}${r.stderr}` || `python3 exited ${r.status}`;
}

/** Value of the execute_result of the code cell with the given id, as text/plain. */
function resultText(nb: Json, id: string): string {
  const cell = (nb.cells as Json[]).find((c) => c.id === id);
  const result = (cell?.outputs as Json[] | undefined)?.find((o) => o.output_type === "execute_result");
  return text(result?.data?.["text/plain"]).trim();
}

describe("nbformat validation (the judge used below)", () => {
  it("python3-nbformat rejects a notebook that breaks the nbformat 4 schema", () => {
    const dir = mkdtempSync(join(tmpdir(), "caloric-nbbad-"));
    const bad = join(dir, "bad.ipynb");
    // A code cell without "outputs" and with a string execution_count violates the v4 schema.
    writeFileSync(bad, JSON.stringify({ nbformat: 4, nbformat_minor: 5, metadata: {}, cells: [{ cell_type: "code", id: "x1", metadata: {}, execution_count: "one", source: "1" }] }));
    expect(nbformatErrors([bad])).toMatch(/bad\.ipynb/);
  });
});

describe("caloric run notebooks/ (the demo design cases)", () => {
  let proc: Run;
  let inProc: Run;
  beforeAll(() => {
    if (demos.length === 0) return;
    proc = caloricRun([DEMO_DIR, "--html"]);
    inProc = caloricRun([DEMO_DIR, "--in-process"]);
  }, 1_200_000);

  it("caloric run: notebooks/ holds the demo set (at least one notebook)", () => {
    expect(demos, `no .ipynb in ${DEMO_DIR}: the demo design cases are required`).not.toHaveLength(0);
  });

  it("caloric run (kernel process) exits 0 and reports every demo passed", () => {
    expect(demos.length).toBeGreaterThan(0);
    expect(proc.status, show(proc)).toBe(0);
    expect(proc.stdout).toContain(`${demos.length} of ${demos.length} notebook(s) passed`);
  });

  it("caloric run --in-process exits 0 on the demo set too", () => {
    expect(demos.length).toBeGreaterThan(0);
    expect(inProc.status, show(inProc)).toBe(0);
  });

  it("caloric run: executed demo notebooks validate as nbformat 4 (python3-nbformat)", () => {
    expect(demos.length).toBeGreaterThan(0);
    const files = demos.map((d) => join(proc.out, d));
    for (const f of files) expect(existsSync(f), `${f} not written\n${show(proc)}`).toBe(true);
    expect(nbformatErrors(files)).toBe("");
  });

  for (const demo of demos) {
    describe(demo, () => {
      it("caloric run: every code cell ran without error and every design check passed", () => {
        const nb = readNotebook(join(proc.out, demo));
        for (const [i, c] of codeCells(nb).entries()) {
          expect(c.execution_count, `${demo}: code cell ${i + 1} not executed`).toEqual(expect.any(Number));
          const err = (c.outputs as Json[]).find((o) => o.output_type === "error");
          expect(err, `${demo}: code cell ${i + 1}: ${err?.ename}: ${err?.evalue}`).toBeUndefined();
        }
        const rows = checkRows(nb);
        // DESIGN.md section 2: every worked design case ends in design checks.
        expect(rows.length, `${demo} has no verify(...) design check`).toBeGreaterThan(0);
        for (const r of rows) expect(r.pass, `${demo}: ${r.message ?? r.label}`).toBe(true);
        expect(nb.metadata?.caloric?.checks).toEqual({ total: rows.length, failed: 0 });
        expect(nb.metadata?.kernelspec?.name).toBe("caloric");
      });

      it("caloric run --html: the report has every chart as inline SVG and the check summary", () => {
        const nb = readNotebook(join(proc.out, demo));
        const charts = chartCount(nb);
        // Issue 8: each demo is a design case with charts.
        expect(charts, `${demo} draws no chart`).toBeGreaterThan(0);
        const html = readFileSync(join(proc.out, demo.replace(/\.ipynb$/, ".html")), "utf8");
        expect(svgCount(html), `${demo}: ${charts} chart(s) but the report has ${svgCount(html)} <svg> (charts need image/svg+xml from the kernel)`).toBeGreaterThanOrEqual(charts);
        expect(html).toContain('id="checks"');
        expect(html).toContain(`PASS: all ${checkRows(nb).length} design check(s) met`);
        expect(html).not.toMatch(/<script/i); // self-contained, static
      });

      it("caloric run --in-process gives the same design checks as the kernel process", () => {
        const key = (r: Json) => ({ label: r.label, pass: r.pass, value: r.value, target: r.target, tolerance: r.tolerance });
        expect(checkRows(readNotebook(join(inProc.out, demo))).map(key)).toEqual(checkRows(readNotebook(join(proc.out, demo))).map(key));
      });
    });
  }
});

describe("caloric run on the fixtures", () => {
  const pass = join(FIXTURES, "pass.ipynb");
  const error = join(FIXTURES, "error.ipynb");

  it("caloric run --jobs 2 runs two notebooks, each with its own kernel and results", () => {
    const dir = mkdtempSync(join(tmpdir(), "caloric-nbjobs-"));
    copyFileSync(pass, join(dir, "a.ipynb"));
    copyFileSync(pass, join(dir, "b.ipynb"));
    const r = caloricRun([dir, "--jobs", "2", "--html"]);
    expect(r.status, show(r)).toBe(0);
    expect(r.stdout).toContain("2 of 2 notebook(s) passed");
    for (const f of ["a.ipynb", "b.ipynb"]) {
      const nb = readNotebook(join(r.out, f));
      expect(resultText(nb, "c3")).toBe("3"); // 30 bar / 10 bar (arithmetic)
      expect(nb.metadata.caloric.checks).toEqual({ total: 1, failed: 0 });
      // Execution counts start at 1 in each: separate kernels, not one shared session.
      expect(codeCells(nb).map((c) => c.execution_count)).toEqual([1, 2, 3]);
    }
    expect(existsSync(join(r.out, "index.html"))).toBe(true);
    expect(nbformatErrors(["a.ipynb", "b.ipynb"].map((f) => join(r.out, f)))).toBe("");
  });

  it("caloric run --html: the fixture's chart is inline SVG in the report, with the check summary", () => {
    const r = caloricRun([pass, "--html"]);
    expect(r.status, show(r)).toBe(0);
    const html = readFileSync(join(r.out, "pass.html"), "utf8");
    expect(svgCount(html), "the report has no <svg> for the fixture's chart").toBeGreaterThanOrEqual(1);
    expect(html).toContain("PASS: all 1 design check(s) met");
    expect(html).toContain("pressure ratio at most 4");
  });

  it("caloric run --set changes results (P2 = 35 bar gives ratio 3.5)", () => {
    const r = caloricRun([pass, "--set", "P2=35 bar"]);
    expect(r.status, show(r)).toBe(0);
    const nb = readNotebook(join(r.out, "pass.ipynb"));
    expect(Number(resultText(nb, "c3"))).toBeCloseTo(3.5, 12); // 35 bar / 10 bar (arithmetic)
    expect(nb.metadata.caloric.parameters).toEqual({ P2: "35 bar" });
    expect(nbformatErrors([join(r.out, "pass.ipynb")])).toBe("");
  });

  it("caloric run: a failing design check exits 1 and names the check", () => {
    // 50 bar / 10 bar = 5 > 4 (arithmetic): the fixture's "at most 4" check must fail.
    const r = caloricRun([pass, "--set", "P2=50 bar", "--html"]);
    expect(r.status, show(r)).toBe(1);
    expect(r.stdout).toMatch(/design check failed: pressure ratio at most 4/);
    const nb = readNotebook(join(r.out, "pass.ipynb"));
    const rows = checkRows(nb);
    expect(rows.map((x) => [x.label, x.pass, x.value])).toEqual([["pressure ratio at most 4", false, 5]]);
    expect(readFileSync(join(r.out, "pass.html"), "utf8")).toContain("FAIL: 1 of 1 design check(s) failed");
  });

  it("caloric run --set with a name the parameters cell does not assign exits 2 and names it", () => {
    const r = caloricRun([pass, "--set", "Q2=50 bar"]);
    expect(r.status, show(r)).toBe(2);
    expect(r.stdout).toMatch(/--set Q2: not assigned by its parameters cell \(which assigns P1, P2\)/);
  });

  it("caloric run: a cell error exits 2 with a message naming the cell, later cells not run", () => {
    const r = caloricRun([error, "--html"]);
    expect(r.status, show(r)).toBe(2);
    // error.ipynb: cell 2 adds a pressure to a mass.
    expect(r.stdout).toMatch(/error\.ipynb: cell \[2\] failed: .*units/i);
    const nb = readNotebook(join(r.out, "error.ipynb"));
    const [c1, c2, c3] = codeCells(nb);
    expect(c1!.execution_count).toBe(1);
    expect((c2!.outputs as Json[]).some((o) => o.output_type === "error")).toBe(true);
    expect(c3!.execution_count).toBeNull();
    expect(checkRows(nb)).toEqual([]);
    expect(readFileSync(join(r.out, "error.html"), "utf8")).toMatch(/FAIL: 1 cell error/);
    expect(nbformatErrors([join(r.out, "error.ipynb")])).toBe("");
  });

  it("caloric run --in-process gives the same checks and results as the kernel process", () => {
    const a = caloricRun([pass, "--set", "P2=50 bar"]);
    const b = caloricRun([pass, "--set", "P2=50 bar", "--in-process"]);
    expect(b.status, show(b)).toBe(a.status);
    const na = readNotebook(join(a.out, basename(pass)));
    const nbb = readNotebook(join(b.out, basename(pass)));
    expect(checkRows(nbb)).toEqual(checkRows(na));
    expect(resultText(nbb, "c3")).toBe(resultText(na, "c3"));
  });
});
