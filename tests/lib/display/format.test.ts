import { describe, expect, it } from "vitest";
import { columnNotation, formatCell, formatNumber, htmlNumber, shortNumber } from "../../../lib/display/format.js";

describe("formatNumber", () => {
  it("formatNumber keeps the requested significant figures in fixed notation", () => {
    // Rounding to n significant figures (arithmetic definition; ISO 80000-1 Annex B rounding rules).
    expect(formatNumber(101325, 5)).toBe("101330");
    expect(formatNumber(8.314462618, 5)).toBe("8.3145");
    expect(formatNumber(0.0123456, 3)).toBe("0.0123");
    expect(formatNumber(-273.16, 4)).toBe("-273.2"); // (-273.15 is stored as -273.1499..., so it would round down)
  });
  it("formatNumber carries a rounding into the next decade without an extra digit", () => {
    // 9.99996 to 5 significant figures is 10.000 (5 digits), not 10.0000.
    expect(formatNumber(9.99996, 5)).toBe("10.000");
    expect(formatNumber(0.099999, 3)).toBe("0.100");
  });
  it("formatNumber uses exponent form outside 1e-3..1e7 and parses back", () => {
    expect(formatNumber(2.5e-5, 3)).toBe("2.50e-5");
    expect(formatNumber(6.02214076e23, 4)).toBe("6.022e+23");
    expect(Number(formatNumber(6.02214076e23, 4))).toBeCloseTo(6.022e23, -19);
  });
  it("formatNumber spells non-finite values", () => {
    expect(formatNumber(NaN)).toBe("NaN");
    expect(formatNumber(Infinity)).toBe("inf");
    expect(formatNumber(-Infinity)).toBe("-inf");
  });
});

describe("columnNotation", () => {
  it("columnNotation switches the whole column when one value needs an exponent", () => {
    expect(columnNotation([1, 250, 3e5], 4)).toBe("fixed");
    expect(columnNotation([1, 250, 3e8], 4)).toBe("exponential");
    expect(columnNotation([0, null, "x", 1e-4], 4)).toBe("exponential");
    expect(columnNotation([0, NaN], 4)).toBe("fixed");
  });
});

describe("formatCell", () => {
  it("formatCell shows empty cells as a dash and passes text through", () => {
    expect(formatCell(null, 4, "fixed")).toBe("—");
    expect(formatCell(undefined, 4, "fixed")).toBe("—");
    expect(formatCell("vapor", 4, "fixed")).toBe("vapor");
    expect(formatCell(true, 4, "fixed")).toBe("true");
    expect(formatCell(12345.6, 3, "exponential")).toBe("1.23e+4");
  });
});

describe("shortNumber", () => {
  it("shortNumber trims trailing zeros for labels", () => {
    expect(shortNumber(1.5)).toBe("1.5");
    expect(shortNumber(2)).toBe("2");
    expect(shortNumber(0.000123456)).toBe("1.235e-4");
    expect(shortNumber(1e9)).toBe("1e+9");
  });
});

describe("htmlNumber", () => {
  it("htmlNumber writes exponents as powers of ten and escapes text", () => {
    expect(htmlNumber("2.50e-5")).toBe("2.50&times;10<sup>&minus;5</sup>");
    expect(htmlNumber("1.0e+3")).toBe("1.0&times;10<sup>3</sup>");
    expect(htmlNumber("<b>")).toBe("&lt;b&gt;");
  });
});
