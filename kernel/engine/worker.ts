/**
 * Worker entry: owns the Session (the cell language) and runs each request synchronously. The main
 * thread's interrupt flag is read with Atomics through shouldStop, which the language polls.
 */
import { parentPort, workerData } from "node:worker_threads";
import type { CellSink, Session, SessionOptions } from "../../lib/language/index.js";
import type { FromWorker, ToWorker, WorkerData } from "./protocol.js";
import { finishBundles } from "./finish.js";

type SessionFactory = (options: SessionOptions) => Session;

if (!parentPort) throw new Error("kernel/engine/worker must run in a worker thread");
const port = parentPort;
const data = workerData as WorkerData;
const flag = new Int32Array(data.flag);
// Chart bundles leave the language without pictures (vega renders asynchronously); every message goes
// through one chain that adds them, so outputs keep their order and "done" follows the last output.
let chain: Promise<void> = Promise.resolve();
const post = (m: FromWorker) => {
  chain = chain.then(async () => port.postMessage(await finishBundles(m)));
};

const sessionReady: Promise<Session> = (import(data.sessionModule) as Promise<{ createSession: SessionFactory }>).then((m) =>
  m.createSession({ shouldStop: () => Atomics.load(flag, 0) === 1 }),
);

port.on("message", (request: ToWorker) => {
  void sessionReady.then(
    (session) => handle(session, request),
    (e: Error) => post({ kind: "fail", id: request.id, message: `the cell language failed to load: ${e.message}` }),
  );
});

function handle(session: Session, request: ToWorker): void {
  const { id } = request;
  try {
    let value: unknown;
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
    post({ kind: "done", id, value });
  } catch (e) {
    post({ kind: "fail", id, message: (e as Error)?.stack ?? String(e) });
  }
}

void sessionReady.then(() => post({ kind: "ready" }), () => {});
