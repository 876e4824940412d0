/**
 * Every `examples` entry of every built-in in the registry runs in a fresh session without error.
 * New built-ins are covered automatically.
 */
import { describe, expect, it } from "vitest";
import { BUILTINS } from "../../../../lib/language/builtins/index.js";
import { createSession } from "../../../../lib/language/index.js";

describe("registry examples", () => {
  for (const def of BUILTINS) {
    for (const example of def.examples) {
      it(`${def.name}: ${example}`, () => {
        const session = createSession({ shouldStop: () => false });
        const r = session.run(example, { stdout() {}, display() {}, clear() {} });
        expect(r.ok ? "" : r.error.traceback.join("\n")).toBe("");
      });
    }
  }
});
