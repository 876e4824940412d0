/**
 * Language thermodynamics benchmark: the vectorised state() over a 10,000-point span (one call; pure
 * cubic models take the column fast path, lib/thermo cubicStateColumns) against 10,000 scalar state()
 * calls from the language (each converts units and builds a record of quantities), the plain-library
 * loop of general states (state + heatCapacity) and the library's column fast path alone, for the same
 * states. Peng-Robinson propane, 200..600 K at 50 bar (liquid, near-critical and supercritical).
 * The first vectorised call of a fresh session (JIT warm-up included) is shown apart from the warm
 * median. Measures, never asserts. Run alone: `node dist/bench/language_thermo.js`.
 */
import { pathToFileURL } from "node:url";
import { createSessionWithInternals } from "../lib/language/createSession.js";
import { cubicStateColumns, getSubstance, heatCapacity, idealGasFunctions, pr, pureFluid, state } from "../lib/thermo/index.js";

const N = 10_000;
const sink = { stdout() {}, display() {}, clear() {} };

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function timed(f: () => void, reps: number, warm = 1): number {
  for (let w = 0; w < warm; w++) f();
  const out: number[] = [];
  for (let r = 0; r < reps; r++) {
    const t0 = performance.now();
    f();
    out.push(performance.now() - t0);
  }
  return median(out);
}

export function run(): void {
  const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
  const setup = session.run(`m = pr("propane"); Ts = span(200 K, 600 K, ${N});`, sink);
  if (!setup.ok) throw new Error(setup.error.evalue);
  const check = (r: ReturnType<typeof session.run>) => { if (!r.ok) throw new Error(r.error.evalue); };

  const t0 = performance.now();
  check(session.run("r = state(m, Ts, 50 bar);", sink));
  const first = performance.now() - t0;
  const vec = timed(() => check(session.run("r = state(m, Ts, 50 bar);", sink)), 9, 2);
  // CPU time of the same call (user + system of this process): what the call costs when other
  // processes compete for the cores, which inflates wall-clock time but not this.
  const cpu: number[] = [];
  for (let r = 0; r < 9; r++) {
    const c0 = process.cpuUsage();
    check(session.run("r = state(m, Ts, 50 bar);", sink));
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }

  const math = internals.math;
  const temps = Array.from({ length: N }, (_, i) => math.unit(200 + (400 * i) / (N - 1), "K"));
  const scalar = timed(() => {
    for (const t of temps) {
      internals.scope.set("t", t);
      check(session.run("r1 = state(m, t, 50 bar);", sink));
    }
  }, 3);

  const propane = getSubstance("propane");
  const model = pr(pureFluid(propane));
  const ig = idealGasFunctions([propane], [1]);
  const lib = timed(() => {
    for (let i = 0; i < N; i++) {
      const T = 200 + (400 * i) / (N - 1);
      const s = state(model, T, 5e6, { idealGas: ig });
      heatCapacity(model, T, 5e6, s.V, ig.Cp(T), propane.M);
    }
  }, 5);
  const Tarr = Float64Array.from({ length: N }, (_, i) => 200 + (400 * i) / (N - 1));
  const columns = timed(() => {
    cubicStateColumns(model, Tarr, 5e6, N, { idealGas: ig, M: propane.M });
  }, 9, 2);

  const line = (label: string, ms: number) => console.log(`${label.padEnd(60)} ${ms.toFixed(1).padStart(8)} ms  (${((N / ms) * 1000).toExponential(2)} states/s)`);
  line(`state(pr("propane"), span(200 K, 600 K, ${N}), 50 bar)  [one call]`, vec);
  line("  the same, CPU time (median of 9)", median(cpu));
  line("  the same, first call in a fresh session (JIT warm-up)", first);
  line(`${N} scalar state() calls from the language`, scalar);
  line(`plain library loop: state + heatCapacity, ${N} points`, lib);
  line(`library column fast path: cubicStateColumns, ${N} points`, columns);
  console.log(`vectorised vs scalar calls: ${(scalar / vec).toFixed(1)}x faster; vectorised call vs the library loop: ${(vec / lib).toFixed(2)}x; library fast path vs loop: ${(lib / columns).toFixed(1)}x faster (target: vectorised call < 20 ms)`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) run();
