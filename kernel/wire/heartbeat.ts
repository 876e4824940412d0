/**
 * Heartbeat: a REP socket that echoes every request unchanged. It lives on the main thread, which never
 * runs user code, so it keeps answering during a long cell.
 */
import type { Reply } from "zeromq";

export async function runHeartbeat(socket: Reply, log: (line: string) => void): Promise<void> {
  try {
    for await (const frames of socket) await socket.send(frames);
  } catch (e) {
    if (!socket.closed) log(`heartbeat stopped: ${(e as Error).message}`);
  }
}
