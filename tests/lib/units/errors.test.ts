import { describe, expect, it } from "vitest";
import { UnitsError } from "../../../lib/units/errors.js";

describe("UnitsError", () => {
  it("UnitsError carries its name, code and message", () => {
    const e = new UnitsError("wrong_dimension", "argument P of state() needs a pressure");
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe("UnitsError");
    expect(e.code).toBe("wrong_dimension");
    expect(e.message).toContain("argument P");
  });
});
