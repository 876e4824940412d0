/**
 * installOffsetConversion: a compound value converted into an offset unit gets the offset applied.
 * Reference values: ideal-gas temperature T = P V / (n R) with R = 8.314462618 J/(mol K) (CODATA
 * 2018, exact), computed with python3 (100e5 * 1 / (8.314462618 * 3000) = 400.90785014980906 K);
 * 0 degC = 273.15 K and degF = K * 9/5 - 459.67 (NIST SP 811, B.8); 1 atm = 101325 Pa (exact).
 */
import type { MathJsInstance, Unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installOffsetConversion } from "../../../lib/units/index.js";

const T_K = 400.90785014980906; // python3: 100e5 * 1 / (8.314462618 * 3000)
const IDEAL_T = "100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol)";

describe("installOffsetConversion", () => {
  const math = mathWithUnits();
  const ev = (e: string) => math.evaluate(e) as Unit;

  it("installOffsetConversion: a compound temperature to degC subtracts 273.15 K", () => {
    expect(ev(IDEAL_T).toNumber("degC")).toBeCloseTo(T_K - 273.15, 9); // 127.757850... degC
    expect(ev(`${IDEAL_T} to degC`).toNumber("K")).toBeCloseTo(T_K, 9); // round trip back to kelvin
    expect(ev(`${IDEAL_T} in degF`).toNumber("degF")).toBeCloseTo(T_K * 1.8 - 459.67, 9); // 261.964 degF
    expect(ev(`${IDEAL_T} to K`).toNumber("K")).toBeCloseTo(T_K, 9); // no offset target: unchanged
  });
  it("installOffsetConversion: a compound pressure to gauge units subtracts 1 atm", () => {
    // 1e6 Pa - 101325 Pa = 898675 Pa gauge.
    expect(ev("1e6 N / (1 m^2) to barg").toNumber("barg")).toBeCloseTo(8.98675, 10);
    expect(ev("1e6 N / (1 m^2) to kPag").toNumber("kPag")).toBeCloseTo(898.675, 9);
    expect(ev("1e6 N / (1 m^2) to MPag").toNumber("MPag")).toBeCloseTo(0.898675, 12);
    // psi = 6894.757293168361 Pa (lbf 4.4482216152605 N / (0.0254 m)^2, NIST SP 811 B.8): 130.3418 psig.
    expect(ev("1e6 N / (1 m^2) to psig").toNumber("psig")).toBeCloseTo(898675 / 6894.757293168361, 9);
    expect(ev("(1e6 N / (1 m^2)) to psig").toNumber("Pa")).toBeCloseTo(1e6, 6); // back to absolute
  });
  it("installOffsetConversion: a temperature raised to power 1 by arithmetic converts like kelvin", () => {
    expect(ev("(2 K * 3 K / (1 K)) to degC").toNumber("degC")).toBeCloseTo(6 - 273.15, 12);
    expect(ev("sqrt(90000 K^2) to degC").toNumber("degC")).toBeCloseTo(300 - 273.15, 9);
  });
  it("installOffsetConversion leaves mathjs's own single-unit conversions as they were", () => {
    expect(ev("298.15 K to degC").toNumber("degC")).toBeCloseTo(25, 12); // ITS-90: 0 degC = 273.15 K
    expect(ev("25 degC to degF").toNumber("degF")).toBeCloseTo(77, 12);
    expect(ev("5 barg to psig").toNumber("Pa")).toBeCloseTo(601325, 6);
    expect(ev("1 bar to kPa").toNumber("kPa")).toBe(100);
    expect(ev("4.184 J/(g degC)").toNumber("J/(g K)")).toBeCloseTo(4.184, 12); // per-degree: a difference
  });
  it("installOffsetConversion: toNumber in an offset unit, and arrays, use the same rule", () => {
    const v = ev(`[${IDEAL_T}, 1000 Pa * 1 m^3 / (8.314462618 J/(mol K) * 1 mol)] to degC`) as unknown as { toArray(): Unit[] };
    const [a, b] = v.toArray();
    expect(a!.toNumber("degC")).toBeCloseTo(T_K - 273.15, 9);
    expect(b!.toNumber("degC")).toBeCloseTo(1000 / 8.314462618 - 273.15, 9); // 120.272 K
  });
  it("installOffsetConversion is idempotent and does not change another instance", () => {
    const math2 = mathWithUnits();
    installOffsetConversion(math2);
    expect((math2.evaluate(IDEAL_T) as Unit).toNumber("degC")).toBeCloseTo(T_K - 273.15, 9);
    const m = loadMathjs();
    const bare = m.create(m.all, {}) as unknown as MathJsInstance;
    // mathjs 15 without the fix keeps the kelvin number (the bug this file guards against).
    expect((bare.evaluate(IDEAL_T) as Unit).toNumber("degC")).toBeCloseTo(T_K, 9);
  });
});
