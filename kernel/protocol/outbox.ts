/**
 * What handlers may do to the outside world: reply on the request's channel and publish on iopub.
 * The composition root connects it to the wire; tests connect it to an in-memory transport.
 */
import type { Channel, Message } from "./messages.js";

export interface Outbox {
  send(channel: Channel, message: Message): Promise<void> | void;
}
