/**
 * In-process engine: the Session runs on the calling thread. For tests and the runner's --in-process
 * option; a long cell blocks the thread, so interrupt is cooperative only (the flag the language polls).
 */
import type { Session, SessionOptions } from "../../lib/language/index.js";
import { finishBundles } from "./finish.js";
import type { EngineOutput, Interpreter, RunResult } from "./interpreter.js";

export type SessionFactory = (options: SessionOptions) => Session;

export class InProcessEngine implements Interpreter {
  private stopRequested = false;
  private readonly session: Session;
  private stopped = false;

  /** createSession defaults to the cell language (loaded on demand, so importing this file is cheap). */
  static async create(createSession?: SessionFactory): Promise<InProcessEngine> {
    const factory = createSession ?? (await import("../../lib/language/index.js")).createSession;
    return new InProcessEngine(factory);
  }

  constructor(createSession: SessionFactory) {
    this.session = createSession({ shouldStop: () => this.stopRequested });
  }

  private guard(): void {
    if (this.stopped) throw new Error("the engine has been shut down");
  }

  async execute(code: string, onOutput: (output: EngineOutput) => void): Promise<RunResult> {
    this.guard();
    this.stopRequested = false;
    // The session runs synchronously; outputs are finished (chart pictures) and delivered in order after it.
    const outputs: EngineOutput[] = [];
    const result = this.session.run(code, {
      stdout: (text) => outputs.push({ kind: "stdout", text }),
      display: (bundle, options) => outputs.push({ kind: "display", bundle, displayId: options?.displayId, update: options?.update }),
      clear: (wait) => outputs.push({ kind: "clear", wait }),
    });
    for (const output of outputs) onOutput((await finishBundles({ output })).output);
    return finishBundles(result);
  }
  async evaluate(expression: string): Promise<RunResult> {
    this.guard();
    return this.session.evaluateExpression(expression);
  }
  async complete(code: string, cursorPos: number) {
    this.guard();
    return this.session.complete(code, cursorPos);
  }
  async inspect(code: string, cursorPos: number, detailLevel: 0 | 1) {
    this.guard();
    return this.session.inspect(code, cursorPos, detailLevel);
  }
  async isComplete(code: string) {
    this.guard();
    return this.session.isComplete(code);
  }
  interrupt(): void {
    this.stopRequested = true;
  }
  async shutdown(): Promise<void> {
    this.stopped = true;
  }
}
