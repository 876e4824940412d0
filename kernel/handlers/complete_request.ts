/** complete_request: completions from the language; offsets in Unicode code points both ways. */
import { cursorField, stringField } from "./args.js";
import type { Handler } from "./context.js";

export const complete_request: Handler = async (ctx) => {
  const code = stringField(ctx.request.content, "code");
  const cursor = cursorField(ctx.request.content, code);
  const r = await ctx.services.engine.complete(code, cursor);
  await ctx.reply({ status: "ok", matches: r.matches, cursor_start: r.cursorStart, cursor_end: r.cursorEnd, metadata: {} });
};
