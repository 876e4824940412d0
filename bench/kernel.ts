/**
 * npm run bench:kernel — cold start and execute round trip of the compiled kernel, measured by the
 * shared kernel_probe.py in one run against (a) the reference Python kernel (kernelspec python3) and
 * (b) empty_kernel.py (the floor ZeroMQ and the client impose), plus the cold start against
 * kernelFloor.js (the least a Node kernel can do before kernel_info). Prints the ratios; asserts nothing.
 * Targets (issue 2): cold start <= 0.2x the Python kernel's, round trip <= 1.25x the empty kernel's.
 */
import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

const here = dirname(fileURLToPath(import.meta.url));
// dist/bench/kernel.js or bench/kernel.ts: the repo root is the nearest parent holding package.json.
let root = here;
while (!existsSync(join(root, "package.json"))) root = dirname(root);
const sharedBench = resolve(root, "..", "shared", "bench");
const probe = join(sharedBench, "kernel_probe.py");
const empty = join(sharedBench, "empty_kernel.py");
const cli = join(root, "dist", "kernel", "cli.js");
for (const f of [probe, empty, cli]) if (!existsSync(f)) throw new Error(`bench:kernel needs ${f}`);

const starts = process.env.BENCH_STARTS ?? "8";
const execs = process.env.BENCH_EXECS ?? "300";
const ours = `${process.execPath} ${cli} kernel -f {connection_file}`;

function runProbe(compare: string[]): Record<string, any> {
  const out = execFileSync("/usr/bin/python3", [probe, "--argv", ours, ...compare, "--starts", starts, "--execs", execs, "--quiet"], { encoding: "utf8", maxBuffer: 1 << 24 });
  const result = JSON.parse(out.trim().split("\n").at(-1)!) as Record<string, any>;
  if (!result.ok) throw new Error(`kernel_probe failed: ${result.error}`);
  return result;
}

const floor = join(root, "dist", "bench", "kernelFloor.js");
const vsPython = runProbe(["--compare", "python3"]);
// Cold start only, against the least a Node kernel can do (bench/kernelFloor.ts): what is ours to cut.
const vsFloor = runProbe(["--compare-argv", `${process.execPath} ${floor} {connection_file}`, "--skip-exec"]);
const vsEmpty = runProbe(["--compare-argv", `/usr/bin/python3 ${empty} {connection_file}`]);
const ms = (r: Record<string, any>, k: string, ...path: string[]) => path.reduce((o, p) => o?.[p], r.kernels[k]) as number;

const coldCaloric = ms(vsPython, "A", "cold_start", "kernel_info_reply", "median");
const coldPython = ms(vsPython, "B", "cold_start", "kernel_info_reply", "median");
const rtCaloric = ms(vsEmpty, "A", "round_trip", "rt", "median");
const rtEmpty = ms(vsEmpty, "B", "round_trip", "rt", "median");
const rtPython = ms(vsPython, "B", "round_trip", "rt", "median");

console.log(`cold start to kernel_info_reply (median): caloric ${coldCaloric.toFixed(0)} ms, python kernel ${coldPython.toFixed(0)} ms -> ratio ${(coldCaloric / coldPython).toFixed(3)} (target <= 0.2)`);
const readyCaloric = ms(vsPython, "A", "cold_start", "ready", "median");
const readyPython = ms(vsPython, "B", "cold_start", "ready", "median");
console.log(`cold start to ready (reply and an iopub status, median): caloric ${readyCaloric.toFixed(0)} ms, python kernel ${readyPython.toFixed(0)} ms -> ratio ${(readyCaloric / readyPython).toFixed(3)}`);
const coldVsFloor = [ms(vsFloor, "A", "cold_start", "kernel_info_reply", "median"), ms(vsFloor, "B", "cold_start", "kernel_info_reply", "median")];
console.log(`cold start vs the Node floor (kernelFloor.js, median): caloric ${coldVsFloor[0]!.toFixed(0)} ms, floor ${coldVsFloor[1]!.toFixed(0)} ms -> ratio ${(coldVsFloor[0]! / coldVsFloor[1]!).toFixed(3)}`);
console.log(`execute round trip of 1+1 (median): caloric ${rtCaloric.toFixed(2)} ms, empty kernel ${rtEmpty.toFixed(2)} ms -> ratio ${(rtCaloric / rtEmpty).toFixed(3)} (target <= 1.25)`);
console.log(`execute round trip vs python kernel: ${(ms(vsPython, "A", "round_trip", "rt", "median") / rtPython).toFixed(3)} (python ${rtPython.toFixed(2)} ms)`);
console.log(`protocol checks (caloric): ${JSON.stringify(vsEmpty.kernels.A.protocol_checks)}`);
console.log(`load average: start ${vsPython.config.loadavg_start}, end ${vsEmpty.config.loadavg_end}`);
