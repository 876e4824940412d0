import { describe, expect, it } from "vitest";
import { createSigner, decode, DELIMITER, encode, ReplayGuard, type WireMessage } from "../../../kernel/wire/index.js";

const signer = createSigner("secret-key");
const message = (): WireMessage => ({
  identities: [Buffer.from("id-a"), Buffer.from("id-b")],
  header: { msg_id: "m1", msg_type: "execute_request", session: "s", username: "u", date: "2024-01-01T00:00:00Z", version: "5.3" },
  parent_header: {},
  metadata: { x: 1 },
  content: { code: "T = 300 K  # °C, µ, ∞" },
  buffers: [Buffer.from([0, 1, 2])],
});

describe("encode/decode", () => {
  it("encode lays out identities, <IDS|MSG>, signature, four JSON parts and buffers (messaging spec, wire format)", () => {
    const frames = encode(message(), signer);
    expect(frames.map((f) => f.toString())).toEqual([
      "id-a", "id-b", DELIMITER, signer.sign(frames.slice(4, 8)),
      JSON.stringify(message().header), "{}", '{"x":1}', JSON.stringify(message().content), "\u0000\u0001\u0002",
    ]);
  });

  it("decode round-trips a signed message with identities, unicode and buffers", () => {
    const r = decode(encode(message(), signer), signer);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.message).toEqual(message());
  });

  it("decode drops a wrong signature, an unsigned message and a replay", () => {
    const frames = encode(message(), signer);
    const forged = [...frames];
    forged[3] = Buffer.from(createSigner("other").sign(frames.slice(4, 8)));
    expect(decode(forged, signer)).toMatchObject({ ok: false, reason: "invalid signature" });
    const unsigned = [...frames];
    unsigned[3] = Buffer.alloc(0);
    expect(decode(unsigned, signer)).toMatchObject({ ok: false, reason: expect.stringMatching(/unsigned/) });
    const guard = new ReplayGuard();
    expect(decode(frames, signer, guard).ok).toBe(true);
    expect(decode(frames, signer, guard)).toMatchObject({ ok: false, reason: expect.stringMatching(/replayed/) });
  });

  it("decode drops a tampered content frame even with a valid-looking signature", () => {
    const frames = encode(message(), signer);
    frames[7] = Buffer.from('{"code":"rm"}');
    expect(decode(frames, signer)).toMatchObject({ ok: false, reason: "invalid signature" });
  });

  it("decode reports malformed frames: no delimiter, too few parts, bad JSON, header without msg_type", () => {
    expect(decode([Buffer.from("x")], signer)).toMatchObject({ ok: false, reason: expect.stringMatching(/delimiter/) });
    expect(decode([Buffer.from(DELIMITER), Buffer.from("s")], signer)).toMatchObject({ ok: false, reason: expect.stringMatching(/5 frames/) });
    const open = createSigner("");
    const bad = [Buffer.from(DELIMITER), Buffer.alloc(0), Buffer.from("{"), Buffer.from("{}"), Buffer.from("{}"), Buffer.from("{}")];
    expect(decode(bad, open)).toMatchObject({ ok: false, reason: expect.stringMatching(/header is not valid JSON/) });
    const noType = [Buffer.from(DELIMITER), Buffer.alloc(0), Buffer.from("{}"), Buffer.from("{}"), Buffer.from("{}"), Buffer.from("{}")];
    expect(decode(noType, open)).toMatchObject({ ok: false, reason: expect.stringMatching(/msg_type/) });
    const arr = [Buffer.from(DELIMITER), Buffer.alloc(0), Buffer.from('{"msg_id":"a","msg_type":"b"}'), Buffer.from("[]"), Buffer.from("{}"), Buffer.from("{}")];
    expect(decode(arr, open)).toMatchObject({ ok: false, reason: "parent_header is not a JSON object" });
  });

  it("decode with signing off accepts an empty signature", () => {
    const open = createSigner("");
    expect(decode(encode(message(), open), open).ok).toBe(true);
  });
});
