import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";
import { createSessionWithInternals } from "../../../lib/language/createSession.js";
import { rejectAssignments } from "../../../lib/language/expression.js";
import { LanguageError } from "../../../lib/language/errors.js";

const sink = { stdout() {}, display() {}, clear() {} };

describe("rejectAssignments", () => {
  const { internals } = createSessionWithInternals({ shouldStop: () => false });
  it("rejectAssignments refuses assignments, field assignments and function definitions anywhere in the tree", () => {
    for (const code of ["x = 5", "r.a = 2", "f(y) = 2", "map([1, 2], g(t) = t^2)", "1 + (z = 3)", "a = 1; b"]) {
      expect(() => rejectAssignments(code, internals.parse), code).toThrow(LanguageError);
    }
  });
  it("rejectAssignments names what the statement would change and points at it", () => {
    try {
      rejectAssignments("y + 1\n  x = 5", internals.parse);
      expect.unreachable();
    } catch (e) {
      const ce = (e as LanguageError).toCellError();
      expect(ce.ename).toBe("AssignmentError");
      expect(ce.evalue).toMatch(/must not assign: "x = 5" would change x/);
      expect(ce.evalue).toMatch(/\(line 2, column 3\)$/);
    }
  });
  it("rejectAssignments lets reading expressions, comparisons and syntax errors through", () => {
    for (const code of ["x + 1", "x == 5", "s.T to degC", "f(2)", "1 +* 2"]) expect(() => rejectAssignments(code, internals.parse), code).not.toThrow();
  });
});

describe("evaluateExpression", () => {
  it("evaluateExpression refuses {c: 'x = 5'} and leaves x unchanged", () => {
    const s = createSession({ shouldStop: () => false });
    s.run("x = 1", sink);
    const r = s.evaluateExpression("x = 5");
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.ename).toBe("AssignmentError");
    const after = s.run("x", sink);
    expect(after.ok && after.result!["text/plain"]).toBe("1");
  });
  it("evaluateExpression does not define functions, even inline ones", () => {
    const s = createSession({ shouldStop: () => false });
    expect(s.evaluateExpression("map([1, 2], g(t) = t^2)").ok).toBe(false);
    const r = s.run("g(2)", sink);
    expect(r.ok).toBe(false);
  });
  it("evaluateExpression reads the scope and returns the value", () => {
    const s = createSession({ shouldStop: () => false });
    s.run("p = 2 bar", sink);
    const r = s.evaluateExpression("p to kPa");
    // 2 bar = 200 kPa (bar = 1e5 Pa, NIST SP 811 B.8).
    expect(r.ok && r.result!["text/plain"]).toBe("200 kPa");
  });
});
