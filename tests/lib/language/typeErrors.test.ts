import { describe, expect, it } from "vitest";
import { arityMessage, typeWords, wrongTypeMessage } from "../../../lib/language/typeErrors.js";

describe("typeWords", () => {
  it("typeWords names mathjs types in plain words", () => {
    expect(typeWords("Unit")).toBe("a quantity");
    expect(typeWords("identifier | undefined")).toBe("nothing (no value)");
    expect(typeWords("Object")).toBe("a record or model");
  });
});

describe("wrongTypeMessage", () => {
  it("wrongTypeMessage names the operator the user wrote, not mathjs's internal function", () => {
    expect(wrongTypeMessage("multiplyScalar", "number or Complex or BigNumber or Unit", "Object", 0)).toBe("the operator * cannot take a record or model as argument 1: it works on numbers, quantities");
    expect(wrongTypeMessage("equalScalar", "Unit", "number", 1)).toMatch(/^the operator == cannot take a plain number as argument 2: it works on quantities; give the plain number a unit/);
    expect(wrongTypeMessage("sqrt", "number", "string", 0)).toBe("sqrt() cannot take text as argument 1: it works on numbers");
  });
  it("wrongTypeMessage explains a complex intermediate", () => {
    expect(wrongTypeMessage("number", "number or Unit", "Complex", 0)).toMatch(/complex number.*square root of a negative/);
  });
});

describe("arityMessage", () => {
  it("arityMessage counts the arguments and, inside integrate/seek/slope, says how to define f", () => {
    expect(arityMessage("Too few arguments in function f (expected: any, index: 1)")).toBe("f needs more arguments than it was given: it got 1 (argument 2 is missing)");
    expect(arityMessage("Too few arguments in function f (expected: any, index: 1)", "integrate(f(x, y) = x*y, 0, 1)")).toMatch(/integrate\(\) calls it with one argument \(x\), so define it with one, like f\(x\) = /);
    expect(arityMessage("Too many arguments in function g (expected: 1, actual: 3)")).toBe("g takes 1 argument, but was given 3");
    expect(arityMessage("something else")).toBeUndefined();
  });
});
