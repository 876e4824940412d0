/**
 * `caloric run` arguments. Errors name the option and what it needs.
 */
import { parseOverride, type Override } from "./parameters.js";

export interface RunArgs {
  inputs: string[];
  out: string;
  html: boolean;
  inProcess: boolean;
  timeoutSeconds?: number;
  jobs: number;
  overrides: Override[];
  quiet: boolean;
  help: boolean;
}

export const RUN_HELP = `caloric run NOTEBOOK|DIR... [options]

Re-executes notebooks with the caloric kernel, writes the executed notebooks (and HTML reports) and
exits 0 only if every cell ran and every design check (verify) passed.

Options:
  --out DIR          where executed notebooks and reports go (default: out)
  --html             also write a self-contained HTML report per notebook (and index.html)
  --set NAME=VALUE   override a parameter, e.g. --set P2="60 bar" (repeatable); placed after the
                     cell tagged "parameters", else before the first code cell
  --in-process       run the language in this process instead of a kernel process (faster start;
                     a runaway cell can only be stopped cooperatively)
  --timeout S        interrupt a cell that runs longer than S seconds and fail the notebook
  --jobs N           run up to N notebooks at once (default 1)
  --quiet            no progress lines
Exit codes: 0 all passed, 1 a design check failed, 2 a cell failed or a notebook could not run,
64 bad arguments.
`;

export class ArgsError extends Error {
  override name = "ArgsError";
}

function positiveNumber(option: string, value: string | undefined, integer: boolean): number {
  const n = Number(value);
  if (value === undefined || !Number.isFinite(n) || n <= 0 || (integer && !Number.isInteger(n))) {
    throw new ArgsError(`${option} needs a positive ${integer ? "whole number" : "number"}, got ${JSON.stringify(value ?? "")}`);
  }
  return n;
}

export function parseRunArgs(argv: string[]): RunArgs {
  const a: RunArgs = { inputs: [], out: "out", html: false, inProcess: false, jobs: 1, overrides: [], quiet: false, help: false };
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i]!;
    const [flag, inline] = arg.startsWith("--") && arg.includes("=") && !arg.startsWith("--set=") ? [arg.slice(0, arg.indexOf("=")), arg.slice(arg.indexOf("=") + 1)] : [arg, undefined];
    const value = () => {
      const v = inline ?? argv[++i];
      if (v === undefined) throw new ArgsError(`${flag} needs a value`);
      return v;
    };
    switch (flag) {
      case "--out": a.out = value(); break;
      case "--html": a.html = true; break;
      case "--in-process": a.inProcess = true; break;
      case "--quiet": a.quiet = true; break;
      case "--timeout": a.timeoutSeconds = positiveNumber("--timeout", value(), false); break;
      case "--jobs": a.jobs = positiveNumber("--jobs", value(), true); break;
      case "--help": case "-h": a.help = true; break;
      case "--set": {
        const v = argv[++i];
        if (v === undefined) throw new ArgsError("--set needs NAME=VALUE");
        a.overrides.push(parseOverride(v));
        break;
      }
      default:
        if (arg.startsWith("--set=")) a.overrides.push(parseOverride(arg.slice(6)));
        else if (arg.startsWith("-")) throw new ArgsError(`unknown option ${arg} (see caloric run --help)`);
        else a.inputs.push(arg);
    }
  }
  if (!a.help && a.inputs.length === 0) throw new ArgsError("no notebook given (caloric run NOTEBOOK|DIR...)");
  return a;
}
