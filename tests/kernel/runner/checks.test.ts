import { describe, expect, it } from "vitest";
import { MIME } from "../../../lib/display/index.js";
import { checksIn } from "../../../kernel/runner/checks.js";

describe("checksIn", () => {
  it("checksIn reads pass/fail rows from display_data and execute_result", () => {
    const rows = checksIn(
      [
        { output_type: "stream", name: "stdout", text: "x" },
        { output_type: "display_data", data: { [MIME.check]: { label: "Z in range", pass: true }, [MIME.text]: "PASS Z in range" }, metadata: {} },
        { output_type: "execute_result", data: { [MIME.check]: { label: "T2 below limit", pass: false, value: "160 degC", target: "150 degC" }, [MIME.text]: "" }, metadata: {}, execution_count: 3 },
      ],
      4,
    );
    expect(rows).toEqual([
      { label: "Z in range", pass: true, detail: "PASS Z in range", cell: 4 },
      { label: "T2 below limit", pass: false, detail: "value 160 degC, target 150 degC", cell: 4 },
    ]);
  });
  it("checksIn keeps the part of the row's message after its label", () => {
    const rows = checksIn([{ output_type: "display_data", data: { [MIME.check]: { label: "P2 limit", pass: false, message: "FAIL  P2 limit: 60 bar, limit at most 55 bar" } }, metadata: {} }], 2);
    expect(rows[0]!.detail).toBe("60 bar, limit at most 55 bar");
  });
  it("checksIn treats anything but pass === true as a failure", () => {
    const rows = checksIn([{ output_type: "display_data", data: { [MIME.check]: { label: "x", pass: "yes" } }, metadata: {} }], 1);
    expect(rows[0]!.pass).toBe(false);
  });
});
