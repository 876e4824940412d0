import { describe, expect, it } from "vitest";
import { physicalZRoots } from "../../../../lib/thermo/eos/cubicZ.js";
import { cubicRoots } from "../../../../lib/numerics/index.js";

/** Monic cubic through roots r1, r2, r3: (z - r1)(z - r2)(z - r3) (exact expansion). */
function through(r1: number, r2: number, r3: number): [number, number, number] {
  return [-(r1 + r2 + r3), r1 * r2 + r1 * r3 + r2 * r3, -r1 * r2 * r3];
}

describe("physicalZRoots", () => {
  const out = new Float64Array(3);

  it("physicalZRoots returns three known roots ascending (constructed cubic (z-0.1)(z-0.5)(z-1))", () => {
    const n = physicalZRoots(...through(0.1, 0.5, 1), 0, out);
    expect(n).toBe(3);
    // Expected roots are the construction's own (exact by construction); 1e-14 absolute.
    expect(Math.abs(out[0]! - 0.1)).toBeLessThan(1e-14);
    expect(Math.abs(out[1]! - 0.5)).toBeLessThan(1e-14);
    expect(Math.abs(out[2]! - 1)).toBeLessThan(1e-14);
  });

  it("physicalZRoots drops roots at or below B (V <= b is unphysical)", () => {
    expect(physicalZRoots(...through(0.1, 0.5, 1), 0.2, out)).toBe(2);
    expect(out[0]).toBeCloseTo(0.5, 14);
    expect(physicalZRoots(...through(0.1, 0.5, 1), 1.5, out)).toBe(0);
  });

  it("physicalZRoots finds the one real root of (z - 2)(z^2 + 1) = z^3 - 2z^2 + z - 2", () => {
    expect(physicalZRoots(-2, 1, -2, 0, out)).toBe(1);
    expect(Math.abs(out[0]! - 2)).toBeLessThan(1e-15);
  });

  it("physicalZRoots resolves a low-pressure pair of small roots next to Z ~ 1 to full relative precision", () => {
    // Roots 1e-5 and 2e-5 beside 0.999: the trigonometric form alone loses about 1e-11 relative on
    // the small ones; the Newton polish recovers them (constructed cubic, expected roots exact).
    const n = physicalZRoots(...through(1e-5, 2e-5, 0.999), 0, out);
    expect(n).toBe(3);
    expect(Math.abs(out[0]! / 1e-5 - 1)).toBeLessThan(1e-12);
    expect(Math.abs(out[1]! / 2e-5 - 1)).toBeLessThan(1e-12);
  });

  it("physicalZRoots agrees with lib/numerics cubicRoots (filtered to z > B) on 2,000 random Peng-Robinson cubics", () => {
    let s = 7;
    const rnd = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 4294967296);
    let compared = 0;
    for (let k = 0; k < 2000; k++) {
      // Peng-Robinson coefficients (eps = 1 - sqrt 2, sig = 1 + sqrt 2) over A in (0, 2), B in (0, 0.3).
      const A = 2 * rnd();
      const B = 0.3 * rnd();
      const c2 = B - 1;
      const c1 = A - 3 * B * B - 2 * B;
      const c0 = -(A * B - B * B - B * B * B);
      const ref = cubicRoots(c2, c1, c0).filter((z) => z > B);
      const uniq = ref.filter((z, i) => i === 0 || z - ref[i - 1]! > 1e-12 * z);
      const n = physicalZRoots(c2, c1, c0, B, out);
      // Near-tangent cubics (a pair within 1e-6) are conditioned at sqrt(eps): the two may count differently.
      const tangent = uniq.some((z, i) => i > 0 && z - uniq[i - 1]! < 1e-6);
      if (tangent) continue;
      expect(n).toBe(uniq.length);
      for (let i = 0; i < n; i++) expect(Math.abs(out[i]! / uniq[i]! - 1)).toBeLessThan(1e-13);
      compared++;
    }
    expect(compared).toBeGreaterThan(1900);
  });
});
