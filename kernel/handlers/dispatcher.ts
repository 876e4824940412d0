/**
 * Routes requests to handlers. Per request: status busy, the handler, exactly one reply (an error
 * reply if the handler threw; none where the spec has none), status idle. Shell requests run one at a
 * time in arrival order; control has its own lane so interrupt and shutdown never wait behind a cell.
 */
import { makeBroadcast, makeReply, replyTypeFor, type Channel, type Json, type Message, type Outbox } from "../protocol/index.js";
import type { Handler, HandlerContext, KernelServices } from "./context.js";

export interface DispatcherOptions {
  services: KernelServices;
  outbox: Outbox;
  handlers: Readonly<Record<string, Handler>>;
}

export class Dispatcher {
  private readonly lanes: Record<"shell" | "control", Promise<void>> = { shell: Promise.resolve(), control: Promise.resolve() };

  constructor(private readonly options: DispatcherOptions) {}

  /** Accepts a verified request; the promise settles when it has been fully handled (tests await it). */
  receive(channel: "shell" | "control" | "stdin", message: Message): Promise<void> {
    if (channel === "stdin") {
      // The kernel never sends input_request (allow_stdin is not used), so nothing waits for input.
      this.options.services.log(`stdin: unexpected ${message.header.msg_type}; ignored`);
      return Promise.resolve();
    }
    const arrival = this.options.services.execution.abort.arrive();
    const done = this.lanes[channel].then(() => this.handle(channel, message, arrival));
    this.lanes[channel] = done;
    return done;
  }

  private async handle(channel: Channel, request: Message, arrival: number): Promise<void> {
    const { services, outbox, handlers } = this.options;
    const msgType = request.header.msg_type;
    const replyType = replyTypeFor(msgType);
    const publish = (type: string, content: Json, metadata: Json = {}) =>
      Promise.resolve(outbox.send("iopub", makeBroadcast(request, type, content, services.identity, metadata)));
    let replied = false;
    const reply = async (content: Json, metadata: Json = {}) => {
      if (!replyType) throw new Error(`${msgType} has no reply in the messaging spec`);
      if (replied) {
        services.log(`${msgType}: a second reply was suppressed`);
        return;
      }
      replied = true;
      // Not awaiting the socket: the send queue keeps the order, and idle (on iopub) need not wait for it.
      void outbox.send(channel, makeReply(request, replyType, content, services.identity, metadata));
    };
    void publish("status", { execution_state: "busy" });
    const handler = Object.hasOwn(handlers, msgType) ? handlers[msgType] : undefined;
    try {
      if (!handler) {
        services.log(`unknown msg_type ${JSON.stringify(msgType)} on ${channel}: ignored`);
      } else {
        const context: HandlerContext = { request, channel, arrival, services, reply, publish };
        await handler(context);
        if (replyType && !replied) throw new Error(`${msgType} handler produced no reply`);
      }
    } catch (e) {
      const error = e as Error;
      services.log(`${msgType} failed: ${error.stack ?? error.message}`);
      if (replyType && handler && !replied) {
        const ename = error.name || "Error";
        const evalue = error.message;
        await reply({ status: "error", ename, evalue, traceback: [`${ename}: ${evalue}`] });
      }
    }
    // The iopub queue keeps busy ... idle in order; waiting for the idle send lets tests observe the end.
    await publish("status", { execution_state: "idle" });
  }
}
