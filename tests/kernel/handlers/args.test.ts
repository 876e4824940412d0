import { describe, expect, it } from "vitest";
import { boolField, cursorField, intField, stringField } from "../../../kernel/handlers/args.js";

describe("request fields", () => {
  it("cursorField counts Unicode code points, not UTF-16 units (messaging spec 5.2+)", () => {
    const code = "T𝛼 = 1"; // 𝛼 is outside the BMP: 2 UTF-16 units, 1 code point
    expect(cursorField({}, code)).toBe(6);
    expect(cursorField({ cursor_pos: 6 }, code)).toBe(6);
    expect(() => cursorField({ cursor_pos: 7 }, code)).toThrow("cursor_pos: expected 0..6 (code points in code), got 7");
  });

  it("stringField, boolField, intField name the field, what was expected and what came", () => {
    expect(() => stringField({}, "code")).toThrow("code: expected a string, got undefined");
    expect(boolField({}, "silent", false)).toBe(false);
    expect(() => boolField({ silent: "no" }, "silent", false)).toThrow('silent: expected true or false, got "no"');
    expect(() => intField({ n: 1.5 }, "n")).toThrow("n: expected an integer, got 1.5");
  });
});
