import { describe, expect, it } from "vitest";
import type { Unit } from "mathjs";
import { createSessionWithInternals } from "../../../../lib/language/createSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";

const { session, internals } = createSessionWithInternals({ shouldStop: () => false });
const sink = { stdout() {}, display() {}, clear() {} };
const value = (code: string): unknown => {
  const r = session.run(`__v = ${code};`, sink);
  if (!r.ok) throw new Error(r.error.evalue);
  return internals.scope.get("__v");
};
const num = (code: string, unit: string): number => (value(code) as Unit).toNumber(unit);
const errorOf = (code: string): string => {
  const r = session.run(code, sink);
  return r.ok ? "" : r.error.evalue;
};
const rel = (a: number, b: number) => Math.abs(a / b - 1);
session.run("w = if97();", sink);

describe("if97", () => {
  it("if97() displays the model, its source and reference state", () => {
    const r = session.run("if97()", sink);
    expect(r.ok && r.result?.["text/plain"]).toMatch(/IAPWS-IF97[\s\S]*R7-97[\s\S]*triple point/);
  });

  // IAPWS R7-97(2012), Table 5 (region 1) and Table 15 (region 2) verification values (9 significant digits).
  it("state(if97(), T, P) matches the IF97 verification values, region 1 (Table 5) and region 2 (Table 15), to 1e-8", () => {
    expect(rel(num("state(w, 300 K, 3 MPa).v", "m^3/kg"), 0.100215168e-2)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 300 K, 3 MPa).h", "kJ/kg"), 0.115331273e3)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 300 K, 3 MPa).w", "m/s"), 0.150773921e4)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 500 K, 3 MPa).h", "kJ/kg"), 0.975542239e3)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 300 K, 0.0035 MPa).h", "kJ/kg"), 0.254991145e4)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 300 K, 0.0035 MPa).s", "kJ/(kg K)"), 0.852238967e1)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 300 K, 0.0035 MPa).cp", "kJ/(kg K)"), 0.191300162e1)).toBeLessThan(1e-8);
    expect(rel(num("state(w, 700 K, 30 MPa).w", "m/s"), 0.480386523e3)).toBeLessThan(1e-8);
  });

  it("state(if97()) molar fields are the specific ones times M = 18.015268 g/mol (IAPWS), and Z = P V/(R T)", () => {
    const M = 0.018015268;
    expect(rel(num("state(w, 500 K, 10 bar).H", "J/mol"), num("state(w, 500 K, 10 bar).h", "J/kg") * M)).toBeLessThan(1e-12);
    expect(rel(num("state(w, 500 K, 10 bar).V", "m^3/mol"), num("state(w, 500 K, 10 bar).v", "m^3/kg") * M)).toBeLessThan(1e-12);
    const V = num("state(w, 500 K, 10 bar).V", "m^3/mol");
    expect(rel(value("state(w, 500 K, 10 bar).Z") as number, (1e6 * V) / (8.314462618 * 500))).toBeLessThan(1e-12);
  });

  it("psat and tsat of if97() match IF97 Tables 35 and 36 (9 digits)", () => {
    expect(rel(num("psat(w, 300 K)", "MPa"), 0.353658941e-2)).toBeLessThan(1e-8);
    expect(rel(num("psat(w, 500 K)", "MPa"), 0.263889776e1)).toBeLessThan(1e-8);
    expect(rel(num("tsat(w, 0.1 MPa)", "K"), 0.372755919e3)).toBeLessThan(1e-8);
    expect(rel(num("tsat(w, 1 MPa)", "K"), 0.453035632e3)).toBeLessThan(1e-8);
  });

  it("state(if97(), {P, h}) and {P, s} round-trip T through the backward equations (1e-7)", () => {
    session.run("ws = state(w, 600 K, 50 bar);", sink);
    expect(rel(num("state(w, {P: ws.P, h: ws.h}).T", "K"), 600)).toBeLessThan(1e-7);
    expect(rel(num("state(w, {P: ws.P, H: ws.H}).T", "K"), 600)).toBeLessThan(1e-7);
    expect(rel(num("state(w, {P: ws.P, s: ws.s}).T", "K"), 600)).toBeLessThan(1e-7);
  });

  it("state(if97(), {P, x}) is two-phase with h on the lever rule between saturated liquid and vapour", () => {
    const hl = num("state(w, {P: 10 bar, x: 0}).h", "J/kg");
    const hv = num("state(w, {P: 10 bar, x: 1}).h", "J/kg");
    expect(value("state(w, {P: 10 bar, x: 0.3}).phase")).toBe("two-phase");
    expect(rel(num("state(w, {P: 10 bar, x: 0.3}).h", "J/kg"), 0.7 * hl + 0.3 * hv)).toBeLessThan(1e-10);
    expect(rel(value("state(w, {P: 10 bar, h: 0.7 * state(w, {P: 10 bar, x: 0}).h + 0.3 * state(w, {P: 10 bar, x: 1}).h}).x") as number, 0.3)).toBeLessThan(1e-8);
  });

  it("state(if97()) over a span gives columns equal to scalar calls", () => {
    const c = value("state(w, span(300 K, 700 K, 5), 10 bar)") as Record<string, unknown>;
    if (!isQuantityColumn(c.h)) throw new Error("h is not a column");
    expect(c.h.si[4]).toBe(num("state(w, 700 K, 10 bar).h", "J/kg"));
    expect(c.phase).toEqual(["liquid", "liquid", "vapor", "vapor", "vapor"]);
  });

  it("if97() errors name the argument and IF97's valid range", () => {
    expect(errorOf("state(w, 2500 K, 1 bar)")).toMatch(/argument T of state\(\)[\s\S]*2273\.15 K/);
    expect(errorOf("state(w, 300 K, 200 MPa)")).toMatch(/argument P of state\(\)[\s\S]*100 MPa/);
    expect(errorOf('state(w, 500 K, 1 bar, "liquid")')).toMatch(/argument phase of state\(\): water at T = 500 K/);
    expect(errorOf("state(w, {T: 500 K, h: 100 kJ/kg})")).toMatch(/argument spec of state\(\): if97\(\) takes the pairs/);
    expect(errorOf("pressure(w, 500 K, 1 L/mol)")).toMatch(/argument m of pressure\(\): P\(T, V\) is not available for if97\(\)/);
  });
});
