import { describe, expect, it } from "vitest";
import { create, all, type MathJsInstance } from "mathjs";
import { installUnits } from "../../../lib/units/index.js";
import { conversionMismatch, isMathjsMismatch, isOpaque, opaqueOperand, opaqueText, operandMismatch, standardVolumeHint } from "../../../lib/units/mismatch.js";

const math = create(all, { number: "number" }) as MathJsInstance;
installUnits(math);

describe("standardVolumeHint", () => {
  it("standardVolumeHint says the unit is an amount (or molar flow), its reference conditions and how to get a volume", () => {
    expect(standardVolumeHint("Sm3")).toMatch(/^Sm3 is an amount of substance, not a volume \(.*15 degC and 101\.325 kPa.*\)\. .*n \* R \* T \/ P .*volume\(model, T, P\).*Sm3 to mol gives the moles$/);
    expect(standardVolumeHint("MMscfd")).toMatch(/^MMscfd is a molar flow \(amount of substance per time\), not a volume .*60 degF, 14\.696 psia.*; MMscfd to mol\/s gives the molar flow$/);
  });
});

describe("conversionMismatch", () => {
  it("conversionMismatch names both sides with their dimensions; standard volumes get the hint", () => {
    expect(conversionMismatch(math.unit(1, "bar"), "K").message).toBe("cannot convert 1 bar (a pressure) to K: the dimensions differ");
    expect(conversionMismatch(math.unit(1, "Sm3"), math.unit("m^3")).message).toMatch(/^cannot convert 1 Sm3 \(an amount of substance\) to m\^3 \(a volume\): the dimensions differ; Sm3 is an amount/);
    expect(conversionMismatch(math.unit(1, "mmscfd"), "m^3/s").message).toMatch(/MMscfd is a molar flow/);
  });
  it("conversionMismatch is what `to` throws for different dimensions (via installUnits)", () => {
    expect(() => math.unit(1, "Nm3").to("m^3")).toThrow(/cannot convert 1 Nm3 \(an amount of substance\).*Nm3 is an amount of substance.*0 degC/);
    expect(() => math.unit(1, "bar").to("K")).toThrow(/cannot convert 1 bar \(a pressure\) to K/);
  });
});

describe("operandMismatch", () => {
  it("operandMismatch names the operation and both quantities", () => {
    expect(operandMismatch("+", math.unit(1, "bar"), math.unit(1, "K")).message).toBe("cannot add 1 bar (a pressure) and 1 K (a temperature): both sides of + and - must have the same dimension");
    expect(operandMismatch(">", math.unit(1, "bar"), math.unit(1, "K")).message).toMatch(/^cannot compare \(>\) 1 bar \(a pressure\) and 1 K/);
    expect(() => math.evaluate("1 bar < 1 K")).toThrow(/cannot compare \(<\) 1 bar \(a pressure\) and 1 K \(a temperature\)/);
  });
});

describe("isMathjsMismatch", () => {
  it("isMathjsMismatch recognises mathjs's two wordings only", () => {
    expect(isMathjsMismatch(new Error("Units do not match ('m^3' != '1 Sm3')"))).toBe(true);
    expect(isMathjsMismatch(new Error("Cannot compare units with different base"))).toBe(true);
    expect(isMathjsMismatch(new Error("other"))).toBe(false);
  });
});

describe("opaqueOperand", () => {
  it("isOpaque and opaqueText tell records, models, functions and nothing from values arithmetic takes", () => {
    expect([isOpaque(1), isOpaque(math.unit(1, "m")), isOpaque([1]), isOpaque({ a: 1 }), isOpaque(undefined), isOpaque(() => 1)]).toEqual([false, false, false, true, true, true]);
    expect(opaqueText({ kind: "model", toText: () => "pr" })).toBe("a model");
    expect(opaqueText({ T: 1, P: 2 })).toBe("a record (fields T, P)");
  });
  it("opaqueOperand says which operand cannot take part and what to do instead", () => {
    expect(opaqueOperand("*", { kind: "model", toText: () => "" }, 2).message).toBe("cannot use a model in *: * works on numbers, quantities and arrays; pass the model to a built-in that takes one, or read one of its fields");
    expect(opaqueOperand("+", 1, { T: 1 }).message).toMatch(/cannot use a record \(fields T\) in \+.*like \.T$/);
    expect(() => math.evaluate("r * 2", { r: { a: 1 } })).toThrow(/cannot use a record \(fields a\) in \*/);
  });
});
