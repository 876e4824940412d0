import { describe, expect, it } from "vitest";
import { createSession } from "../../../../lib/language/index.js";
import { languageSession } from "../../../support/languageSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";

const { value } = languageSession();
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
  it("logspan of offset units spaces absolute values by a constant ratio and shows the user's unit, with a note", () => {
    const out: string[] = [];
    const s = createSession({ shouldStop: () => false });
    const r = s.run("logspan(1 degC, 100 degC, 3)", { stdout: (t) => out.push(t), display() {}, clear() {} });
    // Middle point sqrt(274.15 K x 373.15 K) = 319.842 K = 46.6923 degC (python3; SI Brochure T/K = t/degC + 273.15).
    expect(r.ok && r.result!["text/plain"]).toBe("[1, 46.6923, 100] degC");
    expect(out.join("")).toMatch(/logspan\(\): degC is an offset unit; the points have a constant ratio of absolute values \(274\.15 K to 373\.15 K\)/);
    const c = value("logspan(1 degC, 100 degC, 3)");
    if (!isQuantityColumn(c)) throw new Error("not a column");
    expect(c.si[1]! / c.si[0]!).toBeCloseTo(c.si[2]! / c.si[1]!, 12); // constant ratio in kelvin
    expect(c.si[1]).toBeCloseTo(Math.sqrt(274.15 * 373.15), 9);
    // Gauge: sqrt(2.01325 bar x 101.01325 bar) - 1.01325 bar = 13.2474 barg (gauge against 1 atm = 1.01325 bar).
    const g = value("logspan(1 barg, 100 barg, 3)");
    if (!isQuantityColumn(g)) throw new Error("not a column");
    expect(g.unit).toBe("barg");
    expect(g.si[1]).toBeCloseTo(Math.sqrt(201325 * 10101325), 4);
    // degF: sqrt(491.67 x 671.67) degR - 459.67 = 114.995 degF (NIST SP 811 B.8: T/degR = t/degF + 459.67).
    const f = s.run("logspan(32 degF, 212 degF, 3)", { stdout() {}, display() {}, clear() {} });
    expect(f.ok && f.result!["text/plain"]).toBe("[32, 114.995, 212] degF");
  });
  it("span of offset units is the same in K as in degC (linear spacing), without a note", () => {
    const out: string[] = [];
    const r = createSession({ shouldStop: () => false }).run("span(1 degC, 100 degC, 3)", { stdout: (t) => out.push(t), display() {}, clear() {} });
    expect(r.ok && r.result!["text/plain"]).toBe("[1, 50.5, 100] degC"); // (1 + 100)/2 (arithmetic)
    expect(out).toEqual([]);
  });
  it("logspan rejects non-positive ends", () => {
    expect(errorOf("logspan(0, 1, 3)")).toMatch(/positive/);
  });
});
