/**
 * Language thermodynamics benchmark: the vectorised state() over a 10,000-point span (one call,
 * plain-number loop inside) against 10,000 scalar state() calls from the language (each converts
 * units and builds a record of quantities), and the plain-library loop for the same states as the
 * floor. Peng-Robinson propane, 200..600 K at 50 bar (liquid, two roots region and gas). Measures,
 * never asserts. Run alone: `node dist/bench/language_thermo.js`.
 */
import { pathToFileURL } from "node:url";
import { createSessionWithInternals } from "../lib/language/createSession.js";
import { getSubstance, heatCapacity, idealGasFunctions, pr, pureFluid, state } from "../lib/thermo/index.js";

const N = 10_000;
const sink = { stdout() {}, display() {}, clear() {} };

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function timed(f: () => void, reps: number): number {
  f(); // warm up
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

  const vec = timed(() => check(session.run("r = state(m, Ts, 50 bar);", sink)), 7);

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

  const line = (label: string, ms: number) => console.log(`${label.padEnd(60)} ${ms.toFixed(1).padStart(8)} ms  (${((N / ms) * 1000).toExponential(2)} states/s)`);
  line(`state(pr("propane"), span(200 K, 600 K, ${N}), 50 bar)  [one call]`, vec);
  line(`${N} scalar state() calls from the language`, scalar);
  line(`plain library loop: state + heatCapacity, ${N} points`, lib);
  console.log(`vectorised vs scalar calls: ${(scalar / vec).toFixed(1)}x faster; vectorised overhead over the library loop: ${(vec / lib).toFixed(2)}x`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) run();
