/**
 * Connection info for a kernel this process starts itself (the notebook runner, tests, benchmarks):
 * five distinct free TCP ports on 127.0.0.1 and a fresh HMAC key. Loopback only, so nothing outside
 * the machine can reach the kernel.
 */
import { randomUUID } from "node:crypto";
import { createServer } from "node:net";
import { parseConnectionInfo, type ConnectionInfo } from "./connection.js";

/** A TCP port on 127.0.0.1 that was free a moment ago (the OS picks it; another process may still take it). */
export async function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const s = createServer()
      .once("error", fail)
      .listen(0, "127.0.0.1", () => {
        const port = (s.address() as { port: number }).port;
        s.close(() => ok(port));
      });
  });
}

/** Loopback connection info with five distinct free ports, HMAC-SHA256 signing with `key` (default: a random UUID). */
export async function loopbackConnection(key: string = randomUUID()): Promise<ConnectionInfo> {
  const ports = new Set<number>();
  while (ports.size < 5) ports.add(await freePort());
  const [shell_port, iopub_port, stdin_port, control_port, hb_port] = [...ports] as [number, number, number, number, number];
  return parseConnectionInfo({ transport: "tcp", ip: "127.0.0.1", shell_port, iopub_port, stdin_port, control_port, hb_port, key, signature_scheme: "hmac-sha256", kernel_name: "caloric" });
}
