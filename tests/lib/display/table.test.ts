import { describe, expect, it } from "vitest";
import { MIME } from "../../../lib/display/mime.js";
import { tableBundle, tableFromColumns, tableFromRecord, tableFromRecords } from "../../../lib/display/table.js";

/** Deterministic pseudo-random numbers (LCG, Numerical Recipes constants) so failures reproduce. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(1664525, s) + 1013904223) >>> 0) / 2 ** 32);
}

/** Cells of the text/plain table body (rows after the dashed rule), split on runs of 2+ spaces. */
function textCells(text: string): string[][] {
  const lines = text.split("\n");
  const rule = lines.findIndex((l) => /^-+( +-+)*$/.test(l));
  return lines.slice(rule + 1).filter((l) => !l.startsWith("Note:")).map((l) => l.trim().split(/ {2,}/));
}

const htmlCells = (html: string) =>
  [...html.matchAll(/<tr>(.*?)<\/tr>/g)]
    .map((m) => [...m[1]!.matchAll(/<td[^>]*>(.*?)<\/td>/g)].map((c) => c[1]!))
    .filter((r) => r.length > 0);
const fromHtml = (s: string) =>
  Number(s.replace("&times;10<sup>", "e").replace("&minus;", "-").replace("</sup>", ""));

describe("tableBundle", () => {
  const spec = tableFromColumns(
    [
      { name: "P", unit: "bar", values: [1, 10, 50.5, 200] },
      { name: "Z", values: [0.99812, 0.98234, 0.91, 0.70123] },
      { name: "phase", values: ["gas", "gas", "gas", "supercritical"] },
    ],
    { title: "Methane at 300 K", notes: ["illustrative numbers"], sigfigs: 4 },
  );
  const b = tableBundle(spec);

  it("tableBundle carries text/plain, text/html and text/markdown", () => {
    expect(Object.keys(b).sort()).toEqual([MIME.html, MIME.markdown, MIME.text].sort());
  });
  it("tableBundle puts units in the headers", () => {
    expect(b[MIME.text]).toContain("P [bar]");
    expect(b[MIME.markdown]).toContain("| P [bar] | Z | phase |");
    expect(b[MIME.html]).toMatch(/<th[^>]*>P <span[^>]*>\[bar\]<\/span><\/th>/);
  });
  it("tableBundle right-aligns numbers and keeps the text table columns aligned", () => {
    const lines = (b[MIME.text] as string).split("\n");
    expect(lines[0]).toBe("Methane at 300 K");
    const body = lines.slice(1, 7);
    // every header/body line has the numeric columns ending at the same offsets
    const ends = body.filter((l) => !l.startsWith("-")).map((l) => l.indexOf("  ", l.search(/\d/)));
    expect(new Set(ends).size).toBe(1);
    expect(b[MIME.markdown]).toContain("| ---: | ---: | :--- |");
    expect(b[MIME.text]).toContain("Note: illustrative numbers");
  });
  it("tableBundle uses consistent significant figures per column", () => {
    const cells = textCells(b[MIME.text] as string);
    expect(cells.map((r) => r[0])).toEqual(["1.000", "10.00", "50.50", "200.0"]);
    expect(cells.map((r) => r[1])).toEqual(["0.9981", "0.9823", "0.9100", "0.7012"]);
  });
  it("tableBundle HTML sets no background colour and escapes text", () => {
    const h = tableBundle(tableFromColumns([{ name: "<x>", values: ["a&b"] }]))[MIME.html] as string;
    expect(h).not.toMatch(/background/i);
    expect(h).toContain("&lt;x&gt;");
    expect(h).toContain("a&amp;b");
  });
  it("tableBundle round-trips numbers at the displayed precision (text, HTML, markdown)", () => {
    const rand = lcg(7);
    for (const sig of [3, 5, 7]) {
      for (const decade of [-6, -2, 0, 3, 6, 9]) {
        const values = Array.from({ length: 12 }, () => (rand() - 0.3) * 10 ** (decade + rand() * 2));
        const bundle = tableBundle(tableFromColumns([{ name: "v", values }], { sigfigs: sig }));
        const text = textCells(bundle[MIME.text] as string).map((r) => Number(r[0]));
        const html = htmlCells(bundle[MIME.html] as string).map((r) => fromHtml(r[0]!));
        const md = (bundle[MIME.markdown] as string).split("\n").slice(2).map((l) => Number(l.slice(2, -2)));
        expect(text.length).toBe(values.length);
        values.forEach((v, i) => {
          // Tolerance: half a unit in the last displayed digit (each value keeps `sig` figures).
          const tol = 0.5 * 10 ** (Math.floor(Math.log10(Math.abs(v))) - sig + 1) * (1 + 1e-9);
          for (const back of [text[i]!, html[i]!, md[i]!]) expect(Math.abs(back - v)).toBeLessThanOrEqual(tol);
        });
      }
    }
  });
  it("tableBundle rejects columns of unequal length, naming them", () => {
    expect(() => tableBundle(tableFromColumns([{ name: "T", values: [1, 2] }, { name: "P", values: [1] }])))
      .toThrow(/'T' has 2 values, 'P' has 1/);
    expect(() => tableBundle(tableFromColumns([]))).toThrow(/at least one column/);
    expect(() => tableBundle(tableFromColumns([{ name: "T", values: [1] }], { sigfigs: 0 }))).toThrow(/sigfigs.*got 0/);
  });
});

describe("tableFromRecords", () => {
  it("tableFromRecords builds columns in first-seen order with units from entries or options", () => {
    const spec = tableFromRecords(
      [{ T: { value: 300, unit: "K" }, P: 1 }, { T: { value: 350, unit: "K" }, P: 2, note: "hot" }],
      { units: { P: "MPa" } },
    );
    expect(spec.columns.map((c) => [c.name, c.unit])).toEqual([["T", "K"], ["P", "MPa"], ["note", undefined]]);
    expect(spec.columns[2]!.values).toEqual([undefined, "hot"]);
    expect(tableBundle(spec)[MIME.text]).toContain("—");
  });
  it("tableFromRecords refuses a column with two units", () => {
    expect(() => tableFromRecords([{ T: { value: 1, unit: "K" } }, { T: { value: 2, unit: "degC" } }]))
      .toThrow(/column 'T' mixes units: 'K' and 'degC' \(row 2\)/);
  });
});

describe("tableFromRecord", () => {
  it("tableFromRecord lists one record as quantity / value / unit rows", () => {
    const spec = tableFromRecord({ T: { value: 300, unit: "K" }, Z: 0.95, phase: "vapor" });
    const text = tableBundle(spec)[MIME.text] as string;
    expect(text.split("\n")[0]).toMatch(/^quantity\s+value\s+unit$/);
    expect(text).toMatch(/T\s+300\.00\s+K/);
    expect(text).toMatch(/phase\s+vapor/);
  });
});
