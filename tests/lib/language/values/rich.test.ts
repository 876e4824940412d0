import { describe, expect, it } from "vitest";
import { isRichValue } from "../../../../lib/language/values/rich.js";

describe("isRichValue", () => {
  it("isRichValue needs kind, toBundle and toText", () => {
    expect(isRichValue({ kind: "model", toBundle: () => ({ "text/plain": "" }), toText: () => "" })).toBe(true);
    expect(isRichValue({ kind: "model", toText: () => "" })).toBe(false);
    expect(isRichValue({ toBundle: () => ({}), toText: () => "" })).toBe(false);
    expect(isRichValue(null)).toBe(false);
  });
});
