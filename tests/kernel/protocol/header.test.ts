import { describe, expect, it } from "vitest";
import { makeBroadcast, makeHeader, makeReply, replyTypeFor, type Message } from "../../../kernel/protocol/index.js";

const id = { session: "S", username: "caloric" };

describe("protocol headers", () => {
  it("makeHeader fills every header field with version 5.3 and an ISO date", () => {
    const h = makeHeader("status", id);
    expect(Object.keys(h).sort()).toEqual(["date", "msg_id", "msg_type", "session", "username", "version"]);
    expect(h.version).toBe("5.3");
    expect(new Date(h.date).toISOString()).toBe(h.date);
  });

  it("makeReply keeps identities and parents the reply; makeBroadcast uses a kernel.<session>.<type> topic", () => {
    const req: Message = { identities: [Buffer.from("z")], header: makeHeader("x_request", id), parent_header: {}, metadata: {}, content: {}, buffers: [] };
    const rep = makeReply(req, "x_reply", { status: "ok" }, id);
    expect(rep.identities).toBe(req.identities);
    expect(rep.parent_header).toBe(req.header);
    expect(makeBroadcast(req, "stream", {}, id).identities.map(String)).toEqual(["kernel.S.stream"]);
    expect(makeBroadcast(undefined, "status", {}, id).parent_header).toEqual({});
  });

  it("replyTypeFor maps *_request to *_reply and gives nothing for comm messages", () => {
    expect(replyTypeFor("execute_request")).toBe("execute_reply");
    expect(replyTypeFor("comm_msg")).toBeUndefined();
  });
});
