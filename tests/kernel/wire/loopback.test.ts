import { createServer } from "node:net";
import { describe, expect, it } from "vitest";
import { freePort, loopbackConnection } from "../../../kernel/wire/index.js";

describe("freePort", () => {
  it("freePort returns a port in the TCP range that can be bound on 127.0.0.1 right after", async () => {
    const port = await freePort();
    // TCP ports are 16-bit; 0 means "any" and is never a chosen port (RFC 793, from memory).
    expect(port).toBeGreaterThan(0);
    expect(port).toBeLessThanOrEqual(65535);
    await new Promise<void>((ok, fail) => {
      const s = createServer().once("error", fail).listen(port, "127.0.0.1", () => s.close(() => ok()));
    });
  });
});

describe("loopbackConnection", () => {
  it("loopbackConnection gives five distinct loopback ports, HMAC-SHA256 and the key asked for", async () => {
    const info = await loopbackConnection("k3y");
    const ports = [info.shell_port, info.iopub_port, info.stdin_port, info.control_port, info.hb_port];
    expect(new Set(ports).size).toBe(5);
    expect(info.ip).toBe("127.0.0.1");
    expect(info.transport).toBe("tcp");
    // Jupyter messaging spec: signature_scheme "hmac-sha256" is the scheme kernels must support (from memory).
    expect(info.signature_scheme).toBe("hmac-sha256");
    expect(info.key).toBe("k3y");
  });
  it("loopbackConnection makes a fresh key per call when none is given", async () => {
    const [a, b] = [await loopbackConnection(), await loopbackConnection()];
    expect(a.key).not.toBe("");
    expect(a.key).not.toBe(b.key);
  });
});
