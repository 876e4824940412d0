import { describe, expect, it } from "vitest";
import { checkTP, mixture, phaseOf, regionOfTP, saturatedPair, stateTP } from "../../../../lib/thermo/water/regions.js";
import { ThermoError } from "../../../../lib/thermo/errors.js";

describe("regionOfTP", () => {
  it("regionOfTP places the verification-table states in their regions (IF97 Tables 5, 15, 33, 42)", () => {
    expect(regionOfTP(300, 3e6)).toBe(1);
    expect(regionOfTP(500, 3e6)).toBe(1);
    expect(regionOfTP(300, 3.5e3)).toBe(2);
    expect(regionOfTP(700, 30e6)).toBe(2); // below B23 at 700 K (pB23(700 K) = 35.0 MPa)
    expect(regionOfTP(650, 25.5837018e6)).toBe(3);
    expect(regionOfTP(1500, 0.5e6)).toBe(5);
  });
  it("regionOfTP splits regions 1 and 2 at the saturation pressure", () => {
    expect(regionOfTP(373.15, 101.5e3)).toBe(1); // ps(373.15 K) = 101.418 kPa (IF97 Eq. 30)
    expect(regionOfTP(373.15, 101.3e3)).toBe(2);
  });
});

describe("checkTP", () => {
  it("checkTP names T below 273.15 K and p at or below zero", () => {
    expect(() => checkTP(250, 1e5)).toThrow(ThermoError);
    expect(() => checkTP(300, 0)).toThrow(/p must be a finite pressure > 0/);
  });
});

describe("stateTP", () => {
  it("stateTP labels supercritical, liquid and vapour states", () => {
    expect(stateTP(700, 25e6).phase).toBe("supercritical");
    expect(stateTP(300, 1e5).phase).toBe("liquid");
    expect(stateTP(640, 19e6).phase).toBe("vapor"); // region 3, below ps(640 K) = 20.2 MPa
    expect(stateTP(640, 21e6).phase).toBe("liquid");
  });
});

describe("saturatedPair / mixture / phaseOf", () => {
  it("saturatedPair at 100 degC gives h' = 419.1 and h'' = 2675.6 kJ/kg (steam tables, from memory)", () => {
    const { liquid, vapor } = saturatedPair(373.15);
    expect(liquid.h / 1e3).toBeCloseTo(419.1, 0);
    expect(vapor.h / 1e3).toBeCloseTo(2675.6, 0);
    const m = mixture(liquid, vapor, 0.25);
    expect(m.h).toBeCloseTo(liquid.h + 0.25 * (vapor.h - liquid.h), 6);
    expect(m.v).toBeCloseTo(liquid.v + 0.25 * (vapor.v - liquid.v), 12);
  });
  it("phaseOf is supercritical only above both critical temperature and pressure", () => {
    expect(phaseOf(700, 25e6, "vapor")).toBe("supercritical");
    expect(phaseOf(700, 20e6, "vapor")).toBe("vapor");
    expect(phaseOf(600, 25e6, "liquid")).toBe("liquid");
  });
});
