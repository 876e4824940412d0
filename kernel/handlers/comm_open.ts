/** comm_open: no comm targets are registered; close the comm politely so the front end does not wait. */
import type { Handler } from "./context.js";

export const comm_open: Handler = async (ctx) => {
  const { comm_id, target_name } = ctx.request.content;
  ctx.services.log(`comm_open for unknown target ${JSON.stringify(target_name)}: closing comm ${String(comm_id)}`);
  if (typeof comm_id === "string") await ctx.publish("comm_close", { comm_id, data: {} });
};
