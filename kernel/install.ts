/**
 * `caloric install`: writes the kernelspec (kernel.json + logos) where Jupyter looks for kernels.
 * kernel.json runs this very installation: the absolute node binary and the absolute compiled cli.js
 * that is running (found from the module's own location, so any build folder works, not only dist/).
 */
import { execFileSync } from "node:child_process";
import { copyFileSync, existsSync, mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { homedir } from "node:os";
import { dirname, join, resolve } from "node:path";
import { fileURLToPath } from "node:url";

export type InstallTarget = { kind: "user" } | { kind: "sys-prefix" } | { kind: "prefix"; dir: string };

export interface InstallOptions {
  target: InstallTarget;
  name?: string;
  env?: NodeJS.ProcessEnv;
  /** Absolute path of the node binary kernel.json will run (default: this one). */
  nodePath?: string;
  /** The compiled cli.js kernel.json will run (default: cliScript(), the one beside this module). */
  cliPath?: string;
}

const LOGOS = ["logo-32x32.png", "logo-64x64.png", "logo-svg.svg"];

/** The repository/package root: the nearest ancestor holding kernelspec/kernel.json. */
export function packageRoot(from = dirname(fileURLToPath(import.meta.url))): string {
  let dir = from;
  for (;;) {
    if (existsSync(join(dir, "kernelspec", "kernel.json"))) return dir;
    const up = dirname(dir);
    if (up === dir) throw new Error(`cannot find kernelspec/kernel.json above ${from}`);
    dir = up;
  }
}

/**
 * The compiled `caloric` command of this installation: cli.js beside this module (both are compiled
 * into the same folder of whatever build directory was used). Run from TypeScript sources (tsx),
 * kernel.json still needs JavaScript, so it names the default build, ROOT/dist/kernel/cli.js, and
 * requires it to exist.
 */
export function cliScript(moduleUrl: string = import.meta.url, root?: () => string): string {
  const here = fileURLToPath(moduleUrl);
  if (here.endsWith(".js")) return join(dirname(here), "cli.js");
  const built = join((root ?? (() => packageRoot(dirname(here))))(), "dist", "kernel", "cli.js");
  if (!existsSync(built)) throw new Error(`install: running from sources and ${built} does not exist; build first (npm run build), or run the built cli.js`);
  return built;
}

/** Jupyter's per-user data directory, honouring JUPYTER_DATA_DIR as jupyter_core does. */
export function userDataDir(env: NodeJS.ProcessEnv = process.env): string {
  if (env.JUPYTER_DATA_DIR) return resolve(env.JUPYTER_DATA_DIR);
  if (process.platform === "darwin") return join(homedir(), "Library", "Jupyter");
  if (process.platform === "win32") return join(env.APPDATA ?? homedir(), "jupyter");
  return join(env.XDG_DATA_HOME ?? join(homedir(), ".local", "share"), "jupyter");
}

/** The Python environment prefix Jupyter runs from (conda, venv, else the python3 on PATH). */
function sysPrefix(env: NodeJS.ProcessEnv): string {
  if (env.CONDA_PREFIX) return env.CONDA_PREFIX;
  if (env.VIRTUAL_ENV) return env.VIRTUAL_ENV;
  try {
    return execFileSync("python3", ["-c", "import sys; print(sys.prefix)"], { encoding: "utf8" }).trim();
  } catch {
    throw new Error("--sys-prefix: no CONDA_PREFIX or VIRTUAL_ENV, and python3 could not be asked for sys.prefix; use --prefix DIR");
  }
}

export function kernelsDir(target: InstallTarget, env: NodeJS.ProcessEnv = process.env): string {
  switch (target.kind) {
    case "user":
      return join(userDataDir(env), "kernels");
    case "sys-prefix":
      return join(sysPrefix(env), "share", "jupyter", "kernels");
    case "prefix":
      return join(resolve(target.dir), "share", "jupyter", "kernels");
  }
}

/** The kernel.json content for this installation. */
export function kernelSpec(root: string, nodePath: string, cli: string): Record<string, unknown> {
  const template = JSON.parse(readFileSync(join(root, "kernelspec", "kernel.json"), "utf8")) as { argv: string[] } & Record<string, unknown>;
  return { ...template, argv: template.argv.map((a) => a.replace("{node}", nodePath).replace("{cli}", cli)) };
}

/** Installs and returns the kernelspec directory. */
export function install(options: InstallOptions): string {
  const env = options.env ?? process.env;
  const name = options.name ?? "caloric";
  if (!/^[a-z0-9._-]+$/i.test(name)) throw new Error(`--name: use letters, digits, . _ - only, got ${JSON.stringify(name)}`);
  const root = packageRoot();
  const cli = resolve(options.cliPath ?? cliScript());
  const dir = join(kernelsDir(options.target, env), name);
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, "kernel.json"), JSON.stringify(kernelSpec(root, options.nodePath ?? process.execPath, cli), null, 2) + "\n");
  for (const logo of LOGOS) copyFileSync(join(root, "kernelspec", logo), join(dir, logo));
  return dir;
}
