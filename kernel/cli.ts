#!/usr/bin/env node
/**
 * The `caloric` command: `kernel -f FILE` runs the kernel, `install` writes the kernelspec, `run`
 * executes notebooks headless, `help` explains. Subcommands load their code on demand so that the
 * kernel path stays free of the language and the chart libraries.
 */
const HELP = `caloric: a Jupyter kernel for engineering thermodynamics

Usage:
  caloric kernel -f CONNECTION_FILE [--in-process] [--interrupt-grace-ms MS] [--client-renders-charts]
                                                    run the kernel (Jupyter starts this for you);
                                                    a cell that ignores an interrupt for MS (default
                                                    2000) is stopped by restarting the engine
  caloric install [--user | --sys-prefix | --prefix DIR] [--name NAME]
                                                    install the kernelspec (default --user, which
                                                    honours JUPYTER_DATA_DIR)
  caloric run ...                                   run notebooks headless (see caloric run --help)
  caloric help                                      this text

Results support but do not replace the judgement of a qualified, licensed engineer; pressure
equipment, relief and flammable or toxic gases are governed by local codes.
`;

async function main(argv: string[]): Promise<number> {
  const [command, ...rest] = argv;
  switch (command) {
    case "kernel": {
      let file: string | undefined;
      let inProcess = false;
      let graceMs: number | undefined;
      let sessionModule: string | undefined;
      let renderCharts = true;
      for (let i = 0; i < rest.length; i++) {
        const a = rest[i]!;
        if (a === "-f" || a === "--connection-file") file = rest[++i];
        else if (a.startsWith("--connection-file=")) file = a.slice("--connection-file=".length);
        else if (a === "--in-process") inProcess = true;
        else if (a === "--interrupt-grace-ms") {
          const v = rest[++i];
          graceMs = Number(v);
          if (v === undefined || !Number.isFinite(graceMs) || graceMs < 0) throw new Error(`kernel: --interrupt-grace-ms expects milliseconds >= 0, got ${JSON.stringify(v ?? "")}`);
        } else if (a === "--client-renders-charts") {
          renderCharts = false;
        } else if (a === "--session-module") {
          sessionModule = rest[++i];
          if (!sessionModule) throw new Error("kernel: --session-module expects a module URL");
        } else throw new Error(`kernel: unknown option ${JSON.stringify(a)} (expected -f CONNECTION_FILE, --in-process, --interrupt-grace-ms MS)`);
      }
      if (!file) throw new Error("kernel: missing -f CONNECTION_FILE");
      const { runKernel } = await import("./main.js");
      await runKernel({ connectionFile: file, inProcess, graceMs, sessionModule, renderCharts });
      return -1; // keep running: the kernel exits on shutdown_request
    }
    case "install": {
      const { install } = await import("./install.js");
      let target: import("./install.js").InstallTarget = { kind: "user" };
      let name: string | undefined;
      for (let i = 0; i < rest.length; i++) {
        const a = rest[i]!;
        if (a === "--user") target = { kind: "user" };
        else if (a === "--sys-prefix") target = { kind: "sys-prefix" };
        else if (a === "--prefix") {
          const dir = rest[++i];
          if (!dir) throw new Error("install: --prefix needs a directory");
          target = { kind: "prefix", dir };
        } else if (a === "--name") name = rest[++i];
        else throw new Error(`install: unknown option ${JSON.stringify(a)} (expected --user, --sys-prefix, --prefix DIR, --name NAME)`);
      }
      // kernel.json runs this very script, wherever it was built.
      const { fileURLToPath } = await import("node:url");
      const self = fileURLToPath(import.meta.url);
      const dir = install({ target, name, cliPath: self.endsWith(".js") ? self : undefined });
      process.stdout.write(`Installed kernelspec ${name ?? "caloric"} in ${dir}\n`);
      return 0;
    }
    case "run": {
      // Specifier held in a variable: the runner is built separately and loads only for this command.
      const runnerModule = "./runner/index.js";
      const runner = (await import(runnerModule)) as { runCli(argv: string[]): Promise<number> };
      return runner.runCli(rest);
    }
    case undefined:
    case "help":
    case "--help":
    case "-h":
      process.stdout.write(HELP);
      return 0;
    default:
      process.stderr.write(`caloric: unknown command ${JSON.stringify(command)}\n\n${HELP}`);
      return 2;
  }
}

main(process.argv.slice(2)).then(
  (code) => {
    if (code >= 0) process.exitCode = code;
  },
  (e: Error) => {
    process.stderr.write(`caloric: ${e.message}\n`);
    process.exitCode = 1;
  },
);
