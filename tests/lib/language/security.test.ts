/**
 * Escape attempts kept as regressions: no expression may reach JavaScript constructors, prototypes,
 * the parser, the process, the file system or the network, and abuse must end in a clean error with
 * the session still usable.
 */
import { afterAll, describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";

const session = createSession({ shouldStop: () => false });
const sink = { stdout() {}, display() {}, clear() {} };
const run = (code: string) => session.run(code, sink);

const MUST_FAIL: [string, RegExp][] = [
  ["cos.constructor", /not allowed|no access/i],
  ['cos.constructor("return process")', /not allowed|no access/i],
  ['cos.constructor("return process")()', /.+/],
  ["[].constructor", /not allowed|no access/i],
  ['"abc".constructor', /not allowed|no access/i],
  ['x = {}; x.constructor', /not allowed|no access/i],
  ['x = {}; x["constructor"]', /not allowed|no access/i],
  ['x = {}; x.__proto__', /not allowed|no access/i],
  ['x = {}; x.__proto__.polluted = 1', /not allowed|no access/i],
  ['x = {}; x["__proto__"]["polluted"] = 1', /not allowed|no access/i],
  ['x = {}; x.__defineGetter__', /not allowed|no access/i],
  ["f(x) = x; f.constructor", /not allowed|no access/i],
  ['f(x) = x; f.call', /not allowed|no access/i],
  ['f(x) = x; f.apply(1, [2])', /not allowed|no access/i],
  ["cos.bind", /not allowed|no access/i],
  ['(1 K).constructor', /not allowed|no access/i],
  ['(1 K).clone.constructor', /not allowed|no access/i],
  ['span.constructor("return 1")', /not allowed|no access/i],
  ['import({evil: 1})', /not available/],
  ['createUnit("evil")', /not available/],
  ['evaluate("1 + 1")', /not available/],
  ['parse("1 + 1")', /not available/],
  ['compile("1 + 1")', /not available/],
  ['simplify("x + x")', /not available/],
  ['derivative("x^2", "x")', /not available/],
  ['resolve("x", {x: 1})', /not available/],
  ['rationalize("1/x")', /not available/],
  ['config({number: "BigNumber"})', /not available/],
  ["process", /unknown name/],
  ["require", /unknown name/],
  ["globalThis", /unknown name/],
  ["this", /unknown name/],
  ['Function("return 1")', /unknown function|unknown name/],
  ["f(x) = f(x); f(1)", /nested|calls itself/],
  ["(".repeat(100_000) + "1" + ")".repeat(100_000), /nested more than/],
  ["[".repeat(5000) + "1" + "]".repeat(5000), /nested more than/],
  ["-".repeat(100_000) + "1", /nested|calls itself|.+/],
];

describe("security", () => {
  for (const [code, why] of MUST_FAIL) {
    it(`run refuses: ${code.length > 60 ? code.slice(0, 40) + "... (" + code.length + " chars)" : code}`, () => {
      const r = run(code);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.error.evalue).toMatch(why);
    });
  }

  it("run keeps the session usable after every escape attempt", () => {
    expect(run("y = 2 + 3\ny")).toEqual({ ok: true, result: { "text/plain": "5" } });
  });

  afterAll(() => {
    // No attempt may have touched the JavaScript prototypes.
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(Object.prototype.hasOwnProperty.call(Object.prototype, "polluted")).toBe(false);
  });
});
