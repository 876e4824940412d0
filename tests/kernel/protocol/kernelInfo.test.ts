import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { IMPLEMENTATION_VERSION, kernelInfoContent } from "../../../kernel/protocol/index.js";

describe("kernelInfoContent", () => {
  it("kernelInfoContent carries the full language_info and protocol 5.3", () => {
    const c = kernelInfoContent("9.9.9") as Record<string, any>;
    expect(c.protocol_version).toBe("5.3");
    for (const k of ["name", "version", "mimetype", "file_extension", "pygments_lexer", "codemirror_mode"]) expect(c.language_info[k]).toBeTypeOf("string");
    expect(c.implementation_version).toBe("9.9.9");
  });

  it("IMPLEMENTATION_VERSION equals package.json's version", () => {
    const pkg = JSON.parse(readFileSync(new URL("../../../package.json", import.meta.url), "utf8")) as { version: string };
    expect(IMPLEMENTATION_VERSION).toBe(pkg.version);
  });
});
