import { describe, expect, it } from "vitest";
import { normalizeSymbols, offsetOf, placeOnOriginal } from "../../../lib/language/symbols.js";
import { LanguageError } from "../../../lib/language/errors.js";
import { createSession } from "../../../lib/language/index.js";

describe("normalizeSymbols", () => {
  it("normalizeSymbols rewrites degree signs, ×, ÷, middle dots, superscripts, micro and minus signs", () => {
    expect(normalizeSymbols("25 °C + 77 °F + 5 ℃ + 1 ℉ + 491.67 °R + 90°").code).toBe("25 degC + 77 degF + 5 degC + 1 degF + 491.67 degR + 90deg");
    expect(normalizeSymbols("5 × 3 ÷ 2 · 1 ⋅ 4 − 1").code).toBe("5 * 3 / 2 * 1 * 4 - 1");
    expect(normalizeSymbols("2 m² + 1 m³ + 3 µm").code).toBe("2 m^2 + 1 m^3 + 3 um");
  });
  it("normalizeSymbols leaves strings, comments and plain cells alone", () => {
    expect(normalizeSymbols('echo("25 °C × 2") # 25 °C').code).toBe('echo("25 °C × 2") # 25 °C');
    const plain = normalizeSymbols("x = 25 degC");
    expect(plain.changed).toBe(false);
    expect(plain.original(4)).toBe(4);
  });
  it("normalizeSymbols maps every rewritten offset back to the character it came from", () => {
    const n = normalizeSymbols("a = 25 °C × foo");
    expect(n.code).toBe("a = 25 degC * foo");
    expect(n.original(n.code.indexOf("degC"))).toBe(7);
    expect(n.original(n.code.indexOf("foo"))).toBe("a = 25 °C × foo".indexOf("foo"));
    expect(n.original(n.code.length)).toBe("a = 25 °C × foo".length);
  });
});

describe("offsetOf", () => {
  it("offsetOf turns a line and code-point column into a UTF-16 offset", () => {
    expect(offsetOf("ab\ncd", 2, 2)).toBe(4);
    expect(offsetOf("𝑥y\nz", 1, 2)).toBe(2); // 𝑥 is two UTF-16 units
  });
});

describe("placeOnOriginal", () => {
  it("placeOnOriginal moves the caret back to the user's text", () => {
    const original = "x = 1\ny = 5 × foo";
    const n = normalizeSymbols(original);
    const col = Array.from("y = 5 * ").length + 1;
    const moved = placeOnOriginal(new LanguageError("unknown", 2, col, "y = 5 * foo", 3, "NameError"), n, original);
    expect([moved.line, moved.column, moved.sourceLine, moved.caretWidth]).toEqual([2, col, "y = 5 × foo", 3]);
  });
  it("run: an error after a rewritten symbol points at the user's column", () => {
    const s = createSession({ shouldStop: () => false });
    const r = s.run("T = 25 °C\nx = T × nosuchname", { stdout() {}, display() {}, clear() {} });
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.traceback.slice(1)).toEqual(["  line 2, column 9:", "    x = T × nosuchname", "            ^^^^^^^^^^"]);
    }
  });
});
