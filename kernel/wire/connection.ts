/**
 * Reads and checks a Jupyter connection file (ports, ip, transport, key, signature scheme).
 * Why strict: a kernel started with a half-written or foreign file should fail at once with a message
 * naming the bad field, not bind random ports.
 */
import { readFileSync } from "node:fs";

export interface ConnectionInfo {
  transport: "tcp" | "ipc";
  ip: string;
  shell_port: number;
  iopub_port: number;
  stdin_port: number;
  control_port: number;
  hb_port: number;
  key: string;
  signature_scheme: string;
  kernel_name?: string;
}

export type ChannelName = "shell" | "iopub" | "stdin" | "control" | "hb";

const PORTS = ["shell_port", "iopub_port", "stdin_port", "control_port", "hb_port"] as const;

/** Validates a parsed connection object; `where` names the source in error messages. */
export function parseConnectionInfo(raw: unknown, where = "connection file"): ConnectionInfo {
  if (typeof raw !== "object" || raw === null) throw new Error(`${where}: expected a JSON object`);
  const o = raw as Record<string, unknown>;
  const transport = o.transport ?? "tcp";
  if (transport !== "tcp" && transport !== "ipc") {
    throw new Error(`${where}: transport must be "tcp" or "ipc", got ${JSON.stringify(transport)}`);
  }
  if (typeof o.ip !== "string" || o.ip === "") throw new Error(`${where}: ip must be a non-empty string`);
  for (const p of PORTS) {
    const v = o[p];
    if (typeof v !== "number" || !Number.isInteger(v) || v < 0 || v > 65535) {
      throw new Error(`${where}: ${p} must be an integer port 0..65535, got ${JSON.stringify(v)}`);
    }
  }
  const key = o.key ?? "";
  if (typeof key !== "string") throw new Error(`${where}: key must be a string`);
  const scheme = o.signature_scheme ?? "hmac-sha256";
  if (typeof scheme !== "string" || !scheme.startsWith("hmac-")) {
    throw new Error(`${where}: signature_scheme must look like "hmac-sha256", got ${JSON.stringify(scheme)}`);
  }
  return {
    transport,
    ip: o.ip,
    shell_port: o.shell_port as number,
    iopub_port: o.iopub_port as number,
    stdin_port: o.stdin_port as number,
    control_port: o.control_port as number,
    hb_port: o.hb_port as number,
    key,
    signature_scheme: scheme,
    kernel_name: typeof o.kernel_name === "string" ? o.kernel_name : undefined,
  };
}

export function readConnectionFile(path: string): ConnectionInfo {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch (e) {
    throw new Error(`cannot read connection file ${path}: ${(e as Error).message}`);
  }
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    throw new Error(`connection file ${path} is not valid JSON: ${(e as Error).message}`);
  }
  return parseConnectionInfo(raw, `connection file ${path}`);
}

/** ZeroMQ endpoint for a channel: tcp://ip:port, or ipc://ip-N as jupyter_client names ipc endpoints. */
export function endpoint(info: ConnectionInfo, channel: ChannelName): string {
  const port = info[`${channel}_port` as const];
  return info.transport === "tcp" ? `tcp://${info.ip}:${port}` : `ipc://${info.ip}-${port}`;
}
