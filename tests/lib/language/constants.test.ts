/**
 * Predefined constants. Check value: R = 8.314462618 J/(mol K) (CODATA 2018, exact since the 2019
 * SI redefinition, R = N_A k with N_A = 6.02214076e23 /mol and k = 1.380649e-23 J/K); scipy.constants.R
 * (Debian python3-scipy) prints 8.314462618.
 */
import type { Unit } from "mathjs";
import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";
import { createSessionWithInternals } from "../../../lib/language/createSession.js";
import { CONSTANTS, constantValues } from "../../../lib/language/constants.js";
import { loadMathjs } from "../../../lib/language/mathjs.js";

const sink = { stdout() {}, display() {}, clear() {} };
const text = (r: ReturnType<ReturnType<typeof createSession>["run"]>) => (r.ok ? String(r.result?.["text/plain"]) : `ERROR ${r.error.evalue}`);

describe("constants", () => {
  it("constantValues: R is 8.314462618 J/(mol K), N_A k from CODATA 2018 exact values", () => {
    const m = loadMathjs();
    const R = constantValues(m.create(m.all, {}) as never).get("R") as Unit;
    expect(R.toNumber("J/(mol K)")).toBe(8.314462618);
    // N_A k = 6.02214076e23 x 1.380649e-23 = 8.31446261815324 (exact product), R given to 10 figures.
    expect(Math.abs(R.toNumber("J/(mol K)") - 6.02214076e23 * 1.380649e-23)).toBeLessThan(2e-10);
    for (const c of CONSTANTS) expect(c.source.length).toBeGreaterThan(10);
  });
  it("R is predefined in every session and usable in arithmetic", () => {
    const s = createSession({ shouldStop: () => false });
    expect(text(s.run("R", sink))).toBe("8.31446 J / (mol K)");
    // R T / P at 300 K and 1 bar = 24.9434 L/mol (8.314462618 x 300 / 1e5 m^3/mol, arithmetic).
    expect(text(s.run("R * 300 K / (1 bar) to L/mol", sink))).toBe("24.9434 L / mol");
    // degC in R*T is absolute: R x 298.15 K = 2478.96 J/mol.
    expect(text(s.run("R * 25 degC", sink))).toBe("2478.96 J / mol");
  });
  it("R may be reassigned without a warning, and each session has its own", () => {
    const out: string[] = [];
    const s = createSession({ shouldStop: () => false });
    const r = s.run("R = 10.7316 psi ft^3/(lbmol degR)\nR", { ...sink, stdout: (t: string) => out.push(t) });
    expect(text(r)).toBe("10.7316 (psi ft^3) / (lbmol degR)"); // kept in the units written
    expect(out).toEqual([]);
    expect(text(createSession({ shouldStop: () => false }).run("R", sink))).toBe("8.31446 J / (mol K)");
  });
  it("R is offered by completion and inspect shows its source until it is reassigned", () => {
    const { session: s } = createSessionWithInternals({ shouldStop: () => false });
    expect(s.complete("x = R", 5).matches).toContain("R");
    const help = String(s.inspect("R", 1, 0).bundle?.["text/plain"]);
    expect(help).toMatch(/^R = 8\.31446 J \/ \(mol K\)/);
    expect(help).toMatch(/molar gas constant/);
    expect(help).toMatch(/Source: CODATA 2018/);
    s.run("R = 8.314 J/(mol K)", sink);
    expect(String(s.inspect("R", 1, 0).bundle?.["text/plain"])).toBe("R = 8.314 J / (mol K)");
  });
});
