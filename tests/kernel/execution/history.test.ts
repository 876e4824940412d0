import { describe, expect, it } from "vitest";
import { globToRegExp, History } from "../../../kernel/execution/index.js";

describe("History", () => {
  const h = new History();
  ["x = 1", "x + 1", "y = 2", "x + 1", "xs = span(1, 2, 3)"].forEach((c, i) => h.add(i + 1, c));

  it("History.tail returns the last n entries", () => {
    expect(h.tail(2).map((e) => e.line)).toEqual([4, 5]);
    expect(h.tail().length).toBe(5);
    expect(h.tail(0)).toEqual([]); // a tail of zero lines is empty (not "everything")
    expect(h.search("x*", 0)).toEqual([]);
  });

  it("History.range selects start <= line < stop in the current session (0 = current)", () => {
    expect(h.range(0, 2, 4).map((e) => e.line)).toEqual([2, 3]);
    expect(h.range(1, 4).map((e) => e.line)).toEqual([4, 5]);
    expect(h.range(-1, 1)).toEqual([]); // no earlier session in memory
  });

  it("History.search matches the whole input by glob, keeps the last n, and unique keeps the latest of duplicates", () => {
    expect(h.search("x*").map((e) => e.line)).toEqual([1, 2, 4, 5]);
    expect(h.search("x*", undefined, true).map((e) => e.line)).toEqual([1, 4, 5]);
    expect(h.search("x*", 2).map((e) => e.line)).toEqual([4, 5]);
    expect(h.search("?").length).toBe(0);
  });

  it("globToRegExp handles *, ?, [set], [!set] and escapes regex characters", () => {
    expect(globToRegExp("a?c").test("abc")).toBe(true);
    expect(globToRegExp("a?c").test("abbc")).toBe(false);
    expect(globToRegExp("[xy] = *").test("y = 2")).toBe(true);
    expect(globToRegExp("[!x]*").test("x")).toBe(false);
    expect(globToRegExp("f(x)+1").test("f(x)+1")).toBe(true);
    expect(globToRegExp("1*").test("1\n2")).toBe(true);
  });

  it("History.rows returns [session, line, input] or [session, line, [input, output]]", () => {
    const g = new History();
    g.add(1, "a");
    g.setOutput(1, "3");
    expect(History.rows(g.tail(), false)).toEqual([[1, 1, "a"]]);
    expect(History.rows(g.tail(), true)).toEqual([[1, 1, ["a", "3"]]]);
  });
});
