/**
 * The kernel's side of the wire: binds shell, control and stdin (ROUTER), iopub (PUB) and heartbeat
 * (REP) from a connection file, verifies and decodes incoming frames, and writes every outgoing message
 * through its socket's send queue. Bad frames are dropped and logged (stderr), never passed on.
 */
import { zmq, type Zmq } from "./zmq.js";
import { decode, encode, type WireMessage } from "./codec.js";
import { endpoint, type ConnectionInfo } from "./connection.js";
import { runHeartbeat } from "./heartbeat.js";
import { ReplayGuard } from "./replay.js";
import { SendQueue } from "./sendQueue.js";
import { createSigner, type Signer } from "./signer.js";

export type RequestChannel = "shell" | "control" | "stdin";
export type OutChannel = RequestChannel | "iopub";

export interface KernelSocketsOptions {
  log: (line: string) => void;
  /** How many recent signatures to remember against replay (default 4096). */
  replayCapacity?: number;
}

export class KernelSockets {
  private readonly queues: Record<OutChannel, SendQueue>;
  private readonly replay: ReplayGuard;
  private closed = false;

  private constructor(
    private readonly sockets: { shell: Zmq.Router; control: Zmq.Router; stdin: Zmq.Router; iopub: Zmq.Publisher; hb: Zmq.Reply },
    private readonly signer: Signer,
    private readonly options: KernelSocketsOptions,
  ) {
    this.replay = new ReplayGuard(options.replayCapacity ?? 4096);
    const q = (s: Zmq.Socket & { send(f: Buffer[]): Promise<void> }, name: string) =>
      new SendQueue((f) => s.send(f), (e) => options.log(`send on ${name} failed: ${(e as Error).message}`));
    this.queues = {
      shell: q(sockets.shell, "shell"),
      control: q(sockets.control, "control"),
      stdin: q(sockets.stdin, "stdin"),
      iopub: q(sockets.iopub, "iopub"),
    };
  }

  static async bind(info: ConnectionInfo, options: KernelSocketsOptions): Promise<KernelSockets> {
    const signer = createSigner(info.key, info.signature_scheme);
    const sockets = {
      shell: new zmq.Router({ linger: 0 }),
      control: new zmq.Router({ linger: 0 }),
      stdin: new zmq.Router({ linger: 0 }),
      iopub: new zmq.Publisher({ linger: 0 }),
      hb: new zmq.Reply({ linger: 0 }),
    };
    await Promise.all([
      sockets.shell.bind(endpoint(info, "shell")),
      sockets.control.bind(endpoint(info, "control")),
      sockets.stdin.bind(endpoint(info, "stdin")),
      sockets.iopub.bind(endpoint(info, "iopub")),
      sockets.hb.bind(endpoint(info, "hb")),
    ]);
    void runHeartbeat(sockets.hb, options.log);
    return new KernelSockets(sockets, signer, options);
  }

  /** Starts the receive loops; `handler` gets each verified message with its channel and arrival order. */
  listen(handler: (channel: RequestChannel, message: WireMessage) => void): void {
    for (const channel of ["shell", "control", "stdin"] as const) void this.receiveLoop(channel, handler);
  }

  private async receiveLoop(channel: RequestChannel, handler: (c: RequestChannel, m: WireMessage) => void): Promise<void> {
    const socket = this.sockets[channel];
    try {
      for await (const frames of socket) {
        const result = decode(frames, this.signer, this.replay);
        if (!result.ok) {
          this.options.log(`dropped a message on ${channel}: ${result.reason}`);
          continue;
        }
        try {
          handler(channel, result.message);
        } catch (e) {
          this.options.log(`handler failed on ${channel}: ${(e as Error).stack ?? e}`);
        }
      }
    } catch (e) {
      if (!this.closed) this.options.log(`receive loop on ${channel} stopped: ${(e as Error).message}`);
    }
  }

  send(channel: OutChannel, message: WireMessage): Promise<void> {
    if (this.closed) return Promise.resolve();
    return this.queues[channel].enqueue(encode(message, this.signer));
  }

  async close(): Promise<void> {
    if (this.closed) return;
    await Promise.all(Object.values(this.queues).map((q) => q.drain()));
    this.closed = true;
    for (const s of Object.values(this.sockets)) s.close();
  }
}
