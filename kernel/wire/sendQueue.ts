/**
 * Per-socket send queue. zeromq v6 allows one send in flight per socket (a second throws EBUSY
 * synchronously), so every write goes through here: one at a time, in the order enqueued.
 */
export type SendFn = (frames: Buffer[]) => Promise<void>;

export class SendQueue {
  private tail: Promise<void> = Promise.resolve();
  private pending = 0;

  constructor(
    private readonly send: SendFn,
    private readonly onError: (error: unknown) => void = () => {},
  ) {}

  /** Resolves when these frames have been handed to the socket; a failed send is reported, not thrown. */
  enqueue(frames: Buffer[]): Promise<void> {
    this.pending++;
    const next = this.tail.then(async () => {
      try {
        await this.send(frames);
      } catch (e) {
        this.onError(e);
      } finally {
        this.pending--;
      }
    });
    this.tail = next;
    return next;
  }

  /** Number of sends enqueued and not yet completed. */
  get size(): number {
    return this.pending;
  }

  /** Resolves when everything enqueued so far has been sent. */
  drain(): Promise<void> {
    return this.tail;
  }
}
