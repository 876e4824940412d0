import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { autoNumberText } from "../../../lib/language/numberText.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
// The reference is mathjs's own format with the options the language uses (format.ts).
const reference = (x: number, precision = 6) => math.format(x, { precision, lowerExp: -4, upperExp: 9 });

/** Deterministic pseudo-random numbers (mulberry32): a failing value can be reproduced. */
function random(seed: number): () => number {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("autoNumberText", () => {
  it("autoNumberText equals mathjs format on rounding edges and notation boundaries", () => {
    const edges = [
      1 / 3, 2 / 3, 1.2345665, 1.2345655, 0.1234565, 9.999995, 9.9999949, 99999.95, 999999.5, 0.00099999995,
      1e-4, 9.99999e-5, 0.0001234565, 1e9, 999999999, 999999999.5, 1e21, 1.5e-7, 123456789012, 5e-324,
      1.7976931348623157e308, 42, 100, 1000000, 2494.2, 0.0093924, 8.314462618, 101325, 6.02214076e23,
    ];
    for (const x of edges) for (const s of [x, -x]) expect(autoNumberText(s, 6, -4, 9), String(s)).toBe(reference(s));
  });
  it("autoNumberText equals mathjs format on 100,000 random numbers over 40 decades and short decimals", () => {
    const r = random(20260101);
    for (let i = 0; i < 100_000; i++) {
      const x = i % 2 === 0
        ? (r() < 0.5 ? -1 : 1) * r() * 10 ** Math.floor(r() * 40 - 20)
        : Math.round(r() * 1e8) / 10 ** Math.floor(r() * 10); // decimals as typed: ties at the 7th digit
      const want = reference(x);
      const got = autoNumberText(x, 6, -4, 9) ?? want;
      if (got !== want) expect(got, `x = ${x}`).toBe(want);
    }
  });
  it("autoNumberText leaves 0 and non-finite values to mathjs", () => {
    for (const x of [0, -0, NaN, Infinity, -Infinity]) expect(autoNumberText(x, 6, -4, 9)).toBeUndefined();
  });
});
