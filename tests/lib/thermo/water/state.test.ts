import { spawnSync } from "node:child_process";
import { describe, expect, it } from "vitest";
import { if97State, saturatedPX, saturatedTX } from "../../../../lib/thermo/water/state.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";

/** Deterministic pseudo-random numbers (LCG, Numerical Recipes constants) so the grid is reproducible. */
function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 4294967296;
  };
}

/**
 * Reference library: Debian's python3-iapws (IAPWS97 class), run through /usr/bin/python3.
 * Input rows are [T K, p MPa]; output rows are [region, v, h kJ/kg, s kJ/(kg K), cp, w].
 */
function iapwsReference(rows: number[][]): number[][] {
  const code = [
    "import json, sys",
    "from iapws import IAPWS97",
    "out = []",
    "for T, P in json.load(sys.stdin):",
    "    st = IAPWS97(T=T, P=P)",
    "    out.append([st.region, st.v, st.h, st.s, st.cp, st.w])",
    "print(json.dumps(out))",
  ].join("\n");
  const r = spawnSync("/usr/bin/python3", ["-c", code], { input: JSON.stringify(rows), encoding: "utf8" });
  if (r.status !== 0) throw new Error(`python3-iapws reference failed (apt-get install python3-iapws): ${r.stderr}`);
  return JSON.parse(r.stdout) as number[][];
}

describe("if97State({T, p}) against python3-iapws (reference library)", () => {
  it("if97State agrees with python3-iapws on 300 random states across regions 1, 2, 3 and 5", () => {
    const rand = rng(20240611);
    const rows: number[][] = [];
    while (rows.length < 300) {
      const T = 273.15 + rand() * 2000;
      const pMax = T > 1073.15 ? 50 : 100;
      const p = Math.exp(Math.log(0.001) + rand() * (Math.log(pMax) - Math.log(0.001))); // MPa, log-uniform
      rows.push([T, p]);
    }
    const ref = iapwsReference(rows);
    const regions = new Set<number>();
    rows.forEach(([T, p], k) => {
      const st = if97State({ T: T as number, p: (p as number) * 1e6 });
      const [region, v, h, s, cp, w] = ref[k] as number[];
      regions.add(st.region);
      expect(st.region, `T=${T} p=${p}`).toBe(region);
      // Same equations, so agreement is to round-off; 1e-9 relative leaves room for the region 3
      // density solve (python3-iapws solves it its own way).
      const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
      expect(rel(st.v, v as number), `v at T=${T} p=${p}`).toBeLessThan(1e-8);
      expect(rel(st.h / 1e3, h as number), `h at T=${T} p=${p}`).toBeLessThan(1e-8);
      expect(rel(st.s / 1e3, s as number), `s at T=${T} p=${p}`).toBeLessThan(1e-8);
      expect(rel(st.cp / 1e3, cp as number), `cp at T=${T} p=${p}`).toBeLessThan(1e-6);
      expect(rel(st.w, w as number), `w at T=${T} p=${p}`).toBeLessThan(1e-7);
    });
    expect([...regions].sort()).toEqual([1, 2, 3, 5]);
  });
});

/**
 * python3-iapws for a given input pair: rows [P MPa, y] with y = h kJ/kg, s kJ/(kg K), or [h, s] for
 * "hs"; output rows [region, T, P, v, h, s, x].
 */
function iapwsPair(pair: "Ph" | "Ps" | "hs", rows: number[][]): number[][] {
  const call = pair === "Ph" ? "IAPWS97(P=a, h=b)" : pair === "Ps" ? "IAPWS97(P=a, s=b)" : "IAPWS97(h=a, s=b)";
  const code = [
    "import json, sys",
    "from iapws import IAPWS97",
    "out = []",
    "import warnings; warnings.simplefilter('ignore')",
    "for a, b in json.load(sys.stdin):",
    "    try:",
    `        st = ${call}`,
    "        out.append([st.region, st.T, st.P, st.v, st.h, st.s, st.x])",
    "    except Exception:",
    "        out.append(None)  # outside what the library solves for this pair",
    "print(json.dumps(out))",
  ].join("\n");
  const r = spawnSync("/usr/bin/python3", ["-c", code], { input: JSON.stringify(rows), encoding: "utf8" });
  if (r.status !== 0) throw new Error(`python3-iapws reference failed (apt-get install python3-iapws): ${r.stderr}`);
  return JSON.parse(r.stdout) as (number[] | null)[] as number[][];
}

/** Random states (single-phase in regions 1, 2, 3, 5 and wet steam) made by this library from (T, p) or (p, x). */
function randomStates(seed: number, count: number) {
  const rand = rng(seed);
  const out = [];
  while (out.length < count) {
    if (out.length % 5 === 4) {
      // Wet steam, 1 kPa .. 16.5 MPa. Above 16.53 MPa python3-iapws 1.5 does not find the dome from (P, h):
      // at 17.85 MPa, h of x = 0.949 it returns a vapour at T = 627.89 K, below Tsat = 629.44 K (checked by
      // hand), so wet states there are tested against IF97 itself (saturatedPX round trips), not the library.
      out.push(if97State({ p: 1e3 + rand() * 16.5e6, x: rand() }));
      continue;
    }
    const T = 273.15 + rand() * 2000;
    const pMax = T > 1073.15 ? 50 : 100;
    const p = Math.exp(Math.log(0.001) + rand() * (Math.log(pMax) - Math.log(0.001))) * 1e6;
    out.push(if97State({ T, p }));
  }
  return out;
}

describe("if97State({p, h}), ({p, s}) and ({h, s}) against python3-iapws (reference library)", () => {
  // python3-iapws solves these pairs from its own backward equations refined by its own iteration, so
  // agreement is to the iteration tolerances, not round-off: T to 1e-6 K, v to 1e-7 relative (1e-5 in
  // region 3, where its solver stops earlier), x to 1e-7; its (h, s) iteration is looser (1e-5 K, 1e-6).
  const states = randomStates(20250101, 120);
  const check = (pair: "Ph" | "Ps" | "hs", ours: (st: (typeof states)[number]) => ReturnType<typeof if97State>) => {
    const rows = states.map((st) => pair === "Ph" ? [st.p / 1e6, st.h / 1e3] : pair === "Ps" ? [st.p / 1e6, st.s / 1e3] : [st.h / 1e3, st.s / 1e3]);
    const ref = iapwsPair(pair, rows);
    const regions = new Set<number>();
    let compared = 0;
    states.forEach((st, k) => {
      if (ref[k] === null) return;
      // python3-iapws's (h, s) route has no region 5: at 2098 K, 14.3 MPa it answers "region 2"; skip those.
      if (pair === "hs" && st.region === 5) return;
      compared++;
      const got = ours(st);
      const [region, T, , v, , , x] = ref[k] as number[];
      const where = `${pair} at T=${st.T} p=${st.p} x=${st.x}`;
      regions.add(got.region);
      expect(got.region, where).toBe(region);
      expect(Math.abs(got.T - (T as number)), `T ${where}`).toBeLessThan(pair === "hs" ? 1e-5 : 1e-6);
      expect(Math.abs(got.v / (v as number) - 1), `v ${where}`).toBeLessThan(got.region === 3 ? 1e-5 : pair === "hs" ? 1e-6 : 1e-7);
      if (got.region === 4) expect(Math.abs(got.x - (x as number)), `x ${where}`).toBeLessThan(1e-7);
    });
    // (P, h) and (P, s) cover all of IF97 in python3-iapws; its (h, s) follows the supplementary releases
    // (regions 1 to 4 within their ranges, no region 5), so fewer rows compare there.
    expect(compared, pair).toBeGreaterThanOrEqual(pair === "hs" ? 60 : 120);
    if (pair === "hs") expect([1, 2, 4].every((r) => regions.has(r)), `${pair} regions ${[...regions]}`).toBe(true);
    else expect([...regions].sort(), pair).toEqual([1, 2, 3, 4, 5]);
  };
  it("if97State({p, h}) agrees with python3-iapws IAPWS97(P, h) on 120 random states in regions 1-5", () => {
    check("Ph", (st) => if97State({ p: st.p, h: st.h }));
  });
  it("if97State({p, s}) agrees with python3-iapws IAPWS97(P, s) on 120 random states in regions 1-5", () => {
    check("Ps", (st) => if97State({ p: st.p, s: st.s }));
  });
  it("if97State({h, s}) agrees with python3-iapws IAPWS97(h, s) on 120 random states in regions 1-5", () => {
    check("hs", (st) => if97State({ h: st.h, s: st.s }));
  });
});

describe("if97State input pairs", () => {
  it("if97State({p, h}) and ({p, s}) return the state that ({T, p}) produced, in every region", () => {
    const cases: [number, number][] = [[300, 1e6], [500, 50e6], [700, 30e6], [650, 25e6], [640, 21e6], [800, 1e5], [1500, 20e6]];
    for (const [T, p] of cases) {
      const ref = if97State({ T, p });
      const viaH = if97State({ p, h: ref.h });
      const viaS = if97State({ p, s: ref.s });
      expect(Math.abs(viaH.T - T), `T from (p,h) at ${T} K, ${p} Pa`).toBeLessThan(1e-6);
      expect(Math.abs(viaS.T - T), `T from (p,s) at ${T} K, ${p} Pa`).toBeLessThan(1e-6);
      expect(viaH.region).toBe(ref.region);
    }
  });
  it("if97State({T, x}) at 100 degC, x = 0.5 averages the saturated liquid and vapour", () => {
    // Steam-table facts (from memory): at 373.15 K, h' = 419.1 kJ/kg, h'' = 2675.6 kJ/kg, ps = 101.42 kPa.
    const st = if97State({ T: 373.15, x: 0.5 });
    expect(st.p / 1e3).toBeCloseTo(101.42, 1);
    expect(st.h / 1e3).toBeCloseTo((419.1 + 2675.6) / 2, 0);
    expect(st.phase).toBe("two-phase");
    expect(Number.isNaN(st.cp)).toBe(true);
  });
  it("if97State({p, x}) with x = 0 and 1 gives the saturated phases, with cp and w", () => {
    const liq = saturatedPX(1e6, 0);
    const vap = saturatedPX(1e6, 1);
    expect(liq.T).toBeCloseTo(453.035632, 5); // IF97 Table 36, p = 1 MPa (from memory)
    expect(liq.phase).toBe("liquid");
    expect(vap.phase).toBe("vapor");
    expect(vap.h - liq.h).toBeGreaterThan(1.9e6); // latent heat at 1 MPa ~ 2015 kJ/kg (steam tables, from memory)
    expect(Number.isFinite(liq.cp) && Number.isFinite(vap.w)).toBe(true);
  });
  it("if97State({p, h}) inside the dome returns the quality that made it", () => {
    for (const [p, x] of [[0.01e6, 0.9], [1e6, 0.25], [18e6, 0.6], [21.5e6, 0.4]] as const) {
      const wet = saturatedPX(p, x);
      const back = if97State({ p, h: wet.h });
      expect(back.x).toBeCloseTo(x, 9);
      expect(back.region).toBe(4);
      expect(if97State({ p, s: wet.s }).x).toBeCloseTo(x, 9);
    }
  });
  it("saturatedTX in region 3 (above 623.15 K) gives a liquid denser than its vapour", () => {
    const liq = saturatedTX(640, 0);
    const vap = saturatedTX(640, 1);
    expect(liq.rho).toBeGreaterThan(vap.rho);
    expect(liq.p).toBeCloseTo(vap.p, 3);
  });
});

describe("if97State errors", () => {
  const argOf = (f: () => unknown): string => {
    try {
      f();
    } catch (e) {
      expect(e).toBeInstanceOf(ThermoError);
      return `${(e as ThermoError).argument}: ${(e as Error).message}`;
    }
    throw new Error("expected a ThermoError");
  };
  it("if97State names T and the IF97 range for T beyond 2273.15 K", () => {
    expect(argOf(() => if97State({ T: 2500, p: 1e6 }))).toMatch(/^T: .*1073\.15 K < T <= 2273\.15 K/);
  });
  it("if97State names p for p above 50 MPa in region 5 and above 100 MPa elsewhere", () => {
    expect(argOf(() => if97State({ T: 1500, p: 60e6 }))).toMatch(/^p: .*50 MPa/);
    expect(argOf(() => if97State({ T: 400, p: 120e6 }))).toMatch(/^p: .*100 MPa/);
  });
  it("if97State names x when the quality is outside 0..1", () => {
    expect(argOf(() => if97State({ T: 400, x: 1.5 }))).toMatch(/^x: .*0\.\.1/);
  });
  it("if97State names h when the enthalpy is below the 273.15 K value", () => {
    expect(argOf(() => if97State({ p: 1e6, h: -1e5 }))).toMatch(/^h: /);
  });
  it("if97State rejects an unsupported pair and lists the accepted ones", () => {
    expect(argOf(() => if97State({ T: 400, h: 1e5 } as never))).toMatch(/\{T, p\}, \{p, h\}/);
  });
  it("if97State rejects non-numbers naming the argument", () => {
    expect(argOf(() => if97State({ T: Number.NaN, p: 1e5 }))).toMatch(/^T: /);
  });
});
