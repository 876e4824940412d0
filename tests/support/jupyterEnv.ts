/**
 * Environment for running Jupyter tools in tests: kernelspecs from TMP/prefix/share/jupyter only, and
 * data, runtime and config directories in TMP, so a user's real Jupyter setup is never touched.
 */
import { mkdirSync } from "node:fs";
import { join } from "node:path";

export function jupyterEnv(tmp: string): NodeJS.ProcessEnv {
  const dirs = { JUPYTER_DATA_DIR: join(tmp, "data"), JUPYTER_RUNTIME_DIR: join(tmp, "runtime"), JUPYTER_CONFIG_DIR: join(tmp, "config") };
  for (const d of Object.values(dirs)) mkdirSync(d, { recursive: true });
  return {
    ...process.env,
    ...dirs,
    JUPYTER_PATH: join(tmp, "prefix", "share", "jupyter"),
    JUPYTER_PLATFORM_DIRS: "1",
    PYTHONDONTWRITEBYTECODE: "1",
  };
}
