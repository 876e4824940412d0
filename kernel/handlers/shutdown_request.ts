/**
 * shutdown_request (control or shell): reply, then stop. With restart=true the front end's kernel
 * manager starts a new process; this process only has to exit cleanly.
 */
import { boolField } from "./args.js";
import type { Handler } from "./context.js";

export const shutdown_request: Handler = async (ctx) => {
  const restart = boolField(ctx.request.content, "restart", false);
  await ctx.reply({ status: "ok", restart });
  ctx.services.requestShutdown(restart);
};
