/** is_complete_request: complete / incomplete (with indent) / invalid, from the language's parser. */
import { stringField } from "./args.js";
import type { Handler } from "./context.js";

export const is_complete_request: Handler = async (ctx) => {
  const code = stringField(ctx.request.content, "code");
  const r = await ctx.services.engine.isComplete(code);
  await ctx.reply(r.status === "incomplete" ? { status: r.status, indent: r.indent ?? "" } : { status: r.status });
};
