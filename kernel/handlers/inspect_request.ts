/** inspect_request: help for the name at the cursor (detail_level 0 or 1). */
import { RequestError, cursorField, stringField } from "./args.js";
import type { Handler } from "./context.js";

export const inspect_request: Handler = async (ctx) => {
  const code = stringField(ctx.request.content, "code");
  const cursor = cursorField(ctx.request.content, code);
  const level = ctx.request.content.detail_level ?? 0;
  if (level !== 0 && level !== 1) throw new RequestError(`detail_level: expected 0 or 1, got ${JSON.stringify(level)}`);
  const r = await ctx.services.engine.inspect(code, cursor, level);
  await ctx.reply({ status: "ok", found: r.found, data: r.found && r.bundle ? r.bundle : {}, metadata: {} });
};
