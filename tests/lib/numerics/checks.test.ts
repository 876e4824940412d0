import { describe, expect, it } from "vitest";
import { describe as describeValue, optionCount, optionNumber, requireKnownOptions, requireNumber, stopper } from "../../../lib/numerics/checks.js";
import { NumericsInputError, StopRequested } from "../../../lib/numerics/index.js";

describe("checks", () => {
  it("requireNumber names routine, argument, expectation and what came", () => {
    expect(() => requireNumber("seek", "lo", "3")).toThrow('seek: argument \'lo\' must be a finite number; got string "3"');
    expect(requireNumber("integrate", "b", Infinity, true)).toBe(Infinity);
  });
  it("optionNumber and optionCount apply fallbacks and ranges", () => {
    expect(optionNumber("w", "rel", undefined, 1e-10, 0)).toBe(1e-10);
    expect(() => optionNumber("w", "h", 0, 1, 0, true)).toThrow(NumericsInputError);
    expect(() => optionCount("w", "maxIter", 2.5, 1)).toThrow(/integer >= 1; got 2.5/);
  });
  it("requireKnownOptions rejects typos and lists valid names", () => {
    expect(() => requireKnownOptions("w", { tol: 1 }, ["abs", "rel"])).toThrow("w: unknown option 'tol'; valid options are abs, rel");
  });
  it("stopper throws StopRequested only once shouldStop says so", () => {
    let stop = false;
    const poll = stopper("w", () => stop);
    expect(() => poll()).not.toThrow();
    stop = true;
    expect(() => poll()).toThrow(StopRequested);
    expect(() => stopper("w", 1)).toThrow(/option 'shouldStop' must be a function/);
  });
  it("describe prints values compactly", () => {
    expect(describeValue(null)).toBe("null");
    expect(describeValue([1])).toBe("an array");
  });
});
