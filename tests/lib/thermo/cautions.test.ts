import { describe, expect, it } from "vitest";
import {
  cautionsFor, getSubstance, pr, pseudoComponent, pureFluid, requireSaturationP, requireSaturationT, stateCautions,
  triplePointOf, state,
} from "../../../lib/thermo/index.js";

const co2 = pr(pureFluid(getSubstance("CO2")));
const methane = pr(pureFluid(getSubstance("methane")));

describe("triplePointOf", () => {
  it("triplePointOf gives a pure fluid's triple point and nothing for mixtures or unknown data", () => {
    // CO2 triple point 216.592 K, 517.95 kPa (Span & Wagner 1996, from memory).
    expect(triplePointOf(co2)).toEqual({ name: "Carbon dioxide", Tt: 216.592, Pt: 517950 });
    const mix = pr({ components: [getSubstance("methane"), getSubstance("ethane")], x: [0.5, 0.5] });
    expect(triplePointOf(mix)).toBeUndefined();
    const cut = pr(pureFluid(pseudoComponent({ name: "C7+", Tc: 540, Pc: 27e5, omega: 0.35, M: 0.1 })));
    expect(triplePointOf(cut)).toBeUndefined();
  });
});

describe("requireSaturationT", () => {
  it("requireSaturationT rejects psat below the triple point naming T and Tt (CO2 at 200 K sublimes)", () => {
    expect(() => requireSaturationT(co2, 200)).toThrow(/T = 200 K is below the triple point of Carbon dioxide \(Tt = 216\.592 K, Pt = 5\.1795 bar\).*solid.*valid: 216\.592 K <= T < Tc/);
    expect(() => requireSaturationT(co2, 220)).not.toThrow();
  });
});

describe("requireSaturationP", () => {
  it("requireSaturationP rejects tsat below Pt (CO2 at 1 atm sublimes at 194.7 K) and a found T below Tt", () => {
    // CO2 sublimation point at 101325 Pa: 194.7 K (databank note; standard tables).
    expect(() => requireSaturationP(co2, 101325)).toThrow(/P = 1\.01325 bar is below the triple point of Carbon dioxide.*sublimes.*valid: 5\.1795 bar <= P < Pc/);
    expect(() => requireSaturationP(co2, 10e5)).not.toThrow();
    // propane's record has Tt (85.525 K) but no Pt: the found temperature decides.
    const propane = pr(pureFluid(getSubstance("propane")));
    expect(() => requireSaturationP(propane, 1e-5, 80)).toThrow(/would put saturation at 80 K/);
  });
});

describe("stateCautions", () => {
  it("stateCautions flags a liquid below the triple point (QA: state(pr(CO2), 200 K, 10 bar) is an EOS liquid)", () => {
    const s = state(co2, 200, 10e5);
    expect(s.phase).toBe("liquid"); // what the cubic says; the caution says what it is worth
    expect(stateCautions(co2, 200, 10e5, s.phase).join()).toMatch(/below the triple point of Carbon dioxide .*the stable phase is solid; the equation-of-state liquid is an extrapolation/);
    // Above Tt the liquid is real: no caution (CO2 liquid at 250 K, 30 bar: Psat(250 K) = 17.9 bar, from memory).
    expect(stateCautions(co2, 250, 30e5, "liquid")).toEqual([]);
    // A vapour below Tt carries no liquid caution.
    expect(stateCautions(co2, 200, 1e5, "vapor")).toEqual([]);
  });
  it("stateCautions uses the 0.5 Tc rule for a liquid without triple-point data", () => {
    const cut = pr(pureFluid(pseudoComponent({ name: "C7+", Tc: 540, Pc: 27e5, omega: 0.35, M: 0.1 })));
    expect(stateCautions(cut, 260, 1e5, "liquid").join()).toMatch(/T < 0\.5 Tc \(Tc = 540 K\) and no triple-point data/);
    expect(stateCautions(cut, 280, 1e5, "liquid")).toEqual([]);
  });
  it("stateCautions flags P > 10 Pc (QA: methane at 1e6 bar gives Z ~ 1000)", () => {
    // Methane Pc = 45.99 bar (databank, SVNA Table B.1): 10 Pc = 459.9 bar.
    expect(stateCautions(methane, 300, 1e11, "supercritical").join()).toMatch(/P = 100000 MPa is more than 10 Pc \(Pc = 45\.99 bar\): far outside the range where this model is meaningful/);
    expect(stateCautions(methane, 300, 400e5, "supercritical")).toEqual([]);
    expect(cautionsFor(methane)(300, 470e5, "supercritical")).toHaveLength(1);
  });
});
