import { describe, expect, it } from "vitest";
import type { Unit } from "mathjs";
import { languageSession, rel } from "../../../support/languageSession.js";
import { isQuantityColumn } from "../../../../lib/language/values/column.js";
import {
  getSubstance, heatCapacity, idealGasFunctions, pr as prModel, psat as libPsat, pureFluid, state as thermoState, departure as thermoDeparture,
} from "../../../../lib/thermo/index.js";

const { session, sink, value, num, errorOf } = languageSession();
session.run('m = pr("propane"); b = pr("n-butane"); s = state(m, 350 K, 10 bar);', sink);

describe("state", () => {
  it("state(pr(...)) equals the thermo library's state at the same T, P (same equations, 1e-12 relative)", () => {
    const lib = thermoState(prModel(pureFluid(getSubstance("propane"))), 350, 1e6);
    expect(rel(num("s.V", "m^3/mol"), lib.V)).toBeLessThan(1e-12);
    expect(rel(num("s.HR", "J/mol"), lib.HR)).toBeLessThan(1e-12);
    expect(rel(num("s.SR", "J/(mol K)"), lib.SR)).toBeLessThan(1e-12);
    expect(rel(value("s.Z") as number, lib.Z)).toBeLessThan(1e-12);
  });

  it("state: n-butane saturated volumes at 350 K, 9.4573 bar by PR: V_vap 2486.1, V_liq 112.6 cm^3/mol (Smith, Van Ness & Abbott 7th ed. Example 3.9, from memory; 0.1 %)", () => {
    expect(rel(num('state(b, 350 K, 9.4573 bar, "vapor").V', "cm^3/mol"), 2486.1)).toBeLessThan(1e-3);
    expect(rel(num('state(b, 350 K, 9.4573 bar, "liquid").V', "cm^3/mol"), 112.6)).toBeLessThan(1e-3);
  });

  it("state: Lee-Kesler Z of n-butane at 510 K, 25 bar is 0.873 and the Pitzer/Abbott virial gives 0.879 (SVNA 7th ed. Example 3.10, from memory; 0.5 %)", () => {
    expect(rel(value('state(lk("n-butane"), 510 K, 25 bar).Z') as number, 0.873)).toBeLessThan(5e-3);
    expect(rel(value('state(virial("n-butane"), 510 K, 25 bar).Z') as number, 0.879)).toBeLessThan(5e-3);
  });

  it("state: totals obey H = U + PV, G = H - TS, A = U - TS and specific = molar / M (definitions, 1e-12)", () => {
    const T = 350, P = 1e6, M = 0.044097;
    const [H, S, U, G, A, V] = [num("s.H", "J/mol"), num("s.S", "J/(mol K)"), num("s.U", "J/mol"), num("s.G", "J/mol"), num("s.A", "J/mol"), num("s.V", "m^3/mol")];
    expect(Math.abs(H - (U + P * V))).toBeLessThan(1e-9 * Math.abs(H) + 1e-9);
    expect(Math.abs(G - (H - T * S))).toBeLessThan(1e-9);
    expect(Math.abs(A - (U - T * S))).toBeLessThan(1e-9);
    expect(rel(num("s.h", "J/kg"), H / M)).toBeLessThan(1e-12);
    expect(rel(num("s.rho", "kg/m^3"), M / V)).toBeLessThan(1e-12);
    expect(rel(num("s.f", "Pa"), P * (value("s.phi") as number))).toBeLessThan(1e-12);
  });

  it("state: two-property specs round-trip to the T, P state (Brent on the model, 1e-7 relative)", () => {
    for (const spec of ["{P: s.P, H: s.H}", "{P: s.P, S: s.S}", "{T: s.T, V: s.V}", "{P: s.P, h: s.h}", "{T: s.T, rho: s.rho}", "{P: s.P, U: s.U}"]) {
      expect(rel(num(`state(m, ${spec}).T`, "K"), 350)).toBeLessThan(1e-7);
      expect(rel(num(`state(m, ${spec}).P`, "Pa"), 1e6)).toBeLessThan(1e-7);
    }
  });

  it("state: {P, H} between the saturated liquid and vapour gives a two-phase state whose x follows the lever rule", () => {
    session.run('sL = state(m, 300 K, psat(m, 300 K), "liquid"); sG = state(m, 300 K, psat(m, 300 K), "vapor"); mid = state(m, {P: psat(m, 300 K), H: 0.25 * sL.H + 0.75 * sG.H});', sink);
    expect(value("mid.phase")).toBe("two-phase");
    expect(Math.abs((value("mid.x") as number) - 0.75)).toBeLessThan(1e-6);
    expect(Number.isNaN(value("mid.Cp") as number)).toBe(true);
  });

  it("state over a span returns columns equal to scalar calls (element by element, exact)", () => {
    const c = value("state(m, span(300 K, 400 K, 11), 10 bar)") as Record<string, unknown>;
    const Hcol = c.H;
    if (!isQuantityColumn(Hcol)) throw new Error("H is not a column");
    expect(Hcol.si.length).toBe(11);
    for (const i of [0, 3, 10]) {
      const T = 300 + 10 * i;
      expect(Hcol.si[i]).toBe(num(`state(m, ${T} K, 10 bar).H`, "J/mol"));
      expect((c.phase as string[])[i]).toBe(value(`state(m, ${T} K, 10 bar).phase`));
    }
    expect(String(c.notes ?? "")).not.toMatch(/NaN/);
  });

  it("state: the isothermal Gibbs change equals the integral of V dP (dG = int V dP at constant T; quadrature 1e-8)", () => {
    const dG = num("change(state(m, 300 K, 1 bar), state(m, 300 K, 5 bar)).dG", "J/mol");
    const integral = num("integrate(f(P) = volume(m, 300 K, P), 1 bar, 5 bar)", "J/mol");
    expect(rel(dG, integral)).toBeLessThan(1e-8);
  });

  it("state errors name the argument and the valid range", () => {
    expect(errorOf("state(m, -5 K, 1 bar)")).toMatch(/argument T of state\(\) must be above 0 K/);
    expect(errorOf("state(m, 300 K, 0 bar)")).toMatch(/argument P of state\(\) must be above 0 Pa/);
    expect(errorOf('state(m, 400 K, 10 bar, "liquid")')).toMatch(/liquid root asked of a supercritical fluid at T = 400 K > Tc = 369\.8 K/);
    expect(errorOf("state(m, 300 K, 1 kg)")).toMatch(/argument P of state\(\)/);
    expect(errorOf("state(m, {P: 1 bar})")).toMatch(/exactly two properties/);
    expect(errorOf("state(m, {P: 1 bar, Q: 2})")).toMatch(/unknown property "Q"/);
    expect(errorOf("state(m, {V: 1 L/mol, rho: 2 kg/L})")).toMatch(/same property twice/);
    expect(errorOf("state(m, 300 K)")).toMatch(/missing argument P/);
    expect(errorOf('state("propane", 300 K, 1 bar)')).toMatch(/argument m of state\(\) needs/);
  });
});

describe("state heat capacities and speed of sound", () => {
  const HEAT = ["Cp", "Cv", "cp", "cv", "w"];
  const M = getSubstance("propane").M;
  const lib = (T: number, P: number) => {
    const sub = getSubstance("propane");
    const mm = prModel(pureFluid(sub));
    const ig = idealGasFunctions([sub], [1]);
    const st = thermoState(mm, T, P, { idealGas: ig });
    return heatCapacity(mm, T, P, st.V, ig.Cp(T), sub.M);
  };

  it("state records of cubic models carry Cp, Cv, cp, cv, w for scalar calls, equal to the library's heatCapacity (1e-12)", () => {
    for (const model of ['pr("propane")', 'srk("propane")', 'rk("propane")', 'vdw("propane")']) {
      const r = value(`state(${model}, 350 K, 10 bar)`) as Record<string, unknown>;
      for (const k of HEAT) expect(Object.keys(r), `${model} ${k}`).toContain(k);
    }
    const h = lib(350, 1e6);
    expect(rel(num("s.Cp", "J/(mol K)"), h.Cp)).toBeLessThan(1e-12);
    expect(rel(num("s.Cv", "J/(mol K)"), h.Cv)).toBeLessThan(1e-12);
    expect(rel(num("s.cp", "J/(kg K)"), h.Cp / M)).toBeLessThan(1e-12);
    expect(rel(num("s.cv", "J/(kg K)"), h.Cv / M)).toBeLessThan(1e-12);
    expect(rel(num("s.w", "m/s"), h.w)).toBeLessThan(1e-12);
  });

  it("state over a span carries Cp, Cv, cp, cv, w columns equal to the library's heatCapacity (liquid, vapour, supercritical)", () => {
    const c = value("state(m, span(200 K, 600 K, 9), 50 bar)") as Record<string, unknown>;
    for (const k of HEAT) expect(isQuantityColumn(c[k]), k).toBe(true);
    const col = (k: string) => (c[k] as { si: Float64Array }).si;
    for (let i = 0; i < 9; i++) {
      const h = lib(200 + 50 * i, 5e6);
      expect(rel(col("Cp")[i]!, h.Cp)).toBeLessThan(1e-12);
      expect(rel(col("cv")[i]!, h.Cv / M)).toBeLessThan(1e-12);
      expect(rel(col("w")[i]!, h.w)).toBeLessThan(1e-12);
    }
    expect(c.phase).toEqual(["liquid", "liquid", "liquid", "liquid", "supercritical", "supercritical", "supercritical", "supercritical", "supercritical"]);
  });

  it("state over a span by a pure cubic equals scalar calls element by element across liquid, two roots, vapour and supercritical", () => {
    // 0.5 bar: every T here is above propane's boiling point at that pressure, so a vapour root exists.
    const Ts = [250, 300, 330, 360, 369, 371, 420, 700];
    for (const [P, phase] of [["1 bar", ""], ["20 bar", ""], ["42 bar", ""], ["80 bar", ""], ["0.5 bar", ', "vapor"']]) {
      {
        const c = value(`state(srk("propane"), [${Ts.map((t) => `${t} K`).join(", ")}], ${P}${phase})`) as Record<string, unknown>;
        Ts.forEach((T, i) => {
          const r = value(`state(srk("propane"), ${T} K, ${P}${phase})`) as Record<string, unknown>;
          expect((c.phase as string[])[i]).toBe(r.phase);
          for (const k of ["V", "Z", "H", "S", "G", "HR", "lnphi", "f", "Cp", "w"]) {
            const a = (c[k] as { si: Float64Array }).si[i]!;
            const b = typeof r[k] === "number" ? (r[k] as number) : (r[k] as Unit).toSI().toNumber();
            if (Number.isNaN(b)) expect(Number.isNaN(a), `${T} K ${P} ${k}`).toBe(true);
            else expect(Math.abs(a - b) / Math.max(Math.abs(b), 1e-3), `${T} K ${P}${phase} ${k}`).toBeLessThan(1e-12);
          }
        });
      }
    }
  });

  it("state over a span names the general path's error for a point with no requested root", () => {
    expect(errorOf('state(m, span(300 K, 400 K, 3), 40 bar, "liquid")')).toMatch(/liquid root asked of a supercritical fluid at T = 400 K > Tc = 369\.8 K.*\(at element 3 of 3\)/);
    // The general path (if97, specs) names the element too.
    expect(errorOf('state(if97(), [300 K, 500 K], 10 bar, "liquid")')).toMatch(/is vapor \(IF97 region 2\).*\(at element 2 of 2\)/);
  });
});

describe("state errors that say what to write instead", () => {
  it("state(m, {P, H}) with a per-mass enthalpy says to use h:, and the other bases likewise", () => {
    session.run('g = pr("propane");', sink);
    expect(errorOf("state(g, {P: 10 bar, H: 500 kJ/kg})")).toMatch(/argument H of state\(\) needs a molar energy.*got 500 kJ \/ kg.*use h: for a per-mass enthalpy/);
    expect(errorOf("state(g, {P: 10 bar, h: 5 kJ/mol})")).toMatch(/argument h of state\(\).*use H: for a molar enthalpy/);
    expect(errorOf("state(g, {P: 10 bar, S: 2 kJ/(kg K)})")).toMatch(/argument S of state\(\).*use s: for a per-mass entropy/);
    expect(errorOf("state(g, {P: 10 bar, s: 2 J/(mol K)})")).toMatch(/use S: for a molar entropy/);
    expect(errorOf("state(g, {T: 300 K, U: 100 kJ/kg})")).toMatch(/argument U of state\(\).*use u: for a per-mass internal energy/);
    expect(errorOf("state(g, {T: 300 K, u: 1 kJ/mol})")).toMatch(/use U: for a molar internal energy/);
    expect(errorOf("state(g, {T: 300 K, V: 2 L/kg})")).toMatch(/argument V of state\(\).*use v: for a per-mass \(specific\) volume/);
    expect(errorOf("state(g, {T: 300 K, V: 0.5 kg/L})")).toMatch(/use rho: for a mass density/);
    expect(errorOf("state(g, {T: 300 K, v: 0.1 L/mol})")).toMatch(/argument v of state\(\).*use V: for a molar volume/);
    expect(errorOf("state(g, {P: 10 bar, H: span(100 kJ/kg, 200 kJ/kg, 3)})")).toMatch(/argument H\[1\] of state\(\).*use h: for a per-mass enthalpy/);
    // No other key takes a pressure: the plain wrong-dimension error, without a suggestion.
    const plain = errorOf("state(g, {P: 10 bar, H: 2 bar})");
    expect(plain).toMatch(/argument H of state\(\) needs a molar energy/);
    expect(plain).not.toMatch(/use /);
  });

  it("state(if97(), Tsat, P, phase) asked for the other phase at saturation suggests {P: .., x: 0} or {P: .., x: 1}", () => {
    session.run("Tb = tsat(if97(), 10 bar);", sink);
    // IF97 puts T = Tsat(P) itself in one region; whichever it is, asking the other phase is refused with the hint.
    const phaseAt = value("state(if97(), Tb, 10 bar).phase");
    const other = phaseAt === "liquid" ? "vapor" : "liquid";
    const x = other === "liquid" ? 0 : 1;
    expect(errorOf(`state(if97(), Tb, 10 bar, "${other}")`)).toMatch(new RegExp(`saturation temperature.*use state\\(if97\\(\\), \\{P: 1 MPa, x: ${x}\\}\\)`));
    // Just across the line (1e-7 relative), the hint shows too.
    expect(errorOf('state(if97(), Tb * (1 + 1e-7), 10 bar, "liquid")')).toMatch(/x: 0\}/);
    expect(errorOf('state(if97(), Tb * (1 - 1e-7), 10 bar, "vapor")')).toMatch(/x: 1\}/);
    // Far from saturation the plain message stays.
    expect(errorOf('state(if97(), 400 K, 10 bar, "vapor")')).not.toMatch(/saturation temperature/);
    // The suggested call works and gives the saturated liquid (IAPWS-IF97 Table 35 region: h' at 1 MPa is 762.68 kJ/kg, from memory; 0.1 %).
    expect(rel(num("state(if97(), {P: 10 bar, x: 0}).h", "kJ/kg"), 762.68)).toBeLessThan(1e-3);
  });
});

describe("departure", () => {
  it("departure closed form and integrate route agree to 1e-8 relative (DESIGN.md section 5; thermo numerical route)", () => {
    for (const [T, P, ph] of [["350 K", "10 bar", "stable"], ["300 K", "20 bar", "liquid"], ["450 K", "60 bar", "stable"]]) {
      const o = `{phase: "${ph}"}`;
      const oi = `{phase: "${ph}", route: "integrate"}`;
      for (const k of ["HR", "SR", "GR"]) {
        const unit = k === "SR" ? "J/(mol K)" : "J/mol";
        const a = num(`departure(m, ${T}, ${P}, ${o}).${k}`, unit);
        const b = num(`departure(m, ${T}, ${P}, ${oi}).${k}`, unit);
        expect(Math.abs(a - b)).toBeLessThan(1e-8 * Math.abs(a) + 1e-9);
      }
    }
    expect(num('departure(m, 350 K, 10 bar, {route: "integrate"}).AR_error', "J/mol")).toBeLessThan(1e-6);
  });

  it("departure equals the thermo library's closed form", () => {
    const lib = thermoDeparture(prModel(pureFluid(getSubstance("propane"))), 350, 1e6);
    expect(rel(num("departure(m, 350 K, 10 bar).HR", "J/mol"), lib.HR)).toBeLessThan(1e-12);
    expect(rel(value("departure(m, 350 K, 10 bar).lnphi") as number, lib.lnphi)).toBeLessThan(1e-12);
  });

  it("departure vectorises over a span and rejects if97()'s integrate route and unknown options", () => {
    const c = value("departure(m, span(300 K, 400 K, 3), 1 bar)") as Record<string, unknown>;
    expect(isQuantityColumn(c.HR) && c.HR.si.length).toBe(3);
    expect(errorOf('departure(if97(), 400 K, 1 bar, {route: "integrate"})')).toMatch(/option route of departure\(\): if97\(\) has only the "closed" route/);
    expect(errorOf('departure(m, 400 K, 1 bar, {road: "x"})')).toMatch(/option "road" of departure\(\)/);
    expect(errorOf('departure(m, 400 K, 1 bar, {route: "x"})')).toMatch(/route of departure\(\) must be/);
  });
});

describe("change", () => {
  it("change(s1, s2) equals the difference of the totals (definition, exact)", () => {
    session.run("s2 = state(m, 400 K, 20 bar); c = change(s, s2);", sink);
    for (const [k, unit] of [["H", "J/mol"], ["S", "J/(mol K)"], ["U", "J/mol"], ["G", "J/mol"], ["A", "J/mol"], ["V", "m^3/mol"], ["T", "K"], ["P", "Pa"]]) {
      const d = num(`c.d${k}`, unit!);
      expect(Math.abs(d - (num(`s2.${k}`, unit!) - num(`s.${k}`, unit!)))).toBeLessThan(1e-9 * Math.abs(d) + 1e-12);
    }
  });

  it("change refuses states of different models, fluids or reference states", () => {
    expect(errorOf('change(s, state(srk("propane"), 300 K, 1 bar))')).toMatch(/argument s2 of change\(\): the states come from different models or fluids/);
    expect(errorOf('change(s, state(pr("ethane"), 300 K, 1 bar))')).toMatch(/different models or fluids/);
    expect(errorOf('change(s, state(pr("propane", {reference: {T: 300 K}}), 300 K, 1 bar))')).toMatch(/different reference states/);
    expect(errorOf("change(s, {a: 1})")).toMatch(/argument s2 of change\(\) needs a state record/);
  });

  it("change of span states gives columns", () => {
    const c = value("change(state(m, span(300 K, 400 K, 4), 1 bar), state(m, span(310 K, 410 K, 4), 1 bar))") as Record<string, unknown>;
    expect(isQuantityColumn(c.dT) && Array.from(c.dT.si).map((x) => Math.round(x * 1e9) / 1e9)).toEqual([10, 10, 10, 10]);
  });
});

describe("QA issue 5 fixes in state() and departure()", () => {
  it("departure() names the model and carries state()'s cautions (item 4: virial methane at 500 bar)", () => {
    const d = value('departure(virial("methane"), 300 K, 500 bar)') as Record<string, unknown>;
    expect(d.model).toMatch(/truncated virial .*; methane/);
    // The truncated virial range rule Tr > 0.686 + 0.439 Pr (SVNA 7th ed. Fig. 3.14): methane Tr = 1.57 here.
    expect(d.notes).toMatch(/truncated virial used beyond its range/);
    // Methane Pc = 45.99 bar (SVNA Table B.1): 500 bar > 10 Pc (cautions.ts rule 3, common practice).
    expect(d.notes).toMatch(/more than 10 Pc/);
    const ok = value('departure(pr("methane"), 300 K, 50 bar)') as Record<string, unknown>;
    expect(ok.notes).toBeUndefined();
    expect(ok.model).toMatch(/^Peng-Robinson/);
  });
  it("departure() over a span gives columns, the model once and each caution once with its count", () => {
    const d = value('departure(virial("methane"), 300 K, span(10 bar, 400 bar, 5))') as Record<string, unknown>;
    expect(isQuantityColumn(d.HR)).toBe(true);
    expect(typeof d.model).toBe("string");
    expect(d.notes).toMatch(/truncated virial used beyond its range.*\(4 of 5 points, first shown\)/);
  });
  it("departure() and state() take the phase as text or as a record (item 23)", () => {
    // n-butane at 350 K, 9.4573 bar: both roots exist (SVNA 7th ed. Example 3.9, from memory).
    const a = num('departure(b, 350 K, 9.4573 bar, "liquid").HR', "J/mol");
    const c = num('departure(b, 350 K, 9.4573 bar, {phase: "liquid"}).HR', "J/mol");
    expect(c).toBe(a);
    expect(num('state(b, 350 K, 9.4573 bar, {phase: "liquid"}).V', "cm^3/mol")).toBe(num('state(b, 350 K, 9.4573 bar, "liquid").V', "cm^3/mol"));
    expect(rel(num('state(b, 350 K, 9.4573 bar, {phase: "liquid"}).V', "cm^3/mol"), 112.6)).toBeLessThan(1e-3);
    expect(errorOf('departure(b, 350 K, 9.4573 bar, {phase: "liquid", rute: "integrate"})')).toMatch(/option "rute" of departure\(\) is not known; valid options: phase, route, rel/);
  });
  it("state() of an equation-of-state liquid below the triple point carries a visible caution (item 5)", () => {
    // CO2 triple point 216.592 K (Span & Wagner 1996, from memory): at 200 K, 10 bar the cubic's root is liquid.
    expect(value('state(pr("CO2"), 200 K, 10 bar).phase')).toBe("liquid");
    expect(value('state(pr("CO2"), 200 K, 10 bar).notes')).toMatch(/below the triple point of Carbon dioxide .*the stable phase is solid; the equation-of-state liquid is an extrapolation/);
    // Water at 250 K, 1 bar: below 273.16 K (IAPWS).
    expect(value('state(pr("water"), 250 K, 1 bar).notes')).toMatch(/below the triple point of Water/);
    // The vectorised fast path gives the same caution with its count.
    expect(value('state(pr("CO2"), span(200 K, 240 K, 3), 10 bar).notes')).toMatch(/below the triple point of Carbon dioxide.*\(1 of 3 points/);
    // A pseudo-component without triple-point data: the 0.5 Tc rule (cautions.ts rule 2).
    expect(value('state(pr(substance({name: "cut", Tc: 540 K, Pc: 27 bar, omega: 0.35, M: 100 g/mol})), 250 K, 1 bar).notes')).toMatch(/T < 0\.5 Tc .* no triple-point data/);
  });
  it("state() flags absurd inputs (item 7) and keeps standard conditions quiet", () => {
    // Methane Pc = 45.99 bar (SVNA Table B.1): 1e6 bar is 20,000 Pc.
    expect(value('state(pr("methane"), 300 K, 1e6 bar).notes')).toMatch(/P = 100000 MPa is more than 10 Pc \(Pc = 45\.99 bar\): far outside the range where this model is meaningful/);
    // Methane Cp fit 298-1500 K (SVNA Table C.1): 1e5 K is far outside it, where its quadratic turns negative.
    expect(value('state(pr("methane"), 1e5 K, 1 bar).notes')).toMatch(/Cp of Methane used far outside its fitted range 298 to 1500 K .*not meaningful/);
    // 288.15 K (15 degC standard conditions) lies within 10 % of the fit's 298 K start: no Cp note.
    expect((value('state(pr("methane"), 288.15 K, 1 bar)') as Record<string, unknown>).notes).toBeUndefined();
    expect(value('state(pr("methane"), 200 K, 1 bar).notes')).toMatch(/extrapolated more than 10 % outside its fitted range/);
  });
});

describe("state(m, {T or P, x}) for equations of state (QA issue 5, P4)", () => {
  it("state(m, {T, x}) is the lever rule between psat's saturated liquid and vapour", () => {
    // Independent route: the library's psat at 300 K gives both saturated roots; x = 0.4 mixes them.
    const lib = libPsat(prModel(pureFluid(getSubstance("propane"))), 300);
    expect(rel(num("state(m, {T: 300 K, x: 0.4}).P", "Pa"), lib.P)).toBeLessThan(1e-12);
    expect(rel(num("state(m, {T: 300 K, x: 0.4}).V", "m^3/mol"), 0.6 * lib.VL + 0.4 * lib.VV)).toBeLessThan(1e-12);
    expect(value("state(m, {T: 300 K, x: 0.4}).phase")).toBe("two-phase");
    // The latent heat: H(x = 1) - H(x = 0) = Hvap; propane at 300 K about 14.8 kJ/mol (NIST webbook, from memory; PR within 5 %).
    const dH = num("state(m, {T: 300 K, x: 1}).H", "J/mol") - num("state(m, {T: 300 K, x: 0}).H", "J/mol");
    expect(rel(dH, lib.Hvap)).toBeLessThan(1e-9);
    expect(rel(dH, 14.8e3)).toBeLessThan(0.05);
  });
  it("state(m, {P, x}) solves tsat first; its T reproduces P by psat (round trip 1e-9)", () => {
    const T = num("state(m, {P: 10 bar, x: 0.5}).T", "K");
    expect(rel(libPsat(prModel(pureFluid(getSubstance("propane"))), T).P, 1e6)).toBeLessThan(1e-9);
    // Propane boils at 300.1 K under 10 bar (NIST webbook saturation table, from memory): PR within 1 %.
    expect(rel(T, 300.1)).toBeLessThan(0.01);
  });
  it("state(m, {T, x}) errors: x outside 0..1, mixtures, below the triple point", () => {
    expect(errorOf("state(m, {T: 300 K, x: 1.5})")).toMatch(/x \(vapour fraction\) must lie in 0\.\.1/);
    expect(errorOf('state(pr(mixture({methane: 0.5, ethane: 0.5})), {T: 150 K, x: 0.5})')).toMatch(/needs a pure fluid/);
    // CO2 triple point 216.592 K (Span & Wagner 1996, from memory).
    expect(errorOf('state(pr("CO2"), {T: 200 K, x: 0.5})')).toMatch(/argument T of state\(\): T = 200 K is below the triple point/);
  });
});
