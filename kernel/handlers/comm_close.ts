/** comm_close: nothing to release (no comms are kept); the spec has no reply. */
import type { Handler } from "./context.js";

export const comm_close: Handler = (ctx) => {
  ctx.services.log(`comm_close for comm ${String(ctx.request.content.comm_id)}: nothing open`);
};
