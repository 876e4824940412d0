import { describe, expect, it } from "vitest";
import { engineLostError } from "../../../kernel/engine/index.js";

describe("engineLostError", () => {
  it("engineLostError tells the user plainly that variables were lost and what to do", () => {
    const r = engineLostError("The cell did not stop.");
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.ename).toBe("EngineRestarted");
      expect(r.error.evalue).toMatch(/^The cell did not stop\. .*were lost\. Re-run the cells that define them\.$/);
    }
  });
});
