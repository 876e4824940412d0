import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CLI } from "../support/kernelProcess.js";

const run = (args: string[], env: NodeJS.ProcessEnv = {}) => spawnSync(process.execPath, [CLI, ...args], { encoding: "utf8", env: { ...process.env, ...env } });

describe("caloric cli", () => {
  it("caloric help prints usage and the engineering caution", () => {
    const r = run(["help"]);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/caloric kernel -f CONNECTION_FILE/);
    expect(r.stdout).toMatch(/licensed engineer/);
    expect(readFileSync(CLI, "utf8").startsWith("#!/usr/bin/env node")).toBe(true);
  });

  it("caloric install --user honours JUPYTER_DATA_DIR", () => {
    const data = mkdtempSync(join(tmpdir(), "caloric-cli-"));
    const r = run(["install", "--user"], { JUPYTER_DATA_DIR: data });
    expect(r.status, r.stderr).toBe(0);
    expect(JSON.parse(readFileSync(join(data, "kernels", "caloric", "kernel.json"), "utf8")).language).toBe("caloric");
  });

  it("caloric rejects unknown commands and options, naming them", () => {
    expect(run(["frob"]).stderr).toMatch(/unknown command "frob"/);
    expect(run(["kernel"]).stderr).toMatch(/missing -f CONNECTION_FILE/);
    expect(run(["install", "--global"]).stderr).toMatch(/unknown option "--global"/);
    expect(run(["kernel", "-f", "/nonexistent/conn.json"]).stderr).toMatch(/cannot read connection file/);
  });
});
