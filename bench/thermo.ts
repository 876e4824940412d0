/**
 * Peng-Robinson states per second (Z root + H^R + S^R + ln phi of pure methane over random T, P), the
 * plain library's allocation-free path (prStateFast) side by side, in one run, with the numpy script a
 * Python notebook user would write (../shared/bench/numpy_pr_bench.py, relative to the repository,
 * run by /usr/bin/python3). Also the column fast path of vectorised state() (cubicStateColumns: the same
 * four properties plus the other departures, stable-root choice by Gibbs energy and flags, written into
 * columns) and the general pr(fluid) model path for comparison. Measures, never asserts.
 *   npm run bench            (aggregated by bench/index.ts)
 *   npm run build && node dist/bench/thermo.js
 */
import { execFileSync } from "node:child_process";
import { existsSync } from "node:fs";
import { dirname, resolve } from "node:path";
import { fileURLToPath, pathToFileURL } from "node:url";
import { cubicStateColumns, getSubstance, leeKesler, pr, prStateFast, pureFluid, selectRoot } from "../lib/thermo/index.js";

const Tc = 190.564;
const Pc = 45.992e5;
const omega = 0.0114; // same methane constants as the numpy script

function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296);
}

/** n pseudo-random states, 200-400 K and 0.1-10 MPa, the same sequence every run (seed 1). */
function randomStates(n: number): { T: Float64Array; P: Float64Array } {
  const rnd = lcg(1);
  const T = new Float64Array(n);
  const P = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    T[i] = 200 + 200 * rnd();
    P[i] = 1e5 + (1e7 - 1e5) * rnd();
  }
  return { T, P };
}

function nodeRate(n: number): { rate: number; check: number } {
  const { T, P } = randomStates(n);
  const out = new Float64Array(4);
  let best = Infinity;
  let check = 0;
  for (let rep = 0; rep < 5; rep++) {
    const t0 = performance.now();
    let acc = 0;
    for (let i = 0; i < n; i++) acc += prStateFast(T[i]!, P[i]!, Tc, Pc, omega, out) + out[3]!;
    best = Math.min(best, (performance.now() - t0) / 1000);
    check = acc;
  }
  return { rate: n / best, check };
}

const benchMethane = () => ({ id: "methane", name: "methane", formula: "CH4", aliases: [], M: 0.016043, Tc, Pc, Vc: 9.86e-5, Zc: 0.286, omega, Tb: 111.7, cp: { form: "", coefficients: [], Tmin: 0, Tmax: 0, source: "" }, source: "bench" });

function columnRate(n: number): number {
  const m = pr(pureFluid(benchMethane()));
  const { T, P } = randomStates(n);
  let best = Infinity;
  for (let rep = 0; rep < 5; rep++) {
    const t0 = performance.now();
    const c = cubicStateColumns(m, T, P, n);
    best = Math.min(best, (performance.now() - t0) / 1000);
    if (c.stoppedAt >= 0) throw new Error(`column path stopped at ${c.stoppedAt}`);
  }
  return n / best;
}

function modelRate(n: number): number {
  const m = pr(pureFluid(benchMethane()));
  const rnd = lcg(2);
  const t0 = performance.now();
  for (let i = 0; i < n; i++) selectRoot(m, 200 + 200 * rnd(), 1e5 + 9.9e6 * rnd());
  return n / ((performance.now() - t0) / 1000);
}

function numpyRate(): number | string {
  const here = dirname(fileURLToPath(import.meta.url));
  // Works from bench/ (tsx) and dist/bench/ (compiled): walk up to the folder holding package.json.
  let root = here;
  while (!existsSync(resolve(root, "package.json")) && dirname(root) !== root) root = dirname(root);
  const script = resolve(root, "../shared/bench/numpy_pr_bench.py");
  if (!existsSync(script)) return `numpy script not found at ${script}`;
  try {
    const text = execFileSync("/usr/bin/python3", [script], { encoding: "utf8" });
    const m = /([0-9.]+e[+-]?[0-9]+)/.exec(text);
    return m ? Number(m[1]) : `unparsed output: ${text.trim()}`;
  } catch (e) {
    return `numpy run failed: ${(e as Error).message.split("\n")[0]}`;
  }
}

/**
 * Lee-Kesler cost per state: selectRoot (roots, residual of each root, stable choice) of pure propane
 * and of a methane/propane 0.7/0.3 mixture (Ploecker rules) over random T in 200-600 K, P in 1-100 bar,
 * microseconds per state (best of three passes). Measures, never asserts.
 */
export function leeKeslerStateTime(n = 2000): { pure: number; mixture: number } {
  const time = (m: ReturnType<typeof leeKesler>): number => {
    let best = Infinity;
    for (let rep = 0; rep < 3; rep++) {
      const rnd = lcg(3);
      const t0 = performance.now();
      for (let i = 0; i < n; i++) selectRoot(m, 200 + 400 * rnd(), 1e5 + 9.9e6 * rnd());
      best = Math.min(best, (performance.now() - t0) * 1000 / n);
    }
    return best;
  };
  const pure = time(leeKesler(pureFluid(getSubstance("propane"))));
  const mixture = time(leeKesler({ components: [getSubstance("methane"), getSubstance("propane")], x: [0.7, 0.3] }));
  console.log(`Lee-Kesler microseconds per state (selectRoot), pure propane: ${pure.toFixed(2)}, methane/propane mixture: ${mixture.toFixed(2)}`);
  return { pure, mixture };
}

export function run(): { node: number; columns: number; model: number; numpy: number | string } {
  const node = nodeRate(1_000_000).rate;
  const columns = columnRate(1_000_000);
  const model = modelRate(200_000);
  const numpy = numpyRate();
  console.log(`PR states/s, plain library fast path (prStateFast): ${node.toExponential(3)}`);
  console.log(`PR states/s, column fast path (cubicStateColumns, all departures + flags): ${columns.toExponential(3)}`);
  console.log(`PR states/s, general model path (pr(fluid) + selectRoot): ${model.toExponential(3)}`);
  if (typeof numpy === "number") {
    console.log(`PR states/s, numpy vectorised (same run):            ${numpy.toExponential(3)}`);
    console.log(`ratio fast path / numpy: ${(node / numpy).toFixed(2)} (target >= 1.5); column path / numpy: ${(columns / numpy).toFixed(2)}`);
  } else console.log(numpy);
  leeKeslerStateTime();
  return { node, columns, model, numpy };
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) run();
