/**
 * Replay protection: a signed message seen before is refused. Remembers the most recent `capacity`
 * signatures (insertion order), which bounds memory on a long-lived kernel.
 */
export class ReplayGuard {
  private readonly seen = new Set<string>();

  constructor(private readonly capacity = 4096) {
    if (!Number.isInteger(capacity) || capacity < 1) throw new Error(`ReplayGuard capacity must be a positive integer, got ${capacity}`);
  }

  /** Returns false if the signature was seen before; otherwise records it and returns true. */
  admit(signature: string): boolean {
    if (this.seen.has(signature)) return false;
    this.seen.add(signature);
    if (this.seen.size > this.capacity) {
      const oldest = this.seen.values().next().value as string;
      this.seen.delete(oldest);
    }
    return true;
  }

  get size(): number {
    return this.seen.size;
  }
}
