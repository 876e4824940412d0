import { describe, expect, it } from "vitest";
import { compact, MAX_ELEMENTS } from "../../../lib/language/guards.js";
import { createSession } from "../../../lib/language/index.js";

const sink = { stdout() {}, display() {}, clear() {} };
const s = createSession({ shouldStop: () => false });
const run = (code: string) => {
  const r = s.run(code, sink);
  return r.ok ? r.result?.["text/plain"] : `${r.error.ename}: ${r.error.evalue}`;
};

describe("sizeGuards", () => {
  it("sizeGuards refuse a huge range with its size and the limit", () => {
    expect(run("1:1e9")).toBe("ArgumentError: range 1:1e9 has 1e9 elements; the limit is 1e7 (line 1, column 2)"); // caret on the colon
    expect(run("x = 1:2:1e9")).toMatch(/^ArgumentError: range 1:2:1e9 has 5e8 elements; the limit is 1e7/);
    expect(run("range(1, 1e9)")).toMatch(/range 1:1e9 has 1e9 elements/); // in cells range() includes its end too
    expect(run('range("0:1e8")')).toMatch(/range 0:1e8 has 1.00000001e8 elements/); // 0 to 1e8 inclusive
    expect(run("1:(1e7 + 1)")).toMatch(/has 1.0000001e7 elements/);
  });
  it("sizeGuards errors point at the range in the source", () => {
    const r = s.run("n = 2\nx = 1 + sum(1:1e9)", sink);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.traceback.slice(-2)).toEqual(["    x = 1 + sum(1:1e9)", "                 ^"]);
    const q = s.run('y = range("1:1e9")', sink);
    if (!q.ok) expect(q.error.traceback.slice(-1)).toEqual(["        ^^^^^"]);
  });
  it("sizeGuards keep ordinary ranges as mathjs makes them", () => {
    expect(run("1:3")).toBe("[1, 2, 3]"); // the operator includes its end
    expect(run("range(1, 3)")).toBe("[1, 2, 3]"); // in expressions range() includes its end as well (mathjs transform)
    expect(run("range(1, 3, 1, false)")).toBe("[1, 2]"); // unless told not to
    expect(run("1:0.5:2")).toBe("[1, 1.5, 2]");
    expect(run("1 m : 1 m : 3 m")).toBe("[1, 2, 3] m");
    expect(run("size(1:1e7)")).toBe("[10000000]");
  });
  it("sizeGuards refuse huge matrices from zeros, ones, identity, random, resize, diag, kron", () => {
    expect(run("zeros(1e9)")).toMatch(/^ArgumentError: zeros\(\): size 1e9 would make 1e9 elements; the limit is 1e7/);
    expect(run("ones(1e4, 1e4)")).toMatch(/ones\(\): size 10000, 10000 would make 1e8 elements/);
    expect(run("zeros([1e5, 1e3])")).toMatch(/size \[100000, 1000\] would make 1e8 elements/);
    expect(run("identity(1e4)")).toMatch(/identity\(\): .* 1e8 elements/);
    expect(run("random([1e8])")).toMatch(/random\(\): size \[1e8\]/);
    expect(run("resize([1], [1e9])")).toMatch(/resize\(\): size \[1e9\]/);
    expect(run("diag(1:1e4)")).toMatch(/diag\(\): .* 1e8 elements/);
    expect(run("kron(1:1e4, 1:1e4)")).toMatch(/kron\(\): .* 1e8 elements/);
    expect(run("a = 1:6e6; concat(a, a)")).toMatch(/concat\(\): joining 2 arrays would make 1.2e7 elements/);
  });
  it("sizeGuards keep small matrices working", () => {
    expect(run("ones(2, 3)")).toBe("[[1, 1, 1],\n [1, 1, 1]]");
    expect(run("identity(2)")).toBe("[[1, 0],\n [0, 1]]");
    expect(run("size(zeros(10, 10))")).toBe("[10, 10]");
    expect(run("diag([1, 2])")).toBe("[[1, 0],\n [0, 2]]");
    expect(run("concat([[1, 2]], [[3, 4]], 1)")).toBe("[[1, 2],\n [3, 4]]"); // in cells the dimension counts from 1
    expect(run("concat([1], [2, 3])")).toBe("[1, 2, 3]");
  });
  it("compact writes counts exactly and briefly", () => {
    expect(compact(1e9)).toBe("1e9");
    expect(compact(10_000_001)).toBe("1.0000001e7");
    expect(compact(42)).toBe("42");
    expect(compact(MAX_ELEMENTS)).toBe("1e7");
  });
});
