import { describe, expect, it } from "vitest";
import { DerivativeError, IntegrationError, NumericsError, NumericsInputError, RootError, StopRequested } from "../../../lib/numerics/index.js";

describe("errors", () => {
  it("NumericsError subclasses carry their names and data", () => {
    const e = new IntegrationError("integrate: x", 1.5, 0.1, 42);
    expect(e).toBeInstanceOf(NumericsError);
    expect(e.name).toBe("IntegrationError");
    expect([e.value, e.error, e.evaluations]).toEqual([1.5, 0.1, 42]);
    expect(new RootError("seek: x", 2, 7).name).toBe("RootError");
    expect(new NumericsInputError("m").name).toBe("NumericsInputError");
    expect(new DerivativeError("m")).toBeInstanceOf(NumericsError);
  });
  it("StopRequested is not a NumericsError (an interrupt is not a failure)", () => {
    const s = new StopRequested("integrate");
    expect(s).not.toBeInstanceOf(NumericsError);
    expect(s.message).toBe("integrate: stopped on request (interrupt)");
  });
});
