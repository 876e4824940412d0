/**
 * Worker entry: owns the Session (the cell language) and runs each request synchronously. The main
 * thread's interrupt flag is read with Atomics through shouldStop, which the language polls.
 */
import { parentPort, workerData } from "node:worker_threads";
import type { CellSink, Session, SessionOptions } from "../../lib/language/index.js";
import type { FromWorker, ToWorker, WorkerData } from "./protocol.js";
import { finishBundles, needsFinishing, warmRenderer } from "./finish.js";

type SessionFactory = (options: SessionOptions) => Session;

if (!parentPort) throw new Error("kernel/engine/worker must run in a worker thread");
const port = parentPort;
const data = workerData as WorkerData;
const flag = new Int32Array(data.flag);

/** postMessage, turning a value that cannot be cloned into a failed call instead of a lost one. */
function send(m: FromWorker): void {
  try {
    port.postMessage(m);
  } catch (e) {
    if (m.kind === "ready") throw e;
    port.postMessage({ kind: "fail", id: m.id, message: `the engine could not send its answer: ${(e as Error).message}` } satisfies FromWorker);
  }
}

// Chart bundles leave the language without pictures (vega renders asynchronously, so only after the
// synchronous run has returned). Such a message, and every message behind it, goes through one chain
// that adds them, so outputs keep their order and "done" follows the last output. Anything else is
// sent at once: stdout and plain displays reach the user while a long cell is still running, and a
// trivial cell's answer takes no extra turns.
let chain: Promise<void> = Promise.resolve();
let queued = 0;
const post = (m: FromWorker) => {
  if (queued === 0 && (data.renderCharts === false || !needsFinishing(m))) return send(m);
  queued++;
  chain = chain.then(async () => {
    try {
      send(await finishBundles(m));
    } finally {
      queued--;
    }
  });
};

let session: Session | undefined;
const sessionReady: Promise<Session> = (import(data.sessionModule) as Promise<{ createSession: SessionFactory }>).then((m) => {
  session = m.createSession({ shouldStop: () => Atomics.load(flag, 0) === 1 });
  return session;
});

// The chart libraries (vega, vega-lite, resvg: about half a second) load once the engine has been idle
// for a moment, so the first chart does not pay for them; never during kernel start and never while
// requests are arriving back to back.
const WARM_AFTER_IDLE_MS = 300;
let warmed = false;
let warmTimer: NodeJS.Timeout | undefined;
const warmWhenIdle = () => {
  clearTimeout(warmTimer);
  if (warmed || data.renderCharts === false) return;
  warmTimer = setTimeout(() => {
    warmed = true;
    void warmRenderer();
  }, WARM_AFTER_IDLE_MS);
  warmTimer.unref();
};

port.on("message", (request: ToWorker) => {
  clearTimeout(warmTimer);
  if (session) return handle(session, request);
  void sessionReady.then(
    (s) => handle(s, request),
    (e: Error) => post({ kind: "fail", id: request.id, message: `the cell language failed to load: ${e.message}` }),
  );
});

function handle(session: Session, request: ToWorker): void {
  const { id } = request;
  let value: unknown;
  try {
    switch (request.op) {
      case "run": {
        const sink: CellSink = {
          stdout: (text) => post({ kind: "output", id, output: { kind: "stdout", text } }),
          display: (bundle, options) => post({ kind: "output", id, output: { kind: "display", bundle, displayId: options?.displayId, update: options?.update } }),
          clear: (wait) => post({ kind: "output", id, output: { kind: "clear", wait } }),
        };
        value = session.run(request.code, sink);
        break;
      }
      case "eval":
        value = session.evaluateExpression(request.expression);
        break;
      case "complete":
        value = session.complete(request.code, request.cursorPos);
        break;
      case "inspect":
        value = session.inspect(request.code, request.cursorPos, request.detailLevel);
        break;
      case "isComplete":
        value = session.isComplete(request.code);
        break;
    }
  } catch (e) {
    warmWhenIdle();
    return post({ kind: "fail", id, message: (e as Error)?.stack ?? String(e) });
  }
  post({ kind: "done", id, value });
  warmWhenIdle();
}

void sessionReady.then(() => {
  post({ kind: "ready" });
  warmWhenIdle();
}, () => {});
