import { describe, expect, it } from "vitest";
import * as numerics from "../../../lib/numerics/index.js";

describe("lib/numerics index", () => {
  it("index exports the public API, with seek as Brent's method", () => {
    for (const name of ["integrate", "brent", "seek", "newtonSafe", "cubicRoots", "derivative", "StopRequested", "IntegrationError"]) {
      expect(typeof (numerics as Record<string, unknown>)[name]).toBe("function");
    }
    expect(numerics.seek((x) => x - 2, 0, 5).value).toBe(2);
  });
});
