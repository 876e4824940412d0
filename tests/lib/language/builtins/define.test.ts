import { describe, expect, it } from "vitest";
import { defineBuiltin, isOpaqueType, signatureOf, type BuiltinDef } from "../../../../lib/language/builtins/define.js";

const base: BuiltinDef = {
  name: "demo", group: "test", returns: "pressure", doc: "demo", examples: ["demo(1 K)"],
  params: [
    { name: "T", type: "quantity", dim: "temperature", doc: "temperature" },
    { name: "phase", type: "string", choices: ["liquid", "vapor"], optional: true, doc: "phase" },
  ],
  impl: () => 1,
};

describe("defineBuiltin", () => {
  it("defineBuiltin returns a frozen record with the same fields", () => {
    const d = defineBuiltin(base);
    expect(Object.isFrozen(d)).toBe(true);
    expect(d.params.map((p) => p.name)).toEqual(["T", "phase"]);
  });
  it("defineBuiltin rejects a required param after an optional one", () => {
    expect(() => defineBuiltin({ ...base, params: [{ ...base.params[1]! }, { ...base.params[0]! }] })).toThrow(/required params/);
  });
  it("defineBuiltin rejects duplicate params, dim on non-quantity, missing docs and examples", () => {
    expect(() => defineBuiltin({ ...base, params: [base.params[0]!, base.params[0]!] })).toThrow(/duplicate/);
    expect(() => defineBuiltin({ ...base, params: [{ name: "x", type: "number", dim: "pressure", doc: "x" }] })).toThrow(/dim on non-quantity/);
    expect(() => defineBuiltin({ ...base, doc: "" })).toThrow(/needs doc/);
    expect(() => defineBuiltin({ ...base, examples: [] })).toThrow(/example/);
    expect(() => defineBuiltin({ ...base, name: "bad name" })).toThrow(/bad name/);
  });
  it("defineBuiltin accepts a rest param only in last place", () => {
    expect(() => defineBuiltin({ ...base, params: [{ name: "xs", type: "any", rest: true, doc: "x" }, base.params[0]!] })).toThrow(/rest/);
  });
});

describe("signatureOf", () => {
  it("signatureOf shows dimensions, choices and optional brackets", () => {
    expect(signatureOf(defineBuiltin(base))).toBe('demo(T: temperature, [phase: string ("liquid" | "vapor")]) -> pressure');
  });
});

describe("isOpaqueType", () => {
  it("isOpaqueType is true only for words outside the base types", () => {
    expect(isOpaqueType("model")).toBe(true);
    expect(isOpaqueType("quantity")).toBe(false);
    expect(isOpaqueType("record")).toBe(false);
  });
});
