import { describe, expect, it } from "vitest";
import { mathWithUnits } from "../../support/mathWithUnits.js";
import { absoluteOf, checkPower, isOffsetQuantity, productOperands, sumOperands } from "../../../lib/units/offset.js";
import type { Unit } from "mathjs";

describe("offset policy", () => {
  const math = mathWithUnits();
  it("isOffsetQuantity: valued single offset units only", () => {
    expect(isOffsetQuantity(math.unit(25, "degC"))).toBe(true);
    expect(isOffsetQuantity(math.unit(5, "psig"))).toBe(true);
    expect(isOffsetQuantity(math.unit("degC"))).toBe(false); // valueless: unit algebra
    expect(isOffsetQuantity(math.unit(4.184, "J/(g degC)"))).toBe(false); // per-degree compound
    expect(isOffsetQuantity(math.unit(300, "K"))).toBe(false);
    expect(isOffsetQuantity(25)).toBe(false);
  });
  it("absoluteOf maps to the absolute unit of the same family", () => {
    const t = absoluteOf(math, math.unit(77, "degF"));
    expect(t.formatUnits()).toBe("degR");
    expect(t.toNumber("K")).toBeCloseTo(298.15, 10); // (77 + 459.67) x 5/9, NIST SP 811
    expect(absoluteOf(math, math.unit(0, "psig")).toNumber("psia")).toBeCloseTo(14.69594877551345, 10); // scipy.constants atm/psi
  });
  it("productOperands uses absolute values when the dimension cancels", () => {
    const [a, b] = productOperands(math, "divide", math.unit(25, "degC"), math.unit(300, "K"));
    expect((a as Unit).toNumber("K")).toBeCloseTo(298.15, 10);
    expect(b).toBeDefined();
    expect(() => productOperands(math, "multiply", 2, math.unit(25, "degC"))).toThrow(/in a product where its temperature does not cancel/);
  });
  it("sumOperands: differences, absolute + change, absolute + absolute", () => {
    expect(sumOperands(math, "subtract", math.unit(5, "psig"), math.unit(3, "psig")).toNumber("psi")).toBeCloseTo(2, 8);
    expect(sumOperands(math, "subtract", math.unit(5, "psig"), math.unit(3, "psig")).formatUnits()).toBe("psi");
    expect(sumOperands(math, "add", math.unit(10, "K"), math.unit(25, "degC")).toNumber("degC")).toBeCloseTo(35, 10);
    expect(() => sumOperands(math, "add", math.unit(1, "degF"), math.unit(2, "degF"))).toThrow(/write 2 deltaF/);
  });
  it("checkPower refuses powers other than 1", () => {
    expect(() => checkPower(math, math.unit(25, "degC"), 0.5)).toThrow(/power of an offset quantity/);
    expect(() => checkPower(math, math.unit(25, "degC"), 1)).not.toThrow();
    expect(() => checkPower(math, math.unit(25, "K"), 2)).not.toThrow();
  });
});
