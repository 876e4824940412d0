/**
 * Runs tests/conformance/test_caloric.py (jupyter_kernel_test) with /usr/bin/python3 -m unittest
 * against a kernelspec installed by `caloric install --prefix TMP`, with every Jupyter directory in a
 * temporary place. Any failure, error or skip fails this test: the suite skips silently when a sample
 * is missing, so a skip means lost coverage.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { CLI, REPO_ROOT } from "../support/kernelProcess.js";
import { jupyterEnv } from "../support/jupyterEnv.js";

describe("jupyter_kernel_test conformance", () => {
  it("jupyter_kernel_test KernelTests pass with nothing skipped", () => {
    const tmp = mkdtempSync(join(tmpdir(), "caloric-conf-"));
    execFileSync(process.execPath, [CLI, "install", "--prefix", join(tmp, "prefix")]);
    const env = jupyterEnv(tmp);
    const r = spawnSync("/usr/bin/python3", ["-m", "unittest", "-v", "test_caloric"], { cwd: join(REPO_ROOT, "tests", "conformance"), env, encoding: "utf8", timeout: 300_000 });
    const out = `${r.stdout}\n${r.stderr}`;
    const skipped = out.split("\n").filter((l) => /\bskipped\b/.test(l) && /^test_/.test(l));
    expect(skipped, out).toEqual([]);
    // jupyter_kernel_test 0.4.5 (Debian 12) defines 12 test methods; fewer would mean a sample lost its test.
    const ran = Number(/\nRan (\d+) tests? in/.exec(out)?.[1] ?? 0);
    expect(ran, out).toBeGreaterThanOrEqual(12);
    expect(out, out).toMatch(/\nOK\s*$/);
    expect(r.status, out).toBe(0);
  });
});
