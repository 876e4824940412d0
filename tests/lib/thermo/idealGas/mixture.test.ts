import { describe, expect, it } from "vitest";
import { R } from "../../../../lib/thermo/constants.js";
import { cp } from "../../../../lib/thermo/idealGas/cp.js";
import { checkFractions, idealMixingEntropy, mixtureCp, mixtureIdealGasTotals } from "../../../../lib/thermo/idealGas/mixture.js";
import { idealGasTotals } from "../../../../lib/thermo/idealGas/reference.js";
import { getSubstance } from "../../../../lib/thermo/substances/databank.js";

const c1 = getSubstance("methane");
const c2 = getSubstance("ethane");

describe("idealMixingEntropy", () => {
  it("idealMixingEntropy of an equimolar binary is R ln 2 (Gibbs's theorem)", () => {
    expect(idealMixingEntropy([0.5, 0.5])).toBeCloseTo(R * Math.log(2), 14);
    expect(idealMixingEntropy([1, 0])).toBe(0); // x ln x -> 0 as x -> 0
  });
});

describe("mixtureCp", () => {
  it("mixtureCp is the mole-fraction average", () => {
    expect(mixtureCp([c1, c2], [0.9, 0.1], 400)).toBeCloseTo(0.9 * cp(c1, 400) + 0.1 * cp(c2, 400), 12);
  });
});

describe("mixtureIdealGasTotals", () => {
  it("mixtureIdealGasTotals adds component totals and the mixing entropy", () => {
    const m = mixtureIdealGasTotals([c1, c2], [0.7, 0.3], 500, 2e6);
    const a = idealGasTotals(c1, 500, 2e6);
    const b = idealGasTotals(c2, 500, 2e6);
    expect(m.H).toBeCloseTo(0.7 * a.H + 0.3 * b.H, 8);
    expect(m.S).toBeCloseTo(0.7 * a.S + 0.3 * b.S + idealMixingEntropy([0.7, 0.3]), 10);
    expect(m.G).toBeCloseTo(m.H - 500 * m.S, 6);
  });
});

describe("checkFractions", () => {
  it("checkFractions names the bad fraction", () => {
    expect(() => checkFractions([c1, c2], [0.5, 0.6])).toThrow(/sum to 1; they sum to 1.1/);
    expect(() => checkFractions([c1, c2], [1.1, -0.1])).toThrow(/Ethane must be a number >= 0/);
    expect(() => checkFractions([c1, c2], [1])).toThrow(/one mole fraction per component \(2\)/);
  });
});
