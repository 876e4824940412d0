/**
 * interrupt_request (control): asks the running cell to stop. The cell's own execute_reply reports
 * how it ended (interrupted, or the engine replaced after the grace period).
 */
import type { Handler } from "./context.js";

export const interrupt_request: Handler = async (ctx) => {
  ctx.services.engine.interrupt();
  await ctx.reply({ status: "ok" });
};
