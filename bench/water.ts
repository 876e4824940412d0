/**
 * IF97 benchmark: states per second forward (T, p) per region, via the backward equations (p, h) and
 * (p, s) with Newton polish, the raw backward equations alone, and the two-phase (p, x) path.
 * Region 3 (T, p) and (p, h) go through a density solve and are reported separately, with the density
 * solve alone by Newton and by the previous grid scan (ratio in one run); (h, s) via Newton on ln p. Measures, never
 * asserts. Run alone: `node dist/bench/water.js`.
 */
import { pathToFileURL } from "node:url";
import { if97State, region1TofPH, region2TofPH, region3Density, stateHS, type IF97Input } from "../lib/thermo/water/index.js";
import { region3DensityByScan } from "../lib/thermo/water/region3.js";

function rate(label: string, inputs: (() => unknown)[], reps: number): number {
  for (const f of inputs) f(); // warm up
  const t0 = performance.now();
  for (let r = 0; r < reps; r++) for (const f of inputs) f();
  const dt = (performance.now() - t0) / 1000;
  const perSec = (reps * inputs.length) / dt;
  console.log(`${label.padEnd(52)} ${Math.round(perSec).toLocaleString("en-US").padStart(12)} /s`);
  return perSec;
}

function states(pairs: IF97Input[]): (() => unknown)[] {
  return pairs.map((inp) => () => if97State(inp));
}

export function run(): void {
  const n = 200;
  const r1: IF97Input[] = [];
  const r2: IF97Input[] = [];
  const r3: IF97Input[] = [];
  const r5: IF97Input[] = [];
  for (let k = 0; k < n; k++) {
    const f = k / n;
    r1.push({ T: 280 + 300 * f, p: 20e6 + 70e6 * f });
    r2.push({ T: 700 + 350 * f, p: 1e4 + 9e6 * f });
    r3.push({ T: 660 + 40 * f, p: 30e6 + 40e6 * f });
    r5.push({ T: 1100 + 1100 * f, p: 1e5 + 40e6 * f });
  }
  const toPH = (xs: IF97Input[]): IF97Input[] => xs.map((x) => { const s = if97State(x); return { p: s.p, h: s.h }; });
  const toPS = (xs: IF97Input[]): IF97Input[] => xs.map((x) => { const s = if97State(x); return { p: s.p, s: s.s }; });
  const fwd1 = rate("forward (T,p) region 1", states(r1), 50);
  rate("forward (T,p) region 2", states(r2), 50);
  rate("forward (T,p) region 5", states(r5), 50);
  rate("forward (T,p) region 3 (density solve)", states(r3), 2);
  const ph1 = rate("(p,h) region 1 via backward T(p,h) + Newton", states(toPH(r1)), 20);
  rate("(p,h) region 2 via backward T(p,h) + Newton", states(toPH(r2)), 20);
  rate("(p,s) region 2 via backward T(p,s) + Newton", states(toPS(r2)), 20);
  rate("(p,h) region 3 (Brent on T, density solve inside)", states(toPH(r3)), 2);
  const raw = rate("raw backward T(p,h), regions 1 and 2 alternating", r1.map((x, k) => () => (k % 2 ? region1TofPH(20e6, 5e5 + k * 1e3) : region2TofPH(5e6, 3e6 + k * 1e3))), 200);
  const dens = rate("region 3 density alone, Newton (region3Density)", r3.map((x) => () => region3Density((x as { p: number }).p, (x as { T: number }).T, "liquid")), 5);
  const scan = rate("region 3 density alone, grid scan + Brent (previous)", r3.map((x) => () => region3DensityByScan((x as { p: number }).p, (x as { T: number }).T, "liquid")), 1);
  const hs2 = r2.map((x) => if97State(x));
  rate("(h,s) region 2 via p(h,s) + Newton on ln p", hs2.map((st) => () => stateHS(st.h, st.s)), 5);
  const hs1 = r1.map((x) => if97State(x));
  rate("(h,s) region 1 via p(h,s) + Newton on ln p", hs1.map((st) => () => stateHS(st.h, st.s)), 5);
  console.log(`region 3 density: Newton / scan = ${(dens / scan).toFixed(1)}x`);
  rate("two-phase (p,x), 0.01-16 MPa", states(Array.from({ length: n }, (_, k) => ({ p: 1e4 + 8e4 * k, x: k / n }))), 20);
  console.log(`ratio (T,p) region 1 / (p,h) region 1: ${(fwd1 / ph1).toFixed(2)}x; raw backward / forward region 1: ${(raw / fwd1).toFixed(1)}x`);
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) run();
