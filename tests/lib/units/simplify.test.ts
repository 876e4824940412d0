import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import type { Unit } from "mathjs";
import { cancelUnits } from "../../../lib/units/simplify.js";

describe("cancelUnits", () => {
  const math = mathWithUnits();
  it("cancelUnits removes K/K and keeps the user's units", () => {
    const u = cancelUnits(math.evaluate("8.314462618 J/(mol K) * 298.15 K")) as Unit;
    expect(u.formatUnits()).toBe("J / mol");
    expect(u.toNumber("J/mol")).toBeCloseTo(2478.957, 3); // R T at 298.15 K, scipy.constants R
  });
  it("cancelUnits merges g and kg", () => {
    const u = cancelUnits(math.evaluate("2 kJ/(kg K) * 16 g/mol")) as Unit;
    expect(u.units.length).toBe(3);
    expect(u.toNumber("J/(mol K)")).toBeCloseTo(32, 9); // 2 J/(g K) x 16 g/mol
  });
  it("cancelUnits turns units that cancel completely into the pure number (4 kJ/J = 4000)", () => {
    expect(cancelUnits(math.unit(4, "kJ/J"))).toBe(4000); // k = 1000 (SI prefix)
    expect(cancelUnits(math.unit(2.5, "g/kg"))).toBeCloseTo(0.0025, 15);
  });
  it("cancelUnits leaves simple units alone", () => {
    const u = math.unit(3, "bar");
    expect(cancelUnits(u)).toBe(u);
  });
});
