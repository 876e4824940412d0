/** Header and message builders: every outgoing message is parented and versioned "5.3". */
import { randomUUID } from "node:crypto";
import { PROTOCOL_VERSION, type Header, type Json, type Message } from "./messages.js";

export interface Identity {
  /** The kernel's own session id (one per process). */
  session: string;
  username: string;
}

export function makeHeader(msgType: string, identity: Identity): Header {
  return {
    msg_id: randomUUID(),
    msg_type: msgType,
    session: identity.session,
    username: identity.username,
    date: new Date().toISOString(),
    version: PROTOCOL_VERSION,
  };
}

/** A reply (shell/control/stdin) goes back to the requester's identities. */
export function makeReply<C extends Json>(parent: Message, msgType: string, content: C, identity: Identity, metadata: Json = {}): Message<C> {
  return { identities: parent.identities, header: makeHeader(msgType, identity), parent_header: parent.header, metadata, content, buffers: [] };
}

/** An iopub message: the topic frame is "kernel.<session>.<msg_type>" as ipykernel does (clients subscribe to all). */
export function makeBroadcast<C extends Json>(parent: Message | undefined, msgType: string, content: C, identity: Identity, metadata: Json = {}): Message<C> {
  return {
    identities: [Buffer.from(`kernel.${identity.session}.${msgType}`)],
    header: makeHeader(msgType, identity),
    parent_header: parent ? parent.header : {},
    metadata,
    content,
    buffers: [],
  };
}

/** The reply type for a request type: foo_request -> foo_reply; undefined where the spec has no reply. */
export function replyTypeFor(msgType: string): string | undefined {
  return msgType.endsWith("_request") ? `${msgType.slice(0, -"_request".length)}_reply` : undefined;
}
