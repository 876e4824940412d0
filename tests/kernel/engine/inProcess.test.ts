import { describe, expect, it } from "vitest";
import { InProcessEngine } from "../../../kernel/engine/index.js";
import { createSession } from "../../support/fakeSession.js";

describe("InProcessEngine", () => {
  it("InProcessEngine runs the session on this thread with the same interface", async () => {
    const e = new InProcessEngine(createSession);
    await e.execute("a = 2", () => {});
    expect(await e.evaluate("a")).toEqual({ ok: true, result: { "text/plain": "2" } });
    expect(await e.inspect("psat", 4, 1)).toMatchObject({ found: true });
    await e.shutdown();
    await expect(e.execute("a", () => {})).rejects.toThrow(/shut down/);
  });

  it("InProcessEngine.create loads the real cell language by default", async () => {
    const e = await InProcessEngine.create();
    const r = await e.execute("1 + 1", () => {});
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.result?.["text/plain"]).toMatch(/^2\b/);
  });
});
