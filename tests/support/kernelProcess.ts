/**
 * Starts the compiled kernel (`node dist/kernel/cli.js kernel -f FILE`) on free loopback ports and
 * connects a KernelClient. npm test builds dist/ first.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { KernelClient, loopbackConnection, type ConnectionInfo } from "../../kernel/wire/index.js";

export const REPO_ROOT = resolve(fileURLToPath(new URL("../..", import.meta.url)));
export const CLI = join(REPO_ROOT, "dist", "kernel", "cli.js");

export interface RunningKernel {
  info: ConnectionInfo;
  process: ChildProcess;
  client: KernelClient;
  stderr(): string;
  /** Resolves with the exit code once the process has exited. */
  exited: Promise<number | null>;
  stop(): Promise<void>;
}

export async function startKernel(options: { env?: NodeJS.ProcessEnv; args?: string[]; key?: string } = {}): Promise<RunningKernel> {
  if (!existsSync(CLI)) throw new Error(`${CLI} is missing: run npm run build first (npm test does)`);
  const info = await loopbackConnection(options.key);
  const dir = mkdtempSync(join(tmpdir(), "caloric-kernel-"));
  const file = join(dir, "connection.json");
  writeFileSync(file, JSON.stringify(info));
  const child = spawn(process.execPath, [CLI, "kernel", "-f", file, ...(options.args ?? [])], {
    env: { ...process.env, ...options.env },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let err = "";
  child.stderr!.on("data", (d: Buffer) => (err += d.toString()));
  child.stdout!.on("data", (d: Buffer) => (err += d.toString()));
  const exited = new Promise<number | null>((r) => child.once("exit", (code) => r(code)));
  const client = await KernelClient.connect(info);
  try {
    await client.waitForReady(30_000);
  } catch (e) {
    client.close();
    child.kill("SIGKILL");
    throw new Error(`${(e as Error).message}; kernel stderr:\n${err}`);
  }
  return {
    info,
    process: child,
    client,
    stderr: () => err,
    exited,
    async stop() {
      client.close();
      if (child.exitCode === null && child.signalCode === null) {
        child.kill("SIGKILL");
        await exited;
      }
    },
  };
}
