import { describe, expect, it } from "vitest";
import * as zmq from "zeromq";
import { runHeartbeat } from "../../../kernel/wire/heartbeat.js";

describe("runHeartbeat", () => {
  it("runHeartbeat echoes every frame unchanged and stops quietly when closed", async () => {
    const rep = new zmq.Reply({ linger: 0 });
    await rep.bind("tcp://127.0.0.1:*");
    const logs: string[] = [];
    const loop = runHeartbeat(rep, (l) => logs.push(l));
    const req = new zmq.Request({ linger: 0 });
    req.connect(rep.lastEndpoint!);
    await req.send([Buffer.from("ping"), Buffer.from([0, 255])]);
    const echo = await req.receive();
    expect(echo.map((b) => [...b])).toEqual([[...Buffer.from("ping")], [0, 255]]);
    req.close();
    rep.close();
    await loop;
    expect(logs).toEqual([]);
  });
});
