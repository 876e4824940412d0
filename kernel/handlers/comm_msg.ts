/** comm_msg: no comms are open, so messages are logged and dropped (the spec has no reply). */
import type { Handler } from "./context.js";

export const comm_msg: Handler = (ctx) => {
  ctx.services.log(`comm_msg for unknown comm ${String(ctx.request.content.comm_id)}: ignored`);
};
