import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { installUnits } from "../../../lib/units/index.js";
import { createFormatter } from "../../../lib/language/format.js";
import { createUnitsBridge } from "../../../lib/language/unitsBridge.js";
import { createColumnFactory } from "../../../lib/language/values/column.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
installUnits(math);
const f = createFormatter(math, createUnitsBridge(math));

describe("createFormatter", () => {
  it("text shows quantities in the user's unit and numbers with 6 significant figures", () => {
    expect(f.text(math.unit(25, "degC"))).toBe("25 degC");
    expect(f.text(1 / 3)).toBe("0.333333");
    expect(f.text(1.5e-7)).toBe("1.5e-7");
  });
  it("text prints arrays of one unit compactly and elides long ones", () => {
    expect(f.text([math.unit(1, "bar"), math.unit(2, "bar")])).toBe("[1, 2] bar");
    const long = f.text(Array.from({ length: 20 }, (_, i) => i));
    expect(long).toBe("[0, 1, 2, 3, 4, 5, ..., 17, 18, 19] (20 values)");
  });
  it("text shows results of arithmetic in messy compound units in their dimension's unit (scalars and arrays)", () => {
    // 100e5 Pa x 1 m^3 / (8.314462618 J/(mol K) x 3000 mol) = 400.908 K (python3, CODATA R).
    expect(f.text(math.evaluate("(100 bar) * (1 m^3) / ((8.314462618 J/(mol K)) * (3 kmol))"))).toBe("400.908 K");
    // 1 bar x 3 L = 300 J, 2 bar x 3 L = 600 J (bar = 1e5 Pa, L = 1e-3 m^3).
    expect(f.text(math.evaluate("[1, 2] bar * (3 L)"))).toBe("[300, 600] J");
    // a unit the user converted to is kept.
    expect(f.text(math.evaluate("(2 bar) * (3 L) to bar L"))).toBe("6 bar L");
  });
  it("text prints a column with its count", () => {
    const col = createColumnFactory(math)(Float64Array.from({ length: 100 }, (_, i) => 300 + i), "K", "K");
    expect(f.text(col)).toBe("[300, 301, 302, 303, 304, 305, ..., 397, 398, 399] K (100 values)");
  });
  it("bundle shows records as aligned two-column text and an HTML table", () => {
    const b = f.bundle({ T: math.unit(300, "K"), phase: "gas" });
    expect(b["text/plain"]).toBe("T      300 K\nphase  gas");
    expect(String(b["text/html"])).toMatch(/<table.*<th[^>]*>T<\/th><td[^>]*>300 K<\/td>/);
  });
  it("bundle adds LaTeX for quantities", () => {
    expect(f.bundle(math.unit(2, "m^3/mol"))["text/latex"]).toBe("$2\\ \\mathrm{m^{3}\\,/\\,mol}$");
  });
  it("bundle uses RichValue.toBundle for opaque values", () => {
    expect(f.bundle({ kind: "model", toBundle: () => ({ "text/plain": "PR" }), toText: () => "PR" })).toEqual({ "text/plain": "PR" });
  });
});

describe("createFormatter latex", () => {
  it("bundle writes LaTeX with the same number and cancelled unit as the text", () => {
    const q = math.evaluate("8.314 J/(mol K) * 300 K"); // 8.314 x 300 = 2494.2, K cancels
    const b = f.bundle(q);
    expect(b["text/plain"]).toBe("2494.2 J / mol");
    expect(b["text/latex"]).toBe("$2494.2\\ \\mathrm{J\\,/\\,mol}$");
  });
});
