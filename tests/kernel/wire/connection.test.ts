import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { endpoint, parseConnectionInfo, readConnectionFile } from "../../../kernel/wire/index.js";

// Field names as jupyter_client.connect.write_connection_file writes them.
const good = { shell_port: 5001, iopub_port: 5002, stdin_port: 5003, control_port: 5004, hb_port: 5005, ip: "127.0.0.1", key: "abc", transport: "tcp", signature_scheme: "hmac-sha256", kernel_name: "caloric" };

describe("readConnectionFile", () => {
  it("readConnectionFile reads a jupyter_client connection file", () => {
    const dir = mkdtempSync(join(tmpdir(), "caloric-conn-"));
    const file = join(dir, "kernel.json");
    writeFileSync(file, JSON.stringify(good));
    expect(readConnectionFile(file)).toEqual(good);
  });

  it("readConnectionFile names the file when it is missing or not JSON", () => {
    const dir = mkdtempSync(join(tmpdir(), "caloric-conn-"));
    expect(() => readConnectionFile(join(dir, "none.json"))).toThrow(/cannot read connection file .*none\.json/);
    writeFileSync(join(dir, "bad.json"), "{");
    expect(() => readConnectionFile(join(dir, "bad.json"))).toThrow(/not valid JSON/);
  });

  it("parseConnectionInfo names the bad field, what was expected and what came", () => {
    expect(() => parseConnectionInfo({ ...good, hb_port: "x" })).toThrow(/hb_port must be an integer port 0..65535, got "x"/);
    expect(() => parseConnectionInfo({ ...good, transport: "udp" })).toThrow(/transport must be "tcp" or "ipc", got "udp"/);
    expect(() => parseConnectionInfo({ ...good, signature_scheme: "md5" })).toThrow(/signature_scheme/);
    expect(() => parseConnectionInfo(null)).toThrow(/JSON object/);
  });

  it("endpoint builds tcp and ipc addresses as jupyter_client does", () => {
    const info = parseConnectionInfo(good);
    expect(endpoint(info, "shell")).toBe("tcp://127.0.0.1:5001");
    expect(endpoint({ ...info, transport: "ipc", ip: "/tmp/k" }, "hb")).toBe("ipc:///tmp/k-5005");
  });
});
