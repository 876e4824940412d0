/**
 * Wall time of `caloric run` on the demo set (notebooks/*.ipynb) against `jupyter nbconvert --to notebook
 * --execute` with the caloric kernel on the same notebooks, in one run, interleaved, median of
 * BENCH_RUNNER_REPS (default 3). Issue 8 target: caloric run (kernel process) at most 0.3x nbconvert.
 * Then a profile of where the time goes: process starts, kernel start to kernel_info_reply, first
 * execute (worker and language ready), each cell, shutdown; the in-process engine likewise.
 * Measures, never asserts.
 *   npm run bench            (aggregated by bench/index.ts)
 *   npm run build && node dist/bench/runner.js
 * Needs /usr/bin/jupyter with nbconvert (Debian: jupyter-nbconvert, python3-nbclient). Jupyter sees only
 * temp directories (JUPYTER_PATH, JUPYTER_DATA_DIR, JUPYTER_RUNTIME_DIR, JUPYTER_CONFIG_DIR).
 */
import { spawn, spawnSync } from "node:child_process";
import { randomUUID } from "node:crypto";
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { loadavg, tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { InProcessEngine } from "../kernel/engine/index.js";
import { KernelClient, loopbackConnection } from "../kernel/wire/index.js";

const here = dirname(fileURLToPath(import.meta.url));
// dist/bench/runner.js or bench/runner.ts: the repo root is the nearest parent holding package.json.
let root = here;
while (!existsSync(join(root, "package.json"))) root = dirname(root);
const CLI = join(root, "dist", "kernel", "cli.js");
const JUPYTER = "/usr/bin/jupyter";

const median = (xs: number[]): number => {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};
const fmt = (ms: number): string => (ms >= 1000 ? `${(ms / 1000).toFixed(2)} s` : `${ms.toFixed(0)} ms`);

/** The demo set, or the passing runner fixture while notebooks/ is still empty (said so in the output). */
function notebookSet(): { files: string[]; label: string } {
  const dir = join(root, "notebooks");
  const demos = existsSync(dir) ? readdirSync(dir).filter((f) => f.endsWith(".ipynb") && !f.startsWith(".")).sort() : [];
  if (demos.length) return { files: demos.map((f) => join(dir, f)), label: `demo set notebooks/ (${demos.length}: ${demos.join(", ")})` };
  return { files: [join(root, "tests", "fixtures", "notebooks", "pass.ipynb")], label: "notebooks/ is EMPTY: measuring tests/fixtures/notebooks/pass.ipynb instead" };
}

function jupyterEnv(tmp: string): NodeJS.ProcessEnv {
  const dirs = { JUPYTER_DATA_DIR: join(tmp, "data"), JUPYTER_RUNTIME_DIR: join(tmp, "runtime"), JUPYTER_CONFIG_DIR: join(tmp, "config") };
  for (const d of Object.values(dirs)) mkdirSync(d, { recursive: true });
  return { ...process.env, ...dirs, JUPYTER_PATH: join(tmp, "prefix", "share", "jupyter"), JUPYTER_PLATFORM_DIRS: "1", PYTHONDONTWRITEBYTECODE: "1" };
}

interface Timed {
  ms: number;
  status: number | null;
  tail: string;
}

function timed(cmd: string, args: string[], env: NodeJS.ProcessEnv): Timed {
  const t0 = performance.now();
  const r = spawnSync(cmd, args, { env, cwd: root, encoding: "utf8", timeout: 1_800_000, maxBuffer: 1 << 26 });
  const ms = performance.now() - t0;
  return { ms, status: r.status, tail: `${r.stdout ?? ""}${r.stderr ?? ""}`.trim().split("\n").slice(-3).join(" | ") };
}

const codeCellsOf = (file: string): string[] =>
  (JSON.parse(readFileSync(file, "utf8")) as { cells: { cell_type: string; source: string | string[] }[] }).cells
    .filter((c) => c.cell_type === "code")
    .map((c) => (Array.isArray(c.source) ? c.source.join("") : c.source));

interface CellTime {
  notebook: string;
  line: string;
  ms: number;
}

/** One kernel process driven over ZeroMQ as the runner does it, phase by phase. */
async function profileProcess(files: string[], tmp: string): Promise<{ phases: [string, number][]; cells: CellTime[] }> {
  const phases: [string, number][] = [];
  const cells: CellTime[] = [];
  for (const file of files) {
    const info = await loopbackConnection();
    const conn = join(tmp, `conn-${randomUUID()}.json`);
    writeFileSync(conn, JSON.stringify(info));
    const name = file.split("/").at(-1)!;
    const t0 = performance.now();
    const child = spawn(process.execPath, [CLI, "kernel", "-f", conn], { stdio: "ignore", env: { ...process.env, JPY_PARENT_PID: String(process.pid) } });
    const exited = new Promise((r) => child.once("exit", r));
    const client = await KernelClient.connect(info);
    // The first kernel_info_request waits in the DEALER queue until the kernel binds: its reply marks
    // the kernel's own start. waitForReady then also needs an iopub status, which a subscriber that
    // joined late misses (ZeroMQ slow joiner) until a resend: the gap is the client's retry window.
    const first = client.request("shell", "kernel_info_request");
    await client.waitFor((r) => r.channel === "shell" && r.message.parent_header.msg_id === first, 30_000, "kernel_info_reply");
    const tShell = performance.now();
    phases.push([`${name}: spawn to first kernel_info_reply (shell)`, tShell - t0]);
    await client.waitForReady(30_000);
    const tReady = performance.now();
    phases.push([`${name}: then waitForReady (iopub joined, retry window)`, tReady - tShell]);
    await client.execute("1");
    const tFirst = performance.now();
    phases.push([`${name}: then first execute "1" (worker + language loaded)`, tFirst - tReady]);
    for (const code of codeCellsOf(file)) {
      const c0 = performance.now();
      const { reply } = await client.execute(code, { stop_on_error: true }, 600_000);
      cells.push({ notebook: name, line: code.split("\n")[0]!.slice(0, 60), ms: performance.now() - c0 });
      if (reply.content.status !== "ok") break;
    }
    const tCells = performance.now();
    phases.push([`${name}: code cells (${codeCellsOf(file).length})`, tCells - tFirst]);
    const id = client.request("control", "shutdown_request", { restart: false });
    await client.collect(id, 5_000).catch(() => undefined);
    client.close();
    await exited;
    phases.push([`${name}: shutdown to process exit`, performance.now() - tCells]);
  }
  return { phases, cells };
}

/** The same cells through the in-process engine (what --in-process uses). */
async function profileInProcess(files: string[]): Promise<{ phases: [string, number][]; cells: CellTime[] }> {
  const phases: [string, number][] = [];
  const cells: CellTime[] = [];
  for (const file of files) {
    const name = file.split("/").at(-1)!;
    const t0 = performance.now();
    const engine = await InProcessEngine.create();
    await engine.execute("1", () => undefined);
    const t1 = performance.now();
    phases.push([`${name}: engine create + first execute`, t1 - t0]);
    for (const code of codeCellsOf(file)) {
      const c0 = performance.now();
      const r = await engine.execute(code, () => undefined);
      cells.push({ notebook: name, line: code.split("\n")[0]!.slice(0, 60), ms: performance.now() - c0 });
      if (!r.ok) break;
    }
    phases.push([`${name}: code cells`, performance.now() - t1]);
    await engine.shutdown();
  }
  return { phases, cells };
}

export interface RunnerBench {
  notebooks: string[];
  caloricMs: number;
  inProcessMs: number;
  jobs2Ms: number;
  nbconvertMs: number;
  ratio: number;
  inProcessRatio: number;
}

export async function run(): Promise<RunnerBench | undefined> {
  if (!existsSync(CLI)) throw new Error(`bench:runner needs ${CLI} (npm run build)`);
  if (!existsSync(JUPYTER)) {
    console.log(`bench runner: skipped, ${JUPYTER} is missing (Debian packages jupyter-nbconvert, python3-nbclient)`);
    return undefined;
  }
  const { files, label } = notebookSet();
  const reps = Math.max(1, Number(process.env.BENCH_RUNNER_REPS ?? 3) || 3);
  const tmp = mkdtempSync(join(tmpdir(), "caloric-bench-runner-"));
  try {
    execOk(process.execPath, [CLI, "install", "--prefix", join(tmp, "prefix")]);
    const env = jupyterEnv(tmp);
    console.log(`notebooks: ${label}`);
    console.log(`repetitions: ${reps}, interleaved; wall time of one command over the whole set; load average ${loadavg().map((x) => x.toFixed(2)).join(" ")} (2 cores: above ~1.5 the numbers are noisy)`);

    const variants: Record<string, { cmd: string; args: (i: number) => string[]; times: number[]; bad: string[] }> = {
      "caloric run (kernel process)": { cmd: process.execPath, args: (i) => [CLI, "run", ...files, "--quiet", "--out", join(tmp, `run-${i}`)], times: [], bad: [] },
      "caloric run --in-process": { cmd: process.execPath, args: (i) => [CLI, "run", ...files, "--quiet", "--in-process", "--out", join(tmp, `inp-${i}`)], times: [], bad: [] },
      "caloric run --jobs 2": { cmd: process.execPath, args: (i) => [CLI, "run", ...files, "--quiet", "--jobs", "2", "--out", join(tmp, `j2-${i}`)], times: [], bad: [] },
      "jupyter nbconvert --execute": {
        cmd: JUPYTER,
        args: (i) => ["nbconvert", "--to", "notebook", "--execute", "--ExecutePreprocessor.kernel_name=caloric", "--ExecutePreprocessor.timeout=600", "--output-dir", join(tmp, `nbc-${i}`), ...files],
        times: [],
        bad: [],
      },
    };
    const names = Object.keys(variants);
    for (let i = 0; i < reps; i++) {
      // Rotate the order so that no variant always runs first (cold file cache) or last.
      for (let k = 0; k < names.length; k++) {
        const v = variants[names[(i + k) % names.length]!]!;
        const t = timed(v.cmd, v.args(i), env);
        v.times.push(t.ms);
        if (t.status !== 0) v.bad.push(`exit ${t.status}: ${t.tail}`);
      }
    }
    const med = Object.fromEntries(names.map((n) => [n, median(variants[n]!.times)])) as Record<string, number>;
    const ref = med["jupyter nbconvert --execute"]!;
    for (const n of names) {
      const v = variants[n]!;
      const best = Math.min(...v.times) / Math.min(...variants["jupyter nbconvert --execute"]!.times);
      console.log(`${n.padEnd(30)} median ${fmt(med[n]!).padStart(8)}  (runs: ${v.times.map(fmt).join(", ")})  ratio vs nbconvert: medians ${(med[n]! / ref).toFixed(3)}, best runs ${best.toFixed(3)}`);
      if (v.bad.length) console.log(`  WARNING ${n}: ${v.bad.length} run(s) did not exit 0, e.g. ${v.bad[0]}`);
    }
    const ratio = med["caloric run (kernel process)"]! / ref;
    const inProcessRatio = med["caloric run --in-process"]! / ref;
    console.log(`RATIO caloric run / nbconvert: ${ratio.toFixed(3)} (target <= 0.3: ${ratio <= 0.3 ? "met" : "NOT met"}); in-process ${inProcessRatio.toFixed(3)}`);

    console.log(`load average after the timed runs: ${loadavg().map((x) => x.toFixed(2)).join(" ")}`);
    console.log("\nprofile (one pass; where the time goes):");
    const starts: [string, number][] = [
      ["node -e 0 (node start)", median([0, 1, 2].map(() => timed(process.execPath, ["-e", "0"], env).ms))],
      ["node cli.js help (cli load)", median([0, 1, 2].map(() => timed(process.execPath, [CLI, "help"], env).ms))],
      ["python3 -c 'import nbconvert, nbclient'", median([0, 1, 2].map(() => timed("/usr/bin/python3", ["-c", "import nbconvert, nbclient"], env).ms))],
      ["jupyter nbconvert --help (its CLI start)", median([0, 1].map(() => timed(JUPYTER, ["nbconvert", "--help"], env).ms))],
    ];
    for (const [what, ms] of starts) console.log(`  ${what.padEnd(52)} ${fmt(ms).padStart(8)}`);
    const proc = await profileProcess(files, tmp);
    console.log("  kernel process over ZeroMQ:");
    for (const [what, ms] of proc.phases) console.log(`    ${what.padEnd(60)} ${fmt(ms).padStart(8)}`);
    const inp = await profileInProcess(files);
    console.log("  in-process engine (this process, so module loads are paid once):");
    for (const [what, ms] of inp.phases) console.log(`    ${what.padEnd(60)} ${fmt(ms).padStart(8)}`);
    const slow = [...proc.cells].sort((a, b) => b.ms - a.ms).slice(0, 5);
    console.log("  slowest cells (kernel process):");
    for (const c of slow) console.log(`    ${fmt(c.ms).padStart(8)}  ${c.notebook}: ${c.line}`);
    return { notebooks: files, caloricMs: med["caloric run (kernel process)"]!, inProcessMs: med["caloric run --in-process"]!, jobs2Ms: med["caloric run --jobs 2"]!, nbconvertMs: ref, ratio, inProcessRatio };
  } finally {
    rmSync(tmp, { recursive: true, force: true });
  }
}

function execOk(cmd: string, args: string[]): void {
  const r = spawnSync(cmd, args, { encoding: "utf8" });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(" ")} failed: ${r.stderr}`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) await run();
