import { existsSync, mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { pathToFileURL } from "node:url";
import { cliScript, install, kernelsDir, kernelSpec, packageRoot, userDataDir } from "../../kernel/install.js";

describe("install", () => {
  it("install --prefix writes kernel.json with absolute node and cli paths, interrupt_mode message, and the logos", () => {
    const tmp = mkdtempSync(join(tmpdir(), "caloric-inst-"));
    const dir = install({ target: { kind: "prefix", dir: tmp }, nodePath: "/opt/node/bin/node", cliPath: "/opt/caloric/dist/kernel/cli.js" });
    expect(dir).toBe(join(tmp, "share", "jupyter", "kernels", "caloric"));
    const spec = JSON.parse(readFileSync(join(dir, "kernel.json"), "utf8"));
    expect(spec.argv[0]).toBe("/opt/node/bin/node");
    expect(spec.argv[1]).toBe("/opt/caloric/dist/kernel/cli.js");
    expect(spec.argv.slice(2)).toEqual(["kernel", "-f", "{connection_file}"]);
    expect(spec).toMatchObject({ display_name: "Caloric (thermodynamics)", language: "caloric", interrupt_mode: "message" });
    for (const f of ["logo-32x32.png", "logo-64x64.png", "logo-svg.svg"]) expect(existsSync(join(dir, f))).toBe(true);
  });

  it("userDataDir honours JUPYTER_DATA_DIR (jupyter_core rule); --user installs under it", () => {
    expect(userDataDir({ JUPYTER_DATA_DIR: "/x/data" })).toBe("/x/data");
    expect(kernelsDir({ kind: "user" }, { JUPYTER_DATA_DIR: "/x/data" })).toBe("/x/data/kernels");
    expect(kernelsDir({ kind: "sys-prefix" }, { VIRTUAL_ENV: "/venv" })).toBe("/venv/share/jupyter/kernels");
  });

  it("install rejects a kernel name with path characters", () => {
    expect(() => install({ target: { kind: "prefix", dir: tmpdir() }, name: "../evil" })).toThrow(/--name/);
  });

  it("install writes the cli it is given (any build folder), not ROOT/dist", () => {
    const tmp = mkdtempSync(join(tmpdir(), "caloric-inst-"));
    const dir = install({ target: { kind: "prefix", dir: tmp }, nodePath: "/opt/node/bin/node", cliPath: "/srv/qa-build/kernel/cli.js" });
    const spec = JSON.parse(readFileSync(join(dir, "kernel.json"), "utf8"));
    expect(spec.argv.slice(0, 2)).toEqual(["/opt/node/bin/node", "/srv/qa-build/kernel/cli.js"]);
    expect(kernelSpec(packageRoot(), "n", "/b/cli.js").argv).toEqual(["n", "/b/cli.js", "kernel", "-f", "{connection_file}"]);
  });

  it("cliScript is the cli.js beside the compiled module, wherever the build went; from sources the built dist copy", () => {
    expect(cliScript(pathToFileURL("/srv/qa-dist/kernel/install.js").href)).toBe("/srv/qa-dist/kernel/cli.js");
    expect(cliScript(pathToFileURL("/srv/out/x/dist/kernel/install.js").href)).toBe("/srv/out/x/dist/kernel/cli.js");
    const root = mkdtempSync(join(tmpdir(), "caloric-root-"));
    expect(() => cliScript(pathToFileURL(join(root, "kernel", "install.ts")).href, () => root)).toThrow(/npm run build/);
  });
});
