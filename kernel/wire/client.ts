/**
 * A small Jupyter client over real sockets (DEALER for shell/control/stdin, SUB for iopub, REQ for
 * heartbeat). Used by the tests and the headless runner. It builds its own request headers so that the
 * wire layer stays free of the protocol layer; the shape is the messaging spec's (version 5.3).
 */
import { randomUUID } from "node:crypto";
import { zmq, type Zmq } from "./zmq.js";
import { decode, encode, type Json, type WireMessage } from "./codec.js";
import { endpoint, type ConnectionInfo } from "./connection.js";
import { SendQueue } from "./sendQueue.js";
import { createSigner, type Signer } from "./signer.js";

export type ClientChannel = "shell" | "control" | "stdin" | "iopub";

export interface Received {
  channel: ClientChannel;
  message: WireMessage;
}

export interface Collected {
  reply: WireMessage;
  /** iopub messages parented by the request, busy through idle inclusive. */
  iopub: WireMessage[];
}

interface Waiter {
  predicate: (r: Received) => boolean;
  resolve: (r: Received) => void;
}

export class KernelClient {
  /** Every message received, in arrival order. */
  readonly received: Received[] = [];
  private readonly waiters = new Set<Waiter>();
  private readonly queues: Record<"shell" | "control" | "stdin", SendQueue>;
  readonly session = randomUUID();
  private closed = false;

  private constructor(
    private readonly sockets: { shell: Zmq.Dealer; control: Zmq.Dealer; stdin: Zmq.Dealer; iopub: Zmq.Subscriber; hb: Zmq.Request },
    private readonly signer: Signer,
  ) {
    this.queues = {
      shell: new SendQueue((f) => sockets.shell.send(f)),
      control: new SendQueue((f) => sockets.control.send(f)),
      stdin: new SendQueue((f) => sockets.stdin.send(f)),
    };
    for (const c of ["shell", "control", "stdin", "iopub"] as const) void this.receiveLoop(c);
  }

  static async connect(info: ConnectionInfo): Promise<KernelClient> {
    const signer = createSigner(info.key, info.signature_scheme);
    const sockets = {
      shell: new zmq.Dealer({ linger: 0 }),
      control: new zmq.Dealer({ linger: 0 }),
      stdin: new zmq.Dealer({ linger: 0 }),
      iopub: new zmq.Subscriber({ linger: 0 }),
      hb: new zmq.Request({ linger: 0, relaxed: true, correlate: true }),
    };
    sockets.iopub.subscribe();
    for (const c of ["shell", "control", "stdin", "iopub", "hb"] as const) sockets[c].connect(endpoint(info, c));
    return new KernelClient(sockets, signer);
  }

  private async receiveLoop(channel: ClientChannel): Promise<void> {
    try {
      for await (const frames of this.sockets[channel]) {
        const r = decode(frames, this.signer);
        if (!r.ok) continue;
        const item = { channel, message: r.message };
        this.received.push(item);
        for (const w of this.waiters) {
          if (w.predicate(item)) {
            this.waiters.delete(w);
            w.resolve(item);
          }
        }
      }
    } catch {
      // socket closed
    }
  }

  /** Builds a signed request; returns the frames and msg_id without sending (tests tamper with them). */
  build(msgType: string, content: Json, metadata: Json = {}): { msgId: string; message: WireMessage; frames: Buffer[] } {
    const msgId = randomUUID();
    const message: WireMessage = {
      identities: [],
      header: { msg_id: msgId, msg_type: msgType, session: this.session, username: "caloric-client", date: new Date().toISOString(), version: "5.3" },
      parent_header: {},
      metadata,
      content,
      buffers: [],
    };
    return { msgId, message, frames: encode(message, this.signer) };
  }

  /** Sends a request; returns its msg_id. */
  request(channel: "shell" | "control" | "stdin", msgType: string, content: Json = {}): string {
    const { msgId, frames } = this.build(msgType, content);
    void this.queues[channel].enqueue(frames);
    return msgId;
  }

  sendFrames(channel: "shell" | "control" | "stdin", frames: Buffer[]): Promise<void> {
    return this.queues[channel].enqueue(frames);
  }

  /** Resolves with the first received message (already here or arriving) matching, or rejects on timeout. */
  waitFor(predicate: (r: Received) => boolean, timeoutMs: number, what = "message"): Promise<Received> {
    const found = this.received.find(predicate);
    if (found) return Promise.resolve(found);
    return new Promise((resolve, reject) => {
      const waiter: Waiter = {
        predicate,
        resolve: (r) => {
          clearTimeout(timer);
          resolve(r);
        },
      };
      const timer = setTimeout(() => {
        this.waiters.delete(waiter);
        reject(new Error(`timed out after ${timeoutMs} ms waiting for ${what}`));
      }, timeoutMs);
      this.waiters.add(waiter);
    });
  }

  /** Messages parented by msgId so far. */
  childrenOf(msgId: string, channel?: ClientChannel): WireMessage[] {
    return this.received.filter((r) => r.message.parent_header.msg_id === msgId && (!channel || r.channel === channel)).map((r) => r.message);
  }

  /** Waits for the reply to msgId and for its idle status on iopub (no ordering exists between the two). */
  async collect(msgId: string, timeoutMs = 30_000): Promise<Collected> {
    const reply = await this.waitFor(
      (r) => r.channel !== "iopub" && r.message.parent_header.msg_id === msgId,
      timeoutMs,
      `reply to ${msgId}`,
    );
    await this.waitFor(
      (r) => r.channel === "iopub" && r.message.parent_header.msg_id === msgId && r.message.header.msg_type === "status" && r.message.content.execution_state === "idle",
      timeoutMs,
      `idle after ${msgId}`,
    );
    return { reply: reply.message, iopub: this.childrenOf(msgId, "iopub") };
  }

  execute(code: string, options: Json = {}, timeoutMs = 30_000): Promise<Collected> {
    const msgId = this.request("shell", "execute_request", {
      code, silent: false, store_history: true, user_expressions: {}, allow_stdin: false, stop_on_error: true, ...options,
    });
    return this.collect(msgId, timeoutMs);
  }

  /** Sends kernel_info until a reply and an iopub status arrive (iopub subscriptions join late). */
  async waitForReady(timeoutMs = 20_000): Promise<WireMessage> {
    const deadline = Date.now() + timeoutMs;
    while (Date.now() < deadline) {
      const id = this.request("shell", "kernel_info_request");
      try {
        const { reply } = await this.collect(id, 500);
        return reply;
      } catch {
        // not yet: resend
      }
    }
    throw new Error(`kernel not ready within ${timeoutMs} ms`);
  }

  /** One heartbeat round trip in ms, or null if no echo within timeoutMs. */
  async ping(timeoutMs = 2_000): Promise<number | null> {
    const t0 = performance.now();
    const payload = Buffer.from(randomUUID());
    const attempt = (async () => {
      await this.sockets.hb.send(payload);
      const [echo] = await this.sockets.hb.receive();
      return echo?.equals(payload) ? performance.now() - t0 : null;
    })();
    const timeout = new Promise<null>((r) => setTimeout(() => r(null), timeoutMs).unref());
    return Promise.race([attempt, timeout]);
  }

  close(): void {
    if (this.closed) return;
    this.closed = true;
    for (const s of Object.values(this.sockets)) s.close();
  }
}
