import { describe, expect, it } from "vitest";
import { MIME, renderPending, type MimeBundle } from "../../../../lib/display/index.js";
import { createSession } from "../../../../lib/language/index.js";

function run(code: string) {
  const s = createSession({ shouldStop: () => false });
  const shown: MimeBundle[] = [];
  const r = s.run(code, { stdout() {}, display: (b) => shown.push(b), clear() {} });
  return { r, shown, result: r.ok ? r.result : undefined, error: r.ok ? undefined : r.error.evalue };
}

/** Body rows of an aligned text table, cells split on runs of 2+ spaces. */
const rows = (text: string) => text.split("\n").slice(2).map((l) => l.trim().split(/ {2,}/));

describe("table", () => {
  it("table lays out columns with units in headers and repeats a single value", () => {
    const { result } = run("table({P: span(1 bar, 10 bar, 4), T: 300 K})");
    const text = result![MIME.text] as string;
    expect(text.split("\n")[0]).toMatch(/^P \[bar\]\s+T \[K\]$/);
    expect(rows(text)).toEqual([["1.0000", "300.00"], ["4.0000", "300.00"], ["7.0000", "300.00"], ["10.000", "300.00"]]);
    expect(result![MIME.html]).toContain("<table");
    expect(result![MIME.markdown]).toContain("| P [bar] | T [K] |");
  });
  it("table converts rows to a requested unit and keeps offsets (degC)", () => {
    // 1 bar = 100 kPa exactly (SI Brochure, 9th ed., Table 8); 300 K = 26.85 degC (definition of degC).
    const { result } = run('table([{T: 300 K, P: 1 bar}, {T: 350 K, P: 2 bar}], {units: {P: "kPa", T: "degC"}, sigfigs: 4})');
    const text = result![MIME.text] as string;
    expect(text.split("\n")[0]).toMatch(/T \[degC\]\s+P \[kPa\]/);
    expect(rows(text)).toEqual([["26.85", "100.0"], ["76.85", "200.0"]]);
  });
  it("table shows one record as quantity / value / unit", () => {
    const { result } = run('table({T: 25 degC, P: 2 bar, phase: "gas"}, {title: "Inlet"})');
    const text = result![MIME.text] as string;
    expect(text).toMatch(/^Inlet\nquantity\s+value\s+unit/);
    expect(text).toMatch(/T\s+25\.000\s+degC/);
  });
  it("table names what is wrong", () => {
    expect(run("table({a: [1, 2], b: [1, 2, 3]})").error).toMatch(/columns must have equal length; b has 3 values, a has 2/);
    expect(run("table(5)").error).toMatch(/needs a record of columns, a list of records or one record, got 5/);
    expect(run('table({P: [1, 2] bar}, {units: {P: "K"}})').error).toMatch(/P\[1\] is bar, which cannot be shown in "K"/);
    expect(run("table({a: [1, 2]}, {colour: 1})").error).toMatch(/unknown option colour; options are title, sigfigs, units, note/);
    expect(run("table({a: [1, 2]}, {sigfigs: 0})").error).toMatch(/sigfigs must be a whole number from 1 to 17, got 0/);
  });
});

describe("chart", () => {
  it("chart returns a Vega-Lite chart with unit-carrying axis titles that renders to SVG and PNG", async () => {
    const { result } = run('chart(span(1 bar, 100 bar, 50), {"300 K": span(1, 0.8, 50), "400 K": span(1, 0.9, 50)}, {ylabel: "Z", log: "x", title: "Z"})');
    const spec = result![MIME.vegalite] as { encoding: { x: { title: string; scale: { type: string } }; y: { title: string } }; data: { values: unknown[] } };
    expect(spec.encoding.x.title).toBe("pressure [bar]");
    expect(spec.encoding.x.scale.type).toBe("log");
    expect(spec.encoding.y.title).toBe("Z");
    expect(spec.data.values).toHaveLength(100);
    const done = await renderPending(result!);
    expect(done[MIME.svg]).toContain("pressure [bar]");
    expect(typeof done[MIME.png]).toBe("string");
  });
  it("chart puts every series in the first series' unit", () => {
    // 2 degC = 275.15 K (definition of the Celsius scale).
    const { result } = run("chart([1, 2] bar, {a: [1, 2] K, b: [2, 3] degC}, {xunit: \"kPa\"})");
    const spec = result![MIME.vegalite] as { data: { values: { x: number; y: number; series: string }[] }; encoding: { x: { title: string }; y: { title: string } } };
    expect(spec.encoding.x.title).toBe("pressure [kPa]");
    expect(spec.encoding.y.title).toBe("temperature [K]");
    const b = spec.data.values.filter((v) => v.series === "b");
    expect(b.map((v) => v.x)).toEqual([100, 200]);
    expect(b[0]!.y).toBeCloseTo(275.15, 9);
  });
  it("chart names what is wrong", () => {
    expect(run("chart([1, 2, 3] bar, [1, 2] K)").error).toMatch(/x has 3 values but series y has 2/);
    expect(run('chart([1, 2] bar, [1, 2] K, {log: "z"})').error).toMatch(/option log must be "x", "y" or "xy", got "z"/);
    expect(run('chart([0, 2] bar, [1, 2] K, {log: "x"})').error).toMatch(/x axis is logarithmic but series 'y' has x\[0\] = 0/);
    expect(run("chart([1, 2] bar, [1 K, 2 bar])").error).toMatch(/y\[2\] is bar, which cannot be shown in "K"/);
  });
});

describe("verify", () => {
  const check = (code: string) => {
    const { shown, error, r } = run(code);
    if (error) throw new Error(error);
    expect(r).toEqual({ ok: true });
    expect(shown).toHaveLength(1);
    return shown[0]![MIME.check] as { pass: boolean; value: number; target: number; tolerance: number; unit: string };
  };
  it("verify shows a pass/fail row with the check JSON", () => {
    expect(check('verify("stored mass", 124 kg, 125 kg, 2 kg)')).toMatchObject({ pass: true, value: 124, target: 125, tolerance: 2, unit: "kg" });
    expect(check('verify("stored mass", 122 kg, 125 kg, 2 kg)').pass).toBe(false);
  });
  it("verify reads the value in the target's unit and the tolerance as a difference", () => {
    // 305 K = 31.85 degC; a 5 degC band is a 5 K band (definition of the Celsius scale).
    const c = check('verify("T", 305 K, 30 degC, 5 K)');
    expect(c.value).toBeCloseTo(31.85, 9);
    expect(c.tolerance).toBeCloseTo(5, 12);
    expect(c.pass).toBe(true);
    expect(check('verify("T", 305 K, 30 degC, 5 degC)').tolerance).toBeCloseTo(5, 12);
    // 1 psi = 6894.757 Pa (NIST SP 811, B.9) so 1 psi = 0.06894757 bar.
    expect(check('verify("P", 10 bar, 10 bar, 1 psi)').tolerance).toBeCloseTo(0.06894757, 7);
  });
  it("verify takes a percentage of an offset target (degC, barg) of its absolute value", () => {
    // 150 degC = 423.15 K (definition of the Celsius scale): 5 % is 21.1575 K, the same band as a 423.15 K target.
    const celsius = check('verify("T", 160 degC, 150 degC, 5%, "atmost")');
    const kelvin = check('verify("T", 160 degC, 423.15 K, 5%, "atmost")');
    expect(celsius.tolerance).toBeCloseTo(21.1575, 9);
    expect(kelvin.tolerance).toBeCloseTo(21.1575, 9);
    expect(celsius.pass).toBe(true);
    // 10 barg = 11.01325 bar absolute (gauge against 1 atm = 1.01325 bar): 5 % is 0.5506625 bar.
    const gauge = check('verify("P", 10.6 barg, 10 barg, 5%, "atmost")');
    expect(gauge.tolerance).toBeCloseTo(0.5506625, 9);
    expect(gauge.pass).toBe(false);
  });
  it("verify reads a compound temperature or pressure in an offset target unit with its offset", () => {
    // PV/(nR) = 100e5 Pa x 1 m^3 / (8.314462618 J/(mol K) x 3000 mol) = 400.90785 K = 127.75785 degC
    // (python3, CODATA 2018 R); mathjs 15 alone read it as 400.908 degC.
    const c = check('verify("T", 100 bar * 1 m^3 / (8.314462618 J/(mol K) * 3 kmol), 128 degC, 1 K)');
    expect(c.value).toBeCloseTo(127.75785014980909, 9);
    expect(c.pass).toBe(true);
    // 1e6 Pa - 101325 Pa = 8.98675 barg (1 atm = 101325 Pa exact).
    expect(check('verify("P", 1e6 N / (1 m^2), 9 barg, 0.1 bar)').value).toBeCloseTo(8.98675, 10);
  });
  it("verify takes a relative tolerance as 2% or \"2%\"", () => {
    expect(check('verify("P", 10.3 bar, 10 bar, 2%)')).toMatchObject({ pass: false, tolerance: 0.2 });
    expect(check('verify("P", 10.1 bar, 10 bar, "2%")').pass).toBe(true);
    expect(check('verify("Z", 0.95, 0.9, 0.01)')).toMatchObject({ pass: false, tolerance: 0.01 });
  });
  it("verify supports limits", () => {
    expect(check('verify("T2", 150 degC, 160 degC, 0 K, "atmost")').pass).toBe(true);
    expect(check('verify("T2", 170 degC, 160 degC, 0 K, "atmost")').pass).toBe(false);
    expect(check('verify("margin", 1.1, 1.5, 0, "atleast")').pass).toBe(false);
  });
  it("verify names what is wrong", () => {
    expect(run('verify("P", 10 bar, 10 bar, 2 K)').error).toMatch(/tolerance is K, which cannot be shown in "bar"/);
    expect(run('verify("P", 10 bar, 10, 1)').error).toMatch(/value is 10 bar but target 10 has no unit/);
    expect(run('verify("P", 10 bar, 10 bar, "two")').error).toMatch(/percentage like "2%", got "two"/);
    expect(run('verify("P", 10 bar, 10 bar, 1 bar, "near")').error).toMatch(/must be one of "within", "atmost", "atleast", got "near"/);
  });
});
