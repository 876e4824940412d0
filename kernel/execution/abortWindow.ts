/**
 * stop_on_error: when an execute_request fails with stop_on_error, execute_requests that had already
 * arrived (queued behind it) are answered "aborted" instead of run. Arrivals carry a sequence number,
 * so "arrived before the failing reply" is exact rather than a timing guess.
 */
export class AbortWindow {
  private lastArrival = 0;
  private abortThrough = 0;

  /** Call when a request comes off the socket; returns its arrival number. */
  arrive(): number {
    return ++this.lastArrival;
  }

  /** Call when a stop_on_error execute failed, just before its reply: everything arrived so far is aborted. */
  fail(): void {
    this.abortThrough = this.lastArrival;
  }

  shouldAbort(arrival: number): boolean {
    return arrival <= this.abortThrough;
  }
}
