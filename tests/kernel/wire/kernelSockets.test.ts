import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { freePort, KernelClient, KernelSockets, parseConnectionInfo, type ConnectionInfo, type WireMessage } from "../../../kernel/wire/index.js";

describe("KernelSockets", () => {
  let info: ConnectionInfo;
  let sockets: KernelSockets;
  let client: KernelClient;
  const logs: string[] = [];
  const got: Array<[string, WireMessage]> = [];

  beforeAll(async () => {
    const [a, b, c, d, e] = [await freePort(), await freePort(), await freePort(), await freePort(), await freePort()];
    info = parseConnectionInfo({ transport: "tcp", ip: "127.0.0.1", shell_port: a, iopub_port: b, stdin_port: c, control_port: d, hb_port: e, key: "k3y", signature_scheme: "hmac-sha256" });
    sockets = await KernelSockets.bind(info, { log: (l) => logs.push(l) });
    sockets.listen((channel, message) => {
      got.push([channel, message]);
      // echo a reply on the same channel, with the request's identities
      void sockets.send(channel, { ...message, header: { ...message.header, msg_type: "echo_reply", msg_id: `r-${message.header.msg_id}` }, parent_header: message.header });
    });
    client = await KernelClient.connect(info);
  });
  afterAll(async () => {
    client.close();
    await sockets.close();
  });

  it("KernelSockets delivers verified requests and routes replies back to the sender's identity", async () => {
    const id = client.request("shell", "kernel_info_request", { a: 1 });
    const r = await client.waitFor((x) => x.message.parent_header.msg_id === id, 5000);
    expect(r.channel).toBe("shell");
    expect(r.message.header.msg_type).toBe("echo_reply");
    expect(got.find(([, m]) => m.header.msg_id === id)?.[0]).toBe("shell");
  });

  it("KernelSockets drops a badly signed message and logs why", async () => {
    const { frames, msgId } = client.build("kernel_info_request", {});
    frames[1] = Buffer.from("0".repeat(64));
    await client.sendFrames("control", frames);
    const ok = client.request("control", "kernel_info_request");
    await client.waitFor((x) => x.message.parent_header.msg_id === ok, 5000);
    expect(got.some(([, m]) => m.header.msg_id === msgId)).toBe(false);
    expect(logs.some((l) => /dropped a message on control: invalid signature/.test(l))).toBe(true);
  });

  it("KernelSockets heartbeat echoes", async () => {
    expect(await client.ping(3000)).not.toBeNull();
  });
});
