import { describe, expect, it } from "vitest";
import { firstLine, Progress } from "../../../kernel/runner/progress.js";

describe("Progress", () => {
  it("firstLine skips comments and blank lines and truncates", () => {
    expect(firstLine("# title\n\nx = 1\ny = 2")).toBe("x = 1");
    expect(firstLine("a".repeat(100), 10)).toHaveLength(10);
  });
  it("Progress writes one line per cell when not a TTY", () => {
    const lines: string[] = [];
    const p = new Progress({ write: (t) => lines.push(t), isTTY: false }, "case.ipynb");
    p.cell(1, 3, "x = 1");
    p.done("3 cells, 2 checks passed");
    expect(lines[0]).toMatch(/^case\.ipynb: cell 1 of 3 \[\d+\.\d s\] x = 1\n$/);
    expect(lines[1]).toMatch(/3 cells, 2 checks passed \(\d+\.\d s\)\n$/);
  });
  it("Progress rewrites the line in place on a TTY", () => {
    const lines: string[] = [];
    new Progress({ write: (t) => lines.push(t), isTTY: true }, "n").cell(2, 2, "y");
    expect(lines[0]!.startsWith("\r\x1b[2K")).toBe(true);
  });
});
