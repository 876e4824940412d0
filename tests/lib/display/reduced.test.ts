import { describe, expect, it } from "vitest";
import { MIME } from "../../../lib/display/mime.js";
import { departureChart, departureChartSpec, zChart, zChartSpec, type ReducedCurve } from "../../../lib/display/reduced.js";
import { renderPending } from "../../../lib/display/render.js";

/**
 * Z from the truncated virial equation with the Pitzer-Abbott generalized second virial coefficient
 * (Smith, Van Ness & Abbott, Introduction to Chemical Engineering Thermodynamics, eqs. 3.61-3.66):
 * Z = 1 + (B0 + omega B1) Pr/Tr, B0 = 0.083 - 0.422/Tr^1.6, B1 = 0.139 - 0.172/Tr^4.2.
 * Used only to give the chart realistic curves; the chart code does no thermodynamics.
 */
const zVirial = (Tr: number, Pr: number, omega = 0.011) =>
  1 + (0.083 - 0.422 / Tr ** 1.6 + omega * (0.139 - 0.172 / Tr ** 4.2)) * Pr / Tr;

const Pr = [0.05, 0.1, 0.2, 0.5, 1];
const curves: ReducedCurve[] = [1.2, 1.5, 2].map((Tr) => ({ Tr, Pr, values: Pr.map((p) => zVirial(Tr, p)) }));

describe("zChartSpec", () => {
  it("zChartSpec plots Z against Pr, one series per Tr, titled with the groups", () => {
    const s = zChartSpec(curves);
    expect(s.series.map((c) => c.label)).toEqual(["Tr = 1.2", "Tr = 1.5", "Tr = 2"]);
    expect(s.x.title).toBe("reduced pressure Pr = P/Pc");
    expect(s.y.title).toBe("Z = PV/(RT)");
    expect(s.seriesTitle).toBe("Tr = T/Tc");
    expect(s.title).toBe("Generalized compressibility factor");
  });
  it("zChartSpec names a bad curve", () => {
    expect(() => zChartSpec([{ Tr: -1, Pr, values: Pr }])).toThrow(/curve 1 needs a positive reduced temperature Tr, got -1/);
    expect(() => zChartSpec([{ Tr: 1.5, Pr, values: [1] }])).toThrow(/Tr = 1.5 has 5 Pr values but 1 property values/);
    expect(() => zChartSpec([])).toThrow(/at least one curve/);
  });
});

describe("zChart", () => {
  it("zChart renders to every MIME type with the Z axis title", async () => {
    const b = await renderPending(zChart(curves, { logPr: true }));
    for (const m of [MIME.text, MIME.vegalite, MIME.svg, MIME.png]) expect(b[m]).toBeTruthy();
    expect(b[MIME.svg]).toContain("Z = PV/(RT)");
  });
});

describe("departureChartSpec", () => {
  it("departureChartSpec compares models by dash and states the dimensionless group", () => {
    const two = [...curves.map((c) => ({ ...c, model: "virial" })), ...curves.map((c) => ({ ...c, model: "ideal gas", values: Pr.map(() => 0) }))];
    const s = departureChartSpec("H", two);
    expect(s.y.title).toBe("HR/(R·Tc)");
    expect(s.styleTitle).toBe("model");
    expect(s.subtitle).toBe("virial vs ideal gas");
    expect(new Set(s.series.map((x) => x.style))).toEqual(new Set(["virial", "ideal gas"]));
    expect(departureChartSpec("lnphi", curves).y.title).toBe("ln φ");
    expect(departureChartSpec("S", curves, { title: "Mine" }).title).toBe("Mine");
  });
  it("departureChartSpec rejects an unknown property", () => {
    expect(() => departureChartSpec("Q" as never, curves)).toThrow(/property must be one of H, S, U, G, A, lnphi, phi, got 'Q'/);
  });
});

describe("departureChart", () => {
  it("departureChart returns a pending chart bundle", () => {
    const b = departureChart("S", curves);
    expect(b[MIME.text]).toContain("SR/R");
    expect(MIME.vegalite in b).toBe(true);
  });
});
