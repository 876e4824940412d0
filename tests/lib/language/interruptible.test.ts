import { describe, expect, it } from "vitest";
import { loadMathjs } from "../../../lib/language/mathjs.js";
import { pollInFunctionBodies } from "../../../lib/language/interruptible.js";
import { createSession } from "../../../lib/language/index.js";

const lib = loadMathjs();
const math = lib.create(lib.all, {});
const sink = { stdout() {}, display() {}, clear() {} };

describe("pollInFunctionBodies", () => {
  it("pollInFunctionBodies wraps every function definition, inline ones too", () => {
    expect(pollInFunctionBodies(math.parse("f(x) = x^2"), () => false, () => new Error("stop"))).toBe(1);
    expect(pollInFunctionBodies(math.parse("map([1, 2], f(x) = x^2) + map([3], g(y) = y)"), () => false, () => new Error("stop"))).toBe(2);
    expect(pollInFunctionBodies(math.parse("x = 2"), () => false, () => new Error("stop"))).toBe(0);
  });
  it("pollInFunctionBodies polls once per call and throws the stop error", () => {
    let polls = 0;
    const node = math.parse("f(x) = x + 1");
    pollInFunctionBodies(node, () => ++polls > 3, () => new Error("stopped here"));
    const scope = new Map<string, unknown>();
    node.compile().evaluate(scope);
    const f = scope.get("f") as (x: number) => number;
    expect(f(1)).toBe(2);
    expect(f(2)).toBe(3);
    expect(f(3)).toBe(4);
    expect(() => f(4)).toThrow("stopped here");
    expect(polls).toBe(4);
  });
  it("run stops a runaway recursive function and a mapped function on interrupt; variables survive", () => {
    let polls = 0;
    let limit = Infinity;
    const s = createSession({ shouldStop: () => ++polls > limit });
    s.run("kept = 7 bar\ng(n) = n <= 0 ? 0 : 1 + g(n - 1)", sink);
    expect(s.run("g(5)", sink)).toEqual({ ok: true, result: { "text/plain": "5" } });
    polls = 0;
    limit = 50; // the statement loop polls once; the rest are calls of g
    const r = s.run("y = g(100000)", sink);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.ename).toBe("Interrupted");
    expect(polls).toBe(51);
    polls = 0;
    const m = s.run("map(1:1000000, f(x) = x^2)", sink);
    expect(m.ok).toBe(false);
    if (!m.ok) expect(m.error.ename).toBe("Interrupted"); // mathjs rewraps callback errors; still an interrupt
    limit = Infinity;
    const k = s.run("kept", sink);
    expect(k.ok && k.result?.["text/plain"]).toBe("7 bar");
  });
});
