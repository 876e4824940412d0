/**
 * An in-memory kernel for handler and dispatcher tests: the real Dispatcher and HANDLERS, an Outbox
 * that records every message, and an in-process engine over the scripted fake session.
 */
import { randomUUID } from "node:crypto";
import { InProcessEngine, type Interpreter } from "../../kernel/engine/index.js";
import { ExecutionState } from "../../kernel/execution/index.js";
import { Dispatcher, HANDLERS, type KernelServices } from "../../kernel/handlers/index.js";
import type { Channel, Json, Message } from "../../kernel/protocol/index.js";
import { createSession } from "./fakeSession.js";

export interface Sent {
  channel: Channel;
  message: Message;
}

export function memoryKernel(engine: Interpreter = new InProcessEngine(createSession)) {
  const sent: Sent[] = [];
  const logs: string[] = [];
  const shutdowns: boolean[] = [];
  const services: KernelServices = {
    engine,
    execution: new ExecutionState(),
    identity: { session: "kernel-session", username: "caloric" },
    implementationVersion: "0.1.0",
    requestShutdown: (restart) => shutdowns.push(restart),
    log: (line) => logs.push(line),
  };
  const dispatcher = new Dispatcher({ services, handlers: HANDLERS, outbox: { send: (channel, message) => void sent.push({ channel, message }) } });
  const request = (msgType: string, content: Json = {}): Message => ({
    identities: [Buffer.from("client-1")],
    header: { msg_id: randomUUID(), msg_type: msgType, session: "client", username: "u", date: new Date().toISOString(), version: "5.3" },
    parent_header: {},
    metadata: {},
    content,
    buffers: [],
  });
  /** Sends one request and returns everything parented by it. */
  const call = async (channel: "shell" | "control", msgType: string, content: Json = {}) => {
    const msg = request(msgType, content);
    await dispatcher.receive(channel, msg);
    const children = sent.filter((s) => s.message.parent_header.msg_id === msg.header.msg_id);
    const replies = children.filter((s) => s.channel !== "iopub");
    const iopub = children.filter((s) => s.channel === "iopub").map((s) => s.message);
    return { request: msg, replies, reply: replies[0]?.message, iopub, types: iopub.map((m) => m.header.msg_type) };
  };
  return { sent, logs, shutdowns, services, dispatcher, request, call };
}
