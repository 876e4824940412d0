import { describe, expect, it } from "vitest";
import { createSession } from "../../../lib/language/index.js";
import { checkFieldAccess, fieldNamesOf, missingField } from "../../../lib/language/fields.js";
import { createSessionWithInternals } from "../../../lib/language/createSession.js";

const sink = { stdout() {}, display() {}, clear() {} };
const run = (s: ReturnType<typeof createSession>, code: string) => {
  const r = s.run(code, sink);
  return r.ok ? (r.result?.["text/plain"] ?? "(no result)") : `${r.error.ename}: ${r.error.evalue}`;
};

describe("missingField", () => {
  it("missingField names the record, the field, close matches (case slips first) and the fields", () => {
    expect(missingField("s", "Hr", ["T", "P", "H", "HR"]).message).toBe("s has no field Hr; did you mean HR or H? fields: T, P, H, HR");
    expect(missingField("r", "zzzz", ["a", "b"]).message).toBe("r has no field zzzz; fields: a, b");
    expect(missingField("r", "a", []).message).toBe("r has no field a; it has no fields");
  });
});

describe("fieldNamesOf", () => {
  it("fieldNamesOf lists plain record keys and RichValue fields(), nothing for other values", () => {
    expect(fieldNamesOf({ a: 1, b: 2 })).toEqual(["a", "b"]);
    expect(fieldNamesOf({ kind: "x", toBundle: () => ({ "text/plain": "" }), toText: () => "", fields: () => ["T", "P"] })).toEqual(["T", "P"]);
    expect(fieldNamesOf(5)).toBeUndefined();
    expect(fieldNamesOf([1])).toBeUndefined();
  });
});

describe("checkFieldAccess", () => {
  it("checkFieldAccess wraps dot and string-index field reads, not numeric indexing or optional chaining", () => {
    const { internals } = createSessionWithInternals({ shouldStop: () => false });
    expect(checkFieldAccess(internals.parse("a.b.c + r[\"x\"]"))).toBe(3);
    expect(checkFieldAccess(internals.parse("v[1] + a?.b"))).toBe(0);
  });
  it("checkFieldAccess: a misspelt field of a state, change() and departure() record is an error, not undefined", () => {
    const s = createSession({ shouldStop: () => false });
    run(s, 's = state(pr("methane"), 300 K, 50 bar)');
    expect(run(s, "s.Hr")).toMatch(/^FieldError: s has no field Hr; did you mean HR\b.* fields: T, P, .*HR/);
    expect(run(s, "y = s.Hr")).toMatch(/^FieldError: s has no field Hr/);
    expect(run(s, "y")).toMatch(/^NameError/); // nothing was assigned
    expect(run(s, "s.Hr * 2")).toMatch(/^FieldError: s has no field Hr.*\(line 1, column 3\)$/);
    expect(run(s, "change(s, s).dHx")).toMatch(/^FieldError: change\(s, s\) has no field dHx; did you mean dH\b/);
    expect(run(s, 'departure(pr("methane"), 300 K, 50 bar).hr')).toMatch(/has no field hr; did you mean HR\b/);
  });
  it("checkFieldAccess: plain records, nested records and fields holding falsy values", () => {
    const s = createSession({ shouldStop: () => false });
    run(s, "r = {a: 0, b: {c: false}}");
    expect(run(s, "r.a")).toBe("0");
    expect(run(s, "r.b.c")).toBe("false");
    expect(run(s, "r.b.d")).toBe("FieldError: r.b has no field d; did you mean c? fields: c (line 1, column 5)");
    expect(run(s, 'r["x"]')).toMatch(/^FieldError: r has no field x;.* fields: a, b/);
    // Optional chaining keeps its meaning: undefined, not an error.
    expect(run(s, "r?.x")).toBe("(no result)");
  });
  it("checkFieldAccess: inside a user function the error still names the field", () => {
    const s = createSession({ shouldStop: () => false });
    run(s, "r = {a: 1}\nf(x) = r.aa * x");
    expect(run(s, "f(2)")).toMatch(/r has no field aa; did you mean a\?/);
  });
});
