import { describe, expect, it } from "vitest";
import * as language from "../../../lib/language/index.js";

describe("createSession", () => {
  it("createSession returns the Session contract", () => {
    const s = language.createSession({ shouldStop: () => false });
    for (const m of ["run", "evaluateExpression", "complete", "inspect", "isComplete"] as const) expect(typeof s[m]).toBe("function");
    expect(language.BUILTINS.length).toBeGreaterThan(0);
    expect(typeof language.defineBuiltin).toBe("function");
  });
});
