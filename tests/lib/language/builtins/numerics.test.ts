import { describe, expect, it } from "vitest";
import type { Unit } from "mathjs";
import { createSession } from "../../../../lib/language/index.js";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { languageSession } from "../../../support/languageSession.js";
import { probePoint } from "../../../../lib/language/builtins/numerics.js";

const { sink, value, num: si } = languageSession();
const errorOf = (code: string, shouldStop = () => false) => {
  const r = createSession({ shouldStop }).run(code, sink);
  return r.ok ? "" : r.error.evalue;
};
const R = 8.314462618; // J/(mol K), CODATA 2018 (exact)

describe("integrate (built-in)", () => {
  it("integrate(f(x) = x^2, 0, 3) = 9 (antiderivative x^3/3)", () => {
    expect(value("integrate(f(x) = x^2, 0, 3)")).toBeCloseTo(9, 12);
  });
  it("integrate of an ideal-gas V(P) over P gives R T ln(P2/P1) in J/mol (isothermal Gibbs change, textbook)", () => {
    // f returns m^3/mol, x is Pa: result in J/mol. Closed form: R T ln(10).
    const g = si(`integrate(f(P) = ${R} J/(mol K) * 300 K / P, 1 bar, 10 bar)`, "J/mol");
    expect(Math.abs(g / (R * 300 * Math.log(10)) - 1)).toBeLessThan(1e-10);
  });
  it("integrate of a J/mol-valued f over Pa has units J/mol*Pa", () => {
    const v = value("integrate(f(P) = 2 J/mol, 0 Pa, 3 Pa)") as Unit;
    expect(v.toNumber("J Pa / mol")).toBeCloseTo(6, 12);
  });
  it("integrate with an Infinity bound and units: V^-2 from 1 m^3 to Infinity = 1 m^-3 (antiderivative -1/V)", () => {
    const v = value("integrate(f(V) = 1 / V^2, 1 m^3, Infinity)") as Unit;
    expect(v.toNumber("m^-3")).toBeCloseTo(1, 12);
  });
  it("integrate over R of exp(-x^2) = sqrt(pi) (CRC tables, Gaussian integral) with options {rel: 1e-12}", () => {
    expect(value("integrate(f(x) = exp(-x^2), -Infinity, Infinity, {rel: 1e-12})")).toBeCloseTo(Math.sqrt(Math.PI), 13);
  });
  it("integrate with degC bounds integrates over absolute kelvin (1 J/K over 20..30 degC = 10 J)", () => {
    expect(si("integrate(f(T) = 1 J/K, 20 degC, 30 degC)", "J")).toBeCloseTo(10, 10);
  });
  it("integrate errors name the argument", () => {
    expect(errorOf("integrate(f(x) = x, 1 m, 2 s)")).toMatch(/argument b of integrate\(\) must have the same dimension as a/);
    expect(errorOf("integrate(3, 0, 1)")).toMatch(/argument f of integrate\(\)/);
    expect(errorOf("integrate(f(x) = x, 0, 1, {tol: 1})")).toMatch(/unknown key "tol"/);
    expect(errorOf("integrate(f(x) = x, 1 m, 2)")).toMatch(/argument b of integrate\(\) needs a quantity/);
  });
  it("integrate reports where f is not finite", () => {
    expect(errorOf("integrate(f(x) = 1/(x - 0.5) * (x > 0.5 ? 0 : 0) + sqrt(0.5 - x), 0, 1)")).toMatch(/integrate\(\).*x = /);
  });
  it("integrate stops on interrupt", () => {
    expect(errorOf("integrate(f(x) = cos(1000 x), 0, 1)", () => true)).toMatch(/interrupt/);
  });
});

describe("probePoint", () => {
  it("probePoint lies strictly inside the range for every order and sign of the bounds", () => {
    const cases: [number, number][] = [
      [1, 3], [3, 1], [-2, 5], [0, Infinity], [Infinity, 0], [1e-4, Infinity], [Infinity, 1e-4], [-4, Infinity],
      [Infinity, -4], [-Infinity, 4], [4, -Infinity], [-Infinity, -1e-4], [-1e-4, -Infinity], [-Infinity, 1e-9],
    ];
    for (const [a, b] of cases) {
      const p = probePoint(a, b);
      expect(p > Math.min(a, b) && p < Math.max(a, b), `${a}, ${b} -> ${p}`).toBe(true);
    }
    expect(probePoint(-Infinity, Infinity)).toBe(0);
  });
  it("probePoint keeps the sign of a finite bound next to an infinite one (never crosses zero)", () => {
    expect(probePoint(Infinity, 4.49e-4)).toBeCloseTo(8.98e-4, 15); // away from zero: b + |b|
    expect(probePoint(-4, Infinity)).toBe(-2); // towards zero: half way
    expect(probePoint(4, -Infinity)).toBe(2);
    expect(probePoint(-Infinity, -1e-4)).toBe(-2e-4);
  });
});

describe("integrate with an infinite lower bound and a small upper bound", () => {
  it("integrate(f(v) = internal_pressure(m, T, v), Infinity, V) for van der Waals gives U^R = -a/V", () => {
    // van der Waals: (dU/dV)_T = a/V^2, so U^R = integral from infinity to V of a/v^2 dv = -a/V with
    // a = 27 R^2 Tc^2 / (64 Pc) (Smith, Van Ness & Abbott 7th ed., Table 3.1 and eq. 6.40, from memory).
    // Before the fix f was probed at V - 1 m^3/mol (negative volume) and the call failed.
    const { session: s, internals: inner } = createSessionWithInternals({ shouldStop: () => false });
    const r = s.run('m = vdw("methane"); V = volume(m, 300 K, 50 bar); u = integrate(f(v) = internal_pressure(m, 300 K, v), Infinity, V); Tc = m.Tc; Pc = m.Pc;', sink);
    expect(r.ok ? "" : r.error.evalue).toBe("");
    const num = (n: string, unit: string) => (inner.scope.get(n) as Unit).toNumber(unit);
    const a = (27 * R ** 2 * num("Tc", "K") ** 2) / (64 * num("Pc", "Pa"));
    expect(Math.abs(num("u", "J/mol") / (-a / num("V", "m^3/mol")) - 1)).toBeLessThan(1e-8);
  });
});

describe("seek (built-in)", () => {
  it("seek(f(x) = x^2 - 2, 0, 2) = sqrt(2)", () => {
    expect(value("seek(f(x) = x^2 - 2, 0, 2)")).toBeCloseTo(Math.SQRT2, 14);
  });
  it("seek keeps units: the ideal-gas volume where R T / V = 1 bar at 300 K is R T / P (PV = RT)", () => {
    const v = si(`seek(f(V) = ${R} J/(mol K) * 300 K / V - 1 bar, 1e-3 m^3/mol, 1 m^3/mol)`, "m^3/mol");
    expect(Math.abs(v / ((R * 300) / 1e5) - 1)).toBeLessThan(1e-12);
  });
  it("seek returns the result in the unit of lo (degC in, degC out)", () => {
    const t = value("seek(f(T) = T - 300 K, 0 degC, 100 degC)") as Unit;
    expect(t.formatUnits()).toBe("degC");
    expect(t.toNumber("K")).toBeCloseTo(300, 10);
  });
  it("seek with {expand: true} finds ln(1e6)", () => {
    expect(value("seek(f(x) = exp(x) - 1e6, 0, 1, {expand: true})")).toBeCloseTo(Math.log(1e6), 12);
  });
  it("seek without a sign change says so", () => {
    expect(errorOf("seek(f(x) = x^2 + 1, -1, 1)")).toMatch(/same sign/);
  });
  it("seek without a sign change shows f and the bracket in the user's units, not SI numbers", () => {
    // f(1 bar) = 1 bar - 0.5 bar = 0.5 bar; f(2 bar) = 1.5 bar (arithmetic).
    expect(errorOf("seek(f(p) = p - 0.5 bar, 1 bar, 2 bar)")).toMatch(/^seek\(\): f\(lo\) = 0\.5 bar at lo = 1 bar and f\(hi\) = 1\.5 bar at hi = 2 bar have the same sign/);
    expect(errorOf("seek(f(T) = T - 100 degC, 0 degC, 50 degC)")).toMatch(/at lo = 0 degC .* at hi = 50 degC/);
  });
  it("seek across a pole says there is a pole, not a convergence failure", () => {
    // 1/x changes sign at x = 0 through infinity (calculus); tan has a pole at pi/2 = 1.5708.
    expect(errorOf("seek(f(x) = 1/x, -1, 1)")).toMatch(/^seek\(\): f changes sign near x = 0 without crossing zero; \|f\| grows without bound there .*a pole/);
    expect(errorOf("seek(f(x) = tan(x), 1, 2)")).toMatch(/near x = 1\.5708 .*a pole/);
    expect(errorOf("seek(f(T) = 1 K/(T - 300 K), 250 K, 350 K)")).toMatch(/near x = 300 K .*a pole/);
  });
  it("seek across a step says there is a discontinuity", () => {
    expect(errorOf("seek(f(x) = (x > 0.5) - 0.5, -1, 2)")).toMatch(/near x = 0\.5 without crossing zero; f jumps there .*discontinuity/);
  });
  it("seek still finds steep and tiny roots (a root is not mistaken for a pole)", () => {
    expect(value("seek(f(x) = 1e12*(x - 1), 0, 3)")).toBeCloseTo(1, 12);
    expect(value("seek(f(x) = x^3 - 1e-30, -1, 1)")).toBeCloseTo(1e-10, 20); // cube root of 1e-30
  });
});

describe("slope (built-in)", () => {
  it("slope(f(x) = x^3, 2) = 12 (calculus)", () => {
    expect(value("slope(f(x) = x^3, 2)")).toBeCloseTo(12, 9);
  });
  it("slope of R T / P at 1 bar is -R T / P^2 in m^3/(mol Pa) (ideal gas, calculus)", () => {
    const d = si(`slope(f(P) = ${R} J/(mol K) * 300 K / P, 1 bar)`, "m^3/(mol Pa)");
    expect(Math.abs(d / (-(R * 300) / 1e10) - 1)).toBeLessThan(1e-9);
  });
  it("slope with {order: 2} gives the second derivative with units over x^2", () => {
    const d = si("slope(f(t) = 5 m/s^2 * t^2 / 2, 3 s, {order: 2})", "m/s^2");
    expect(d).toBeCloseTo(5, 7);
  });
  it("slope names a bad x", () => {
    expect(errorOf('slope(f(x) = x, "a")')).toMatch(/argument x of slope\(\) needs a number or a quantity/);
  });
});
