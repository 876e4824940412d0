/**
 * Language benchmarks (no assertions): session creation, evaluations per second of a compiled
 * expression with units against the same expression on plain SI numbers, a whole cell through
 * Session.run (units vs plain), single statements with unit literals and offsets, a scalar built-in
 * call through a cell, and a 1,000-point span through one vectorised built-in call against 1,000
 * scalar calls. Compare ratios within one run: the machine's load moves absolute rates.
 */
import { createSessionWithInternals } from "../lib/language/createSession.js";
import { defineBuiltin } from "../lib/language/index.js";

const R = 8.314462618; // J/(mol K), CODATA 2018 exact

// A bench-only built-in of realistic shape: ideal-gas pressure from T and V (the vectorised path).
const pig = defineBuiltin({
  name: "bench_pressure", group: "bench", returns: "pressure", vectorize: true,
  doc: "ideal-gas pressure R T / V (benchmark only)", examples: ["bench_pressure(300 K, 1 L/mol)"],
  params: [
    { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
    { name: "V", type: "quantity", dim: "molar_volume", doc: "molar volume" },
  ],
  impl: ({ T, V }) => (R * T) / V,
});

/**
 * Calls per second: warm up (JIT) for about 100 ms, then the median of five windows of minMs/5, so
 * one descheduled window on a shared machine does not decide the figure.
 */
function rate(label: string, fn: () => void, minMs = 300): number {
  const window = (ms: number): number => {
    let n = 0;
    const t0 = performance.now();
    let t = t0;
    while (t - t0 < ms) {
      for (let i = 0; i < 20; i++) fn();
      n += 20;
      t = performance.now();
    }
    return (n / (t - t0)) * 1000;
  };
  window(100);
  const rates = Array.from({ length: 5 }, () => window(minMs / 5)).sort((a, b) => a - b);
  const perSec = rates[2]!;
  console.log(`${label.padEnd(58)} ${perSec.toFixed(0).padStart(10)} /s`);
  return perSec;
}

export function run(): void {
  // The first session pays for mathjs's lazily built functions and units; later ones in the same
  // process reuse loaded modules but rebuild their own instance.
  for (const label of ["first session", "second session"]) {
    const t0 = performance.now();
    const s = createSessionWithInternals({ shouldStop: () => false }, [pig]).session;
    const t1 = performance.now();
    s.run("P = 25 bar\nT = 47 degC\nZ = P * 1 L/mol / (8.314462618 J/(mol K) * T)", { stdout() {}, display() {}, clear() {} });
    const t2 = performance.now();
    console.log(`${`${label}: create / first cell with units (ms)`.padEnd(58)} ${(t1 - t0).toFixed(1).padStart(7)} / ${(t2 - t1).toFixed(1)}`);
  }
  const { session, internals } = createSessionWithInternals({ shouldStop: () => false }, [pig]);
  const sink = { stdout() {}, display() {}, clear() {} };
  const withUnits = new Map<string, unknown>();
  const plain = new Map<string, unknown>();
  const setup = (code: string, scope: Map<string, unknown>) => internals.parse(code).compile().evaluate(scope);
  setup("P = 25 bar; V = 0.9 L/mol; R = 8.314462618 J/(mol K); T = 320 K", withUnits);
  setup("P = 25e5; V = 0.9e-3; R = 8.314462618; T = 320", plain);
  const expr = "Z = P * V / (R * T)";
  const cu = internals.parse(expr).compile();
  const cp = internals.parse(expr).compile();
  const ru = rate("compiled `P V/(R T)` with units", () => cu.evaluate(withUnits));
  const rp = rate("compiled `P V/(R T)` on plain SI numbers", () => cp.evaluate(plain));
  console.log(`ratio plain/units: ${(rp / ru).toFixed(1)}x`);

  const cell = "P = 25 bar\nV = 0.9 L/mol\nT = 47 degC\nZ = P * V / (8.314462618 J/(mol K) * T)\nZ";
  const cellPlain = "P = 25e5\nV = 0.9e-3\nT = 320.15\nZ = P * V / (8.314462618 * T)\nZ";
  const rc = rate("Session.run of a 5-line cell with units", () => session.run(cell, sink));
  const rcp = rate("Session.run of the same cell on plain numbers", () => session.run(cellPlain, sink));
  console.log(`ratio plain/units (cell): ${(rcp / rc).toFixed(1)}x`);
  rate("Session.run `T = 47 degC` (offset unit literal)", () => session.run("T = 47 degC", sink));
  rate("Session.run `x = 8.314 J/(mol K) * 300 K;` (hidden)", () => session.run("x = 8.314 J/(mol K) * 300 K;", sink));
  rate("Session.run `x = 8.314 * 300;` (hidden, plain)", () => session.run("x = 8.314 * 300;", sink));
  rate("Session.run of one scalar built-in call with units", () => session.run("bench_pressure(300 K, 1 L/mol)", sink));

  session.run("Ts = span(300 K, 400 K, 1000);\nVm = 1 L/mol;", sink);
  const vec = internals.parse("bench_pressure(Ts, Vm)").compile();
  const fn = internals.math.evaluate as unknown; void fn;
  const pressureFn = (internals.math as unknown as Record<string, (...a: unknown[]) => unknown>).bench_pressure!;
  const Ts = internals.scope.get("Ts") as { toArray(): unknown[] };
  const TUnits = Ts.toArray();
  const Vm = internals.scope.get("Vm");
  const rv = rate("1,000-point span through one vectorised call", () => vec.evaluate(internals.scope), 500);
  const rs = rate("1,000 scalar calls with quantities", () => { for (const T of TUnits) pressureFn(T, Vm); }, 500);
  console.log(`ratio vectorised/scalar: ${(rv / rs).toFixed(1)}x (same 1,000 points)`);
  const big = internals.parse("bench_pressure(span(300 K, 400 K, 10000), Vm)").compile();
  rate("10,000-point span + vectorised call (calls/s)", () => big.evaluate(internals.scope), 500);
}

if (import.meta.url === `file://${process.argv[1]}`) run();
