import { describe, expect, it } from "vitest";
import { LanguageError, translateError } from "../../../lib/language/errors.js";

describe("LanguageError", () => {
  it("LanguageError.toCellError puts a caret under the column", () => {
    const e = new LanguageError("bad thing", 2, 5, "x = foo + 1", 3, "NameError").toCellError();
    expect(e.ename).toBe("NameError");
    expect(e.evalue).toBe("bad thing (line 2, column 5)");
    expect(e.traceback.slice(-2)).toEqual(["    x = foo + 1", "        ^^^"]);
  });
});

describe("translateError", () => {
  it("translateError turns an undefined symbol into a suggestion at its position", () => {
    const code = "a = 1\nb = spna(1)";
    const e = translateError(new Error("Undefined function spna"), code, 6, "b = spna(1)", () => ["span", "sum"]);
    expect(e.message).toBe('unknown function "spna"; did you mean "span"?');
    expect([e.line, e.column]).toEqual([2, 5]);
  });
  it("translateError explains stack overflow and mathjs type errors", () => {
    const r = new RangeError("Maximum call stack size exceeded");
    expect(translateError(r, "f(1)", 0, "f(1)", () => []).message).toMatch(/calls itself/);
    const t = new TypeError("Unexpected type of argument in function sqrt (expected: number, actual: string, index: 0)");
    expect(translateError(t, 'sqrt("a")', 0, 'sqrt("a")', () => []).message).toBe("sqrt() cannot take text as argument 1: it works on numbers");
  });
  it("translateError keeps units errors and places them at the named function", () => {
    const e = Object.assign(new Error("argument T of psat() needs a temperature, got 3 bar (a pressure)"), { name: "UnitsError" });
    const le = translateError(e, "x = psat(m, 3 bar)", 0, "x = psat(m, 3 bar)", () => []);
    expect([le.kind, le.column]).toEqual(["UnitsError", 5]);
  });
});

describe("translateError of callback errors", () => {
  it("translateError unwraps an error mathjs rethrew from a map callback and names the function", () => {
    const err = new TypeError("Function map cannot apply callback arguments to function f: Units do not match ('bar' != 'K')");
    const le = translateError(err, "map(xs, f)", 0, "map(xs, f)", () => []);
    expect(le.kind).toBe("UnitsError");
    expect(le.message).toMatch(/^units do not match.* \(in f called by map\(\)\)$/);
    const stop = new TypeError("Function map cannot apply callback arguments to function f: interrupted by the user; variables defined so far are kept");
    expect(translateError(stop, "map(xs, f)", 0, "map(xs, f)", () => []).kind).toBe("Interrupted");
  });
});
