import { describe, expect, it } from "vitest";
import { ArgsError, parseRunArgs } from "../../../kernel/runner/args.js";

describe("parseRunArgs", () => {
  it("parseRunArgs reads every option", () => {
    const a = parseRunArgs(["a.ipynb", "dir", "--out", "o", "--html", "--in-process", "--timeout", "2.5", "--jobs=3", "--set", "P2=60 bar", "--set=T=300 K", "--quiet"]);
    expect(a).toEqual({ inputs: ["a.ipynb", "dir"], out: "o", html: true, inProcess: true, timeoutSeconds: 2.5, jobs: 3, overrides: [{ name: "P2", expression: "60 bar" }, { name: "T", expression: "300 K" }], quiet: true, help: false });
  });
  it("parseRunArgs defaults to out/ and one job", () => {
    expect(parseRunArgs(["x.ipynb"])).toMatchObject({ out: "out", jobs: 1, html: false, inProcess: false });
  });
  it("parseRunArgs names the option that is wrong", () => {
    expect(() => parseRunArgs([])).toThrow(/no notebook given/);
    expect(() => parseRunArgs(["a", "--jobs", "0"])).toThrow(/--jobs needs a positive whole number, got "0"/);
    expect(() => parseRunArgs(["a", "--timeout", "soon"])).toThrow(/--timeout needs a positive number/);
    expect(() => parseRunArgs(["a", "--fast"])).toThrow(ArgsError);
    expect(() => parseRunArgs(["a", "--set", "oops"])).toThrow(/expected name=value/);
    expect(() => parseRunArgs(["a", "--out"])).toThrow(/--out needs a value/);
  });
});
