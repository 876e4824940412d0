import { describe, expect, it } from "vitest";
import { axisTitle, chartBundle, chartSpec, chartSummary, type ChartSpec } from "../../../lib/display/chart.js";
import { MIME, VEGA_LITE_SCHEMA } from "../../../lib/display/mime.js";

type Obj = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

const base: ChartSpec = {
  title: "Isotherm",
  x: { title: "P", unit: "bar", log: true },
  y: { title: "V", unit: "L/mol" },
  series: [
    { label: "300 K", x: [1, 10, 100], y: [24.9, 2.45, 0.2] },
    { label: "400 K", x: [1, 10, 100], y: [33.2, 3.3, NaN] },
  ],
};

describe("chartSpec", () => {
  const s = chartSpec(base) as Obj;
  it("chartSpec pins the Vega-Lite v5 schema", () => {
    expect(s.$schema).toBe(VEGA_LITE_SCHEMA);
    expect(VEGA_LITE_SCHEMA).toMatch(/vega-lite\/v5\.json$/);
  });
  it("chartSpec puts units in the axis titles and keeps log axes", () => {
    expect(s.encoding.x.title).toBe("P [bar]");
    expect(s.encoding.y.title).toBe("V [L/mol]");
    expect(s.encoding.x.scale.type).toBe("log");
    expect(s.encoding.y.scale.type).toBe("linear");
  });
  it("chartSpec flattens series to rows, non-finite values to null, in caller order", () => {
    expect(s.data.values).toHaveLength(6);
    expect(s.data.values[5]).toEqual({ i: 2, x: 100, y: null, series: "400 K" });
    expect(s.encoding.order).toEqual({ field: "i", type: "quantitative" });
    expect(s.encoding.color.scale.domain).toEqual(["300 K", "400 K"]);
  });
  it("chartSpec hides the legend of a single series and draws points on request", () => {
    const one = chartSpec({ ...base, series: [base.series[0]!], mark: "point" }) as Obj;
    expect(one.encoding.color.legend).toBeNull();
    expect(one.mark.type).toBe("point");
    const lp = chartSpec({ ...base, mark: "line+point" }) as Obj;
    expect(lp.mark.point).toBeTruthy();
  });
  it("chartSpec adds a dash channel for a second grouping", () => {
    const dashed = chartSpec({
      ...base,
      series: [{ ...base.series[0]!, style: "PR" }, { ...base.series[0]!, style: "SRK" }],
      styleTitle: "model",
    }) as Obj;
    expect(dashed.encoding.strokeDash.scale.domain).toEqual(["PR", "SRK"]);
    expect(dashed.encoding.strokeDash.title).toBe("model");
  });
  it("chartSpec names the bad input: log axis with zero, length mismatch, no series, bad domain", () => {
    expect(() => chartSpec({ ...base, series: [{ label: "a", x: [1, 0], y: [1, 2] }] }))
      .toThrow(/x axis is logarithmic but series 'a' has x\[1\] = 0/);
    expect(() => chartSpec({ ...base, series: [{ label: "a", x: [1, 2], y: [1] }] })).toThrow(/'a' has 2 x values but 1 y values/);
    expect(() => chartSpec({ ...base, series: [] })).toThrow(/at least one series/);
    expect(() => chartSpec({ ...base, y: { title: "V", domain: [2, 1] } })).toThrow(/low < high, got \[2, 1\]/);
    expect(() => chartSpec({ ...base, series: [base.series[0]!, base.series[0]!] })).toThrow(/'300 K' is used twice/);
  });
});

describe("chartSpec notes", () => {
  it("chartSpec shows notes under the title so the pictures carry them", () => {
    const s = chartSpec({ ...base, subtitle: "PR model", notes: ["near the critical point"] }) as Obj;
    expect(s.title).toEqual({ text: "Isotherm", subtitle: ["PR model", "Note: near the critical point"] });
    expect((chartSpec({ ...base, title: undefined }) as Obj).title).toBeUndefined();
  });
});

describe("chartSummary", () => {
  it("chartSummary states axes with units, ranges and points per series", () => {
    const t = chartSummary(base);
    expect(t).toContain("Chart: Isotherm");
    expect(t).toContain("x: P [bar] (log), 1 to 100");
    expect(t).toContain("y: V [L/mol], 0.2 to 33.2");
    expect(t).toContain("400 K: 3 points (1 not finite, left out)");
  });
});

describe("chartBundle", () => {
  it("chartBundle returns text/plain and the Vega-Lite spec, pictures pending", () => {
    const b = chartBundle(base);
    expect(Object.keys(b).sort()).toEqual([MIME.text, MIME.vegalite].sort());
    expect(JSON.parse(JSON.stringify(b))).toEqual(b); // plain JSON: crosses the worker boundary
  });
});

describe("axisTitle", () => {
  it("axisTitle appends the unit in brackets, none for dimensionless", () => {
    expect(axisTitle({ title: "T", unit: "K" })).toBe("T [K]");
    expect(axisTitle({ title: "Z" })).toBe("Z");
  });
});
