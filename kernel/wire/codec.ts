/**
 * Jupyter wire format: [identities..., "<IDS|MSG>", signature, header, parent_header, metadata,
 * content, buffers...]. decode() checks the signature and replay before parsing any JSON, so a forged
 * frame costs one HMAC and nothing more.
 */
import type { ReplayGuard } from "./replay.js";
import type { Signer } from "./signer.js";

export const DELIMITER = "<IDS|MSG>";
const DELIMITER_BYTES = Buffer.from(DELIMITER);

export type Json = Record<string, unknown>;

/** A message as it travels: JSON parts are plain objects; the wire does not interpret them. */
export interface WireMessage {
  identities: Buffer[];
  header: Json;
  parent_header: Json;
  metadata: Json;
  content: Json;
  buffers: Buffer[];
}

export type DecodeResult =
  | { ok: true; message: WireMessage; signature: string }
  | { ok: false; reason: string };

export function encode(message: WireMessage, signer: Signer): Buffer[] {
  const parts = [message.header, message.parent_header, message.metadata, message.content].map((p) =>
    Buffer.from(JSON.stringify(p), "utf8"),
  );
  return [...message.identities, DELIMITER_BYTES, Buffer.from(signer.sign(parts), "utf8"), ...parts, ...message.buffers];
}

export function decode(frames: readonly Buffer[], signer: Signer, replay?: ReplayGuard): DecodeResult {
  const at = frames.findIndex((f) => f.equals(DELIMITER_BYTES));
  if (at < 0) return { ok: false, reason: `no ${DELIMITER} delimiter among ${frames.length} frames` };
  if (frames.length < at + 6) return { ok: false, reason: `expected 5 frames after the delimiter, got ${frames.length - at - 1}` };
  const signature = frames[at + 1]!.toString("utf8");
  const parts = frames.slice(at + 2, at + 6);
  if (signer.enabled) {
    if (signature === "") return { ok: false, reason: "unsigned message (empty signature) while a key is set" };
    if (!signer.verify(signature, parts)) return { ok: false, reason: "invalid signature" };
    if (replay && !replay.admit(signature)) return { ok: false, reason: "replayed message (signature seen before)" };
  }
  const names = ["header", "parent_header", "metadata", "content"] as const;
  const parsed: Json[] = [];
  for (let i = 0; i < 4; i++) {
    let v: unknown;
    try {
      v = JSON.parse(parts[i]!.toString("utf8"));
    } catch (e) {
      return { ok: false, reason: `${names[i]} is not valid JSON: ${(e as Error).message}` };
    }
    if (typeof v !== "object" || v === null || Array.isArray(v)) return { ok: false, reason: `${names[i]} is not a JSON object` };
    parsed.push(v as Json);
  }
  const header = parsed[0]!;
  if (typeof header.msg_type !== "string" || typeof header.msg_id !== "string") {
    return { ok: false, reason: "header lacks msg_type or msg_id strings" };
  }
  return {
    ok: true,
    signature,
    message: {
      identities: frames.slice(0, at).map((f) => Buffer.from(f)),
      header,
      parent_header: parsed[1]!,
      metadata: parsed[2]!,
      content: parsed[3]!,
      buffers: frames.slice(at + 6).map((f) => Buffer.from(f)),
    },
  };
}
