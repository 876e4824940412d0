import { describe, expect, it } from "vitest";
import { createSession } from "../../../../lib/language/index.js";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";

const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
const value = (code: string): unknown => {
  const r = session.run(`__v = ${code};`, { stdout() {}, display() {}, clear() {} });
  if (!r.ok) throw new Error(r.error.evalue);
  return internals.scope.get("__v");
};
const errorOf = (code: string) => {
  const r = createSession({ shouldStop: () => false }).run(code, { stdout() {}, display() {}, clear() {} });
  return r.ok ? "" : r.error.evalue;
};

describe("span", () => {
  it("span(300 K, 400 K, 5) is the arithmetic sequence 300, 325, ... 400 K (definition)", () => {
    const c = value("span(300 K, 400 K, 5)");
    expect(isQuantityColumn(c) && Array.from(c.si)).toEqual([300, 325, 350, 375, 400]);
  });
  it("span(20 degC, 80 degC, 4) steps on absolute kelvin: 293.15..353.15 K (SI Brochure: T/K = t/degC + 273.15) and shows degC", () => {
    const c = value("span(20 degC, 80 degC, 4)");
    if (!isQuantityColumn(c)) throw new Error("not a column");
    expect(Array.from(c.si).map((x) => Number(x.toFixed(9)))).toEqual([293.15, 313.15, 333.15, 353.15]);
    expect(c.unit).toBe("degC");
    expect(value("span(20 degC, 80 degC, 4)[2] to K")).toSatisfy((u: { toNumber(s: string): number }) => Math.abs(u.toNumber("K") - 313.15) < 1e-9);
  });
  it("span of plain numbers returns numbers and ends exactly at b", () => {
    const c = value("span(0, 1, 11)");
    expect(isQuantityColumn(c) && c.si[10]).toBe(1);
    expect(isQuantityColumn(c) && c.si[3]).toBeCloseTo(0.3, 15);
  });
  it("span rejects mixed dimensions and bad counts, naming the argument", () => {
    expect(errorOf("span(1 K, 2 m, 3)")).toMatch(/same dimension/);
    expect(errorOf("span(1 K, 2 K, 1)")).toMatch(/argument n of span\(\) must be a whole number from 2/);
    expect(errorOf("span(1 K, 2 K, 2.5)")).toMatch(/argument n of span\(\)/);
    expect(errorOf("span(1 K, 2, 3)")).toMatch(/both be quantities/);
  });
});

describe("logspan", () => {
  it("logspan(1 bar, 100 bar, 3) is 1, 10, 100 bar (geometric sequence, ratio 10)", () => {
    const c = value("logspan(1 bar, 100 bar, 3)");
    if (!isQuantityColumn(c)) throw new Error("not a column");
    expect(c.si[0]).toBe(1e5);
    expect(c.si[1]).toBeCloseTo(1e6, 6);
    expect(c.si[2]).toBe(1e7);
  });
  it("logspan rejects non-positive ends", () => {
    expect(errorOf("logspan(0, 1, 3)")).toMatch(/positive/);
  });
});
