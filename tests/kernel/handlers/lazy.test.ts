import { describe, expect, it } from "vitest";
import type { Handler, HandlerContext } from "../../../kernel/handlers/index.js";
import { lazyHandler } from "../../../kernel/handlers/lazy.js";

const ctx = {} as HandlerContext;

describe("lazyHandler", () => {
  it("lazyHandler loads the module on the first call only and passes the context through", async () => {
    let loads = 0;
    const seen: HandlerContext[] = [];
    const real: Handler = (c) => void seen.push(c);
    const h = lazyHandler(async () => (loads++, { demo_request: real }), "demo_request");
    expect(loads).toBe(0); // nothing loads when the list is built
    await h(ctx);
    await h(ctx);
    expect(loads).toBe(1);
    expect(seen).toEqual([ctx, ctx]);
  });

  it("lazyHandler names the handler when its module does not export it", async () => {
    const h = lazyHandler(async () => ({}) as { missing_request: Handler }, "missing_request");
    await expect(h(ctx)).rejects.toThrow(/does not export missing_request/);
  });
});
