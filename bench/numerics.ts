/**
 * Numerics benchmark: function evaluations needed for 1e-10 relative accuracy, side by side with
 * scipy.integrate.quad (QUADPACK, run by Debian's /usr/bin/python3 with python3-scipy in the same run),
 * and cubic-root solves per second. Prints a table; `run()` also returns the rows.
 *
 *   npm run bench            (aggregated by bench/index.ts)
 *   npm run build && node dist/bench/numerics.js
 */
import { execFileSync } from "node:child_process";
import { pathToFileURL } from "node:url";
import { cubicRoots, integrate } from "../lib/numerics/index.js";

interface Case {
  name: string;
  f: (x: number) => number;
  py: string;
  a: number;
  b: number;
  /** Closed form (comment gives the source). */
  exact: number;
}
const inf = Infinity;
const CASES: Case[] = [
  // arctan antiderivative: 100 (atan(70) + atan(30))
  { name: "peak 1/((x-.3)^2+1e-4) [0,1]", f: (x) => 1 / ((x - 0.3) ** 2 + 1e-4), py: "1/((x-0.3)**2+1e-4)", a: 0, b: 1, exact: 100 * (Math.atan(70) + Math.atan(30)) },
  { name: "x^-0.5 [0,1]", f: (x) => x ** -0.5, py: "x**-0.5", a: 0, b: 1, exact: 2 },
  { name: "log(x) [0,1]", f: Math.log, py: "np.log(x)", a: 0, b: 1, exact: -1 },
  { name: "x^-0.9 [0,1]", f: (x) => x ** -0.9, py: "x**-0.9", a: 0, b: 1, exact: 10 },
  { name: "cos(100x) [0,1]", f: (x) => Math.cos(100 * x), py: "np.cos(100*x)", a: 0, b: 1, exact: Math.sin(100) / 100 },
  // Si(100), Abramowitz & Stegun table 5.2 style value (from memory): 1.5622254668890563
  { name: "sin(x)/x [1e-300,100]", f: (x) => Math.sin(x) / x, py: "np.sin(x)/x", a: 1e-300, b: 100, exact: 1.5622254668890563 },
  { name: "exp(-x^2) R", f: (x) => Math.exp(-x * x), py: "np.exp(-x*x)", a: -inf, b: inf, exact: Math.sqrt(Math.PI) },
  { name: "1/(1+x^2) [0,inf)", f: (x) => 1 / (1 + x * x), py: "1/(1+x*x)", a: 0, b: inf, exact: Math.PI / 2 },
  { name: "x^-1.5 [1,inf)", f: (x) => x ** -1.5, py: "x**-1.5", a: 1, b: inf, exact: 2 },
  { name: "V^-2 [1e-4,inf)", f: (v) => 1 / (v * v), py: "1/(x*x)", a: 1e-4, b: inf, exact: 1e4 },
  { name: "exp(x) [0,1]", f: Math.exp, py: "np.exp(x)", a: 0, b: 1, exact: Math.E - 1 },
  // int_0^1 x^(a-1) ln x dx = -1/a^2 with a = 1/2 (derivative of 1/a in a)
  { name: "log(x)/sqrt(x) [0,1]", f: (x) => Math.log(x) / Math.sqrt(x), py: "np.log(x)/np.sqrt(x)", a: 0, b: 1, exact: -4 },
  // Beta(1/2, 1/2) = pi (Abramowitz & Stegun 6.2.1, from memory): singular at both ends
  { name: "1/sqrt(x(1-x)) [0,1]", f: (x) => 1 / Math.sqrt(x * (1 - x)), py: "1/np.sqrt(x*(1-x))", a: 0, b: 1, exact: Math.PI },
  // Gamma(3) = 2
  { name: "x^2 e^-x [0,inf)", f: (x) => x * x * Math.exp(-x), py: "x*x*np.exp(-x)", a: 0, b: inf, exact: 2 },
  // antiderivative e^x
  { name: "exp(x) (-inf,0]", f: Math.exp, py: "np.exp(x)", a: -inf, b: 0, exact: 1 },
];

export interface IntegralRow {
  name: string;
  ours: number;
  oursRelError: number;
  quad: number;
  quadRelError: number;
}

function pyNum(x: number): string {
  return x === inf ? "np.inf" : x === -inf ? "-np.inf" : String(x);
}

function scipyQuad(): { value: number; neval: number }[] {
  const calls = CASES.map((c) => `quad(lambda x: ${c.py}, ${pyNum(c.a)}, ${pyNum(c.b)}, epsabs=0, epsrel=1e-10, limit=1000, full_output=1)`);
  const script = `import json, numpy as np\nfrom scipy.integrate import quad\nrs=[${calls.join(", ")}]\nprint(json.dumps([{'value': r[0], 'neval': r[2]['neval']} for r in rs]))`;
  return JSON.parse(execFileSync("/usr/bin/python3", ["-c", script], { encoding: "utf8" })) as { value: number; neval: number }[];
}

export function integralRows(): IntegralRow[] {
  const quad = scipyQuad();
  return CASES.map((c, i) => {
    let ours = -1;
    let oursRelError = NaN;
    try {
      const r = integrate(c.f, c.a, c.b, { rel: 1e-10 });
      ours = r.evaluations;
      oursRelError = Math.abs(r.value - c.exact) / Math.abs(c.exact);
    } catch {
      ours = -1;
    }
    return { name: c.name, ours, oursRelError, quad: quad[i]!.neval, quadRelError: Math.abs(quad[i]!.value - c.exact) / Math.abs(c.exact) };
  });
}

/** Cubic solves per second over a spread of cubic-EOS-like Z polynomials (1, 2 and 3 real roots). */
export function cubicRate(seconds = 1): number {
  const coeffs: number[] = [];
  for (let k = 0; k < 1000; k++) {
    const B = 0.001 + 0.2 * ((k * 7919) % 1000) / 1000;
    const A = 0.01 + 2 * ((k * 104729) % 1000) / 1000;
    // Peng-Robinson in Z: Z^3 - (1 - B) Z^2 + (A - 3B^2 - 2B) Z - (AB - B^2 - B^3) = 0
    coeffs.push(-(1 - B), A - 3 * B * B - 2 * B, -(A * B - B * B - B * B * B));
  }
  let solves = 0;
  let sink = 0;
  const start = performance.now();
  let elapsed = 0;
  while (elapsed < seconds * 1000) {
    for (let i = 0; i < coeffs.length; i += 3) {
      sink += cubicRoots(coeffs[i]!, coeffs[i + 1]!, coeffs[i + 2]!)[0]!;
    }
    solves += coeffs.length / 3;
    elapsed = performance.now() - start;
  }
  if (Number.isNaN(sink)) throw new Error("cubicRoots produced NaN in the benchmark");
  return solves / (elapsed / 1000);
}

export function run(): { integrals: IntegralRow[]; cubicPerSecond: number } {
  const integrals = integralRows();
  console.log("numerics: evaluations for rel = 1e-10 (ours: integrate; quad: scipy.integrate.quad epsrel=1e-10)");
  console.log("case".padEnd(30) + "ours".padStart(7) + "  rel.err".padEnd(11) + "quad".padStart(7) + "  rel.err".padEnd(11) + " ours/quad");
  for (const r of integrals) {
    const ours = r.ours < 0 ? "FAIL" : String(r.ours);
    console.log(
      r.name.padEnd(30) + ours.padStart(7) + "  " + r.oursRelError.toExponential(1).padEnd(9) + String(r.quad).padStart(7) + "  " +
        r.quadRelError.toExponential(1).padEnd(9) + " " + (r.ours < 0 ? "-" : (r.ours / r.quad).toFixed(2)),
    );
  }
  const cubicPerSecond = cubicRate();
  console.log(`numerics: cubicRoots ${(cubicPerSecond / 1e6).toFixed(2)} million solves/s (target >= 1)`);
  return { integrals, cubicPerSecond };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) run();
