import { describe, expect, it } from "vitest";
import { checkBundle, checkRecord, evaluateCheck } from "../../../lib/display/check.js";
import { MIME } from "../../../lib/display/mime.js";

describe("evaluateCheck", () => {
  it("evaluateCheck compares within a band, against an upper or a lower limit", () => {
    expect(evaluateCheck(10.4, 10, 0.5)).toBe(true);
    expect(evaluateCheck(10.6, 10, 0.5)).toBe(false);
    expect(evaluateCheck(9.4, 10, 0.5)).toBe(false);
    expect(evaluateCheck(150, 149, 0, "atmost")).toBe(false);
    expect(evaluateCheck(148, 149, 0, "atmost")).toBe(true);
    expect(evaluateCheck(1.2, 1.5, 0, "atleast")).toBe(false);
    expect(evaluateCheck(NaN, 0, 1e9)).toBe(false); // an unknown value never passes
  });
});

describe("checkBundle", () => {
  const pass = checkBundle({ label: "Discharge temperature", value: 412.3, target: 410, tolerance: 5, unit: "K" });
  const fail = checkBundle({ label: "Stored mass", value: 118, target: 125, tolerance: 2, unit: "kg", note: "bank B" });

  it("checkBundle carries MIME.check, HTML and text", () => {
    expect(Object.keys(pass).sort()).toEqual([MIME.check, MIME.html, MIME.text].sort());
  });
  it("checkBundle states pass or fail in words and symbol, not colour alone", () => {
    expect(pass[MIME.text]).toBe("✔ PASS  Discharge temperature: 412.3 K, target 410 K ± 5 K, deviation +2.3 K");
    expect(fail[MIME.text]).toMatch(/^✘ FAIL {2}Stored mass: 118 kg, target 125 kg ± 2 kg, deviation -7 kg\n {2}bank B$/);
    expect(pass[MIME.html]).toContain("PASS");
    expect(fail[MIME.html]).toContain("FAIL");
    expect(fail[MIME.html]).not.toMatch(/background/);
  });
  it("checkBundle JSON has what the runner reads", () => {
    const r = fail[MIME.check] as Record<string, unknown>;
    expect(r).toMatchObject({ label: "Stored mass", pass: false, value: 118, target: 125, tolerance: 2, unit: "kg", deviation: -7 });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
  });
  it("checkBundle honours the caller's verdict and escapes HTML", () => {
    const b = checkBundle({ label: "<p>", value: 1, target: 0, tolerance: 0, pass: true });
    expect((b[MIME.check] as { pass: boolean }).pass).toBe(true);
    expect(b[MIME.html]).toContain("&lt;p&gt;");
  });
});

describe("checkRecord", () => {
  it("checkRecord words limits", () => {
    // Differences of offset units are written without the offset (degC difference = K; barg difference = bar).
    expect(checkRecord({ label: "T2", value: 37.5, target: 40, tolerance: 5, unit: "degC" }).message)
      .toBe("✔ PASS  T2: 37.5 degC, target 40 degC ± 5 K, deviation -2.5 K");
    expect(checkRecord({ label: "P", value: 95, target: 100, tolerance: 2, unit: "barg", comparison: "atmost" }).message)
      .toBe("✔ PASS  P: 95 barg, limit at most 100 barg (+2 bar), deviation -5 bar");
    expect(checkRecord({ label: "P", value: 95, target: 100, tolerance: 0, unit: "bar", comparison: "atmost" }).message)
      .toBe("✔ PASS  P: 95 bar, limit at most 100 bar, deviation -5 bar");
  });
  it("checkRecord names bad input", () => {
    expect(() => checkRecord({ label: "", value: 1, target: 1, tolerance: 0 })).toThrow(/label must be a non-empty text/);
    expect(() => checkRecord({ label: "a", value: 1, target: 1, tolerance: -1 })).toThrow(/tolerance must be zero or positive, got -1/);
    expect(() => checkRecord({ label: "a", value: "1" as never, target: 1, tolerance: 0 })).toThrow(/value must be a number, got string/);
    expect(() => checkRecord({ label: "a", value: 1, target: 1, tolerance: 0, comparison: "near" as never })).toThrow(/comparison must be one of within, atmost, atleast/);
  });
});
