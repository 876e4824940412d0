/**
 * Smoke tests through Debian's Jupyter tools with the kernelspec installed by `caloric install`:
 * jupyter console (stdin piped) and jupyter nbconvert --to notebook --execute.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { jupyterEnv } from "../support/jupyterEnv.js";
import { CLI } from "../support/kernelProcess.js";

describe("Jupyter tools", () => {
  let tmp: string;
  let env: NodeJS.ProcessEnv;
  beforeAll(() => {
    tmp = mkdtempSync(join(tmpdir(), "caloric-tools-"));
    execFileSync(process.execPath, [CLI, "install", "--prefix", join(tmp, "prefix")]);
    env = jupyterEnv(tmp);
  });

  it("jupyter console --kernel caloric evaluates piped input", () => {
    const r = spawnSync("/usr/bin/jupyter", ["console", "--kernel", "caloric", "--simple-prompt"], { input: "6*7\n", env, encoding: "utf8", timeout: 90_000 });
    expect(r.stdout, r.stderr).toMatch(/42/);
  });

  it("jupyter nbconvert --to notebook --execute runs a caloric notebook", () => {
    const nb = {
      nbformat: 4, nbformat_minor: 5, metadata: { kernelspec: { name: "caloric", display_name: "Caloric (thermodynamics)", language: "caloric" } },
      cells: [
        { cell_type: "code", id: "a1", metadata: {}, source: "r = 8.314", outputs: [], execution_count: null },
        { cell_type: "code", id: "a2", metadata: {}, source: "r * 2", outputs: [], execution_count: null },
      ],
    };
    const file = join(tmp, "smoke.ipynb");
    writeFileSync(file, JSON.stringify(nb));
    const r = spawnSync("/usr/bin/jupyter", ["nbconvert", "--to", "notebook", "--execute", "--output", "smoke.out.ipynb", file], { env, encoding: "utf8", timeout: 120_000 });
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(readFileSync(join(tmp, "smoke.out.ipynb"), "utf8")) as { cells: Array<{ outputs: Array<{ output_type: string; data?: Record<string, string | string[]> }> }> };
    const result = out.cells[1]!.outputs.find((o) => o.output_type === "execute_result");
    const text = result?.data?.["text/plain"];
    expect(Array.isArray(text) ? text.join("") : text).toMatch(/^16\.628/); // 8.314 * 2
  });
});
