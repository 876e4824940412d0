/**
 * What a handler receives: the request, a way to reply (once) and to publish on iopub, and the
 * kernel's services. Handlers never touch sockets.
 */
import type { Interpreter } from "../engine/index.js";
import type { ExecutionState } from "../execution/index.js";
import type { Channel, Identity, Json, Message } from "../protocol/index.js";

export interface KernelServices {
  engine: Interpreter;
  execution: ExecutionState;
  identity: Identity;
  implementationVersion: string;
  /** Called after a shutdown_request has been answered; the composition root stops the process. */
  requestShutdown(restart: boolean): void;
  log(line: string): void;
}

export interface HandlerContext {
  request: Message;
  channel: Channel;
  /** Arrival number of the request (kernel/execution AbortWindow). */
  arrival: number;
  services: KernelServices;
  /** Sends the request's reply (msg_type derived from the request) on its channel. */
  reply(content: Json, metadata?: Json): Promise<void>;
  /** Publishes on iopub, parented by the request. */
  publish(msgType: string, content: Json, metadata?: Json): Promise<void>;
}

export type Handler = (context: HandlerContext) => Promise<void> | void;
