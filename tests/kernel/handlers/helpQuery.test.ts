import { describe, expect, it } from "vitest";
import { helpTarget } from "../../../kernel/handlers/helpQuery.js";

describe("helpTarget", () => {
  it("helpTarget recognises ?name and name? and nothing else", () => {
    expect(helpTarget("?psat")).toBe("psat");
    expect(helpTarget("  psat?  ")).toBe("psat");
    expect(helpTarget("? psat")).toBe("psat");
    expect(helpTarget("psat(m, T)")).toBeUndefined();
    expect(helpTarget("a ? b")).toBeUndefined();
    expect(helpTarget("?")).toBeUndefined();
  });
});
