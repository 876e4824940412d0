import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";

describe("isComplete", () => {
  const s = createSession({ shouldStop: () => false });
  it("isComplete says incomplete for open brackets, open strings and trailing operators", () => {
    expect(s.isComplete("f(1,").status).toBe("incomplete");
    expect(s.isComplete("x = [1, 2").status).toBe("incomplete");
    expect(s.isComplete('x = "abc').status).toBe("incomplete");
    expect(s.isComplete("x = 1 +").status).toBe("incomplete");
    expect(s.isComplete("x = 3 bar to").status).toBe("incomplete");
  });
  it("isComplete says invalid for unbalanced closers and unparsable statements", () => {
    expect(s.isComplete("1 + 2)").status).toBe("invalid");
    expect(s.isComplete("x = (1 ]").status).toBe("invalid");
    expect(s.isComplete("x = 1 * * 2").status).toBe("invalid");
  });
  it("isComplete says complete for finished cells, comments included", () => {
    expect(s.isComplete("a = 1\nb = a + 1 # done").status).toBe("complete");
    expect(s.isComplete("").status).toBe("complete");
  });
  it("isComplete says complete for help queries (?name, name?), whatever the name", () => {
    for (const code of ["?state", "state?", "R?", "? psat", "?nosuch"]) expect(s.isComplete(code).status, code).toBe("complete");
    // A question mark inside an expression is still judged by the parser.
    expect(s.isComplete("a ? b").status).not.toBe("complete");
  });
});
